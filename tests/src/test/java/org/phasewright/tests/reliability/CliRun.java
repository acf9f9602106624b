package org.phasewright.tests.reliability;

import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;

import org.phasewright.cli.Main;

/** The `phasewright` command run in-process, with what it printed. */
record CliRun(int exitCode, String out, String err) {
    static CliRun of(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(Arrays.asList(args), new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new CliRun(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** Users never see a stack trace or an internal error. */
    void assertNoTrace() {
        for (String s : new String[] { out, err }) {
            assertFalse(s.contains("\tat ") || s.contains("Exception:") || s.contains("internal error")
                    || s.contains("Error:"), () -> "trace or internal error in output: " + this);
        }
    }

    @Override
    public String toString() {
        return "exit " + exitCode + "\nout: " + abbreviate(out) + "\nerr: " + abbreviate(err);
    }

    private static String abbreviate(String s) {
        return s.length() > 2000 ? s.substring(0, 2000) + "..." : s;
    }
}
