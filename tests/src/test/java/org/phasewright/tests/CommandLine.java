package org.phasewright.tests;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Arrays;

import org.phasewright.cli.Main;

/** Runs the `phasewright` command in-process and captures what it prints. */
record CommandLine(int exitCode, String out, String err) {

    static CommandLine run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(Arrays.asList(args), new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new CommandLine(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    static Path example(String name) {
        return Path.of(System.getProperty("phasewright.examples"), name);
    }
}
