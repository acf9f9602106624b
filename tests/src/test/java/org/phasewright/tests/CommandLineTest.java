package org.phasewright.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What a person sees at the terminal: messages with positions, exit codes, no stack traces. */
class CommandLineTest {

    @TempDir
    Path folder;

    private Path write(String name, String text) throws Exception {
        Path file = folder.resolve(name);
        Files.writeString(file, text);
        return file;
    }

    private static void assertNoStackTrace(CommandLine run) {
        assertFalse(run.err().contains("\tat ") || run.err().contains("Exception"), run.err());
        assertFalse(run.out().contains("\tat ") || run.out().contains("Exception"), run.out());
    }

    @Test
    void checkPrintsFileLineColumnAndFailsOnErrors() throws Exception {
        Path bad = write("bad.phase", "model m\nstate x = 1\nrate x = -x + zz\n");
        CommandLine run = CommandLine.run("check", bad.toString());
        assertEquals(1, run.exitCode());
        assertTrue(run.out().contains(bad + ":3:15: error: Unknown name 'zz'"), run.out());
        assertTrue(run.out().contains("1 file checked: 1 error, 0 warnings"), run.out());
    }

    @Test
    void checkPassesWarningsButShowsThem() throws Exception {
        Path file = write("warn.phase", "model m\nparam unused = 1\nstate x = 1\nrate x = -x\n");
        CommandLine run = CommandLine.run("check", file.toString());
        assertEquals(0, run.exitCode());
        assertTrue(run.out().contains(":2:7: warning: Param 'unused' is never used."), run.out());
    }

    @Test
    void everyBundledExampleIsClean() throws Exception {
        try (var examples = Files.list(Path.of(System.getProperty("phasewright.examples")))) {
            String[] files = examples.filter(p -> p.toString().endsWith(".phase")).map(Path::toString)
                    .toArray(String[]::new);
            assertTrue(files.length >= 2);
            String[] args = new String[files.length + 1];
            args[0] = "check";
            System.arraycopy(files, 0, args, 1, files.length);
            CommandLine run = CommandLine.run(args);
            assertEquals(0, run.exitCode(), run.out());
            assertTrue(run.out().contains("0 errors, 0 warnings"), run.out());
        }
    }

    @Test
    void missingFileAndBadOptionsAreClearMessages() {
        CommandLine missing = CommandLine.run("run", folder.resolve("absent.phase").toString());
        assertEquals(1, missing.exitCode());
        assertTrue(missing.err().contains("absent.phase:1:1: error: File not found."), missing.err());
        CommandLine badOption = CommandLine.run("run", "x.phase", "--speed", "3");
        assertEquals(2, badOption.exitCode());
        assertTrue(badOption.err().contains("unknown option --speed"), badOption.err());
        CommandLine noValue = CommandLine.run("run", "x.phase", "--out");
        assertEquals(2, noValue.exitCode());
        assertTrue(noValue.err().contains("--out needs a value"), noValue.err());
        assertEquals(2, CommandLine.run("frobnicate").exitCode());
        assertEquals(2, CommandLine.run().exitCode());
        assertNoStackTrace(missing);
    }

    @Test
    void unknownStudyNamesTheOnesThatExist() throws Exception {
        CommandLine run = CommandLine.run("run", CommandLine.example("lorenz1963.phase").toString(), "--study",
                "nope", "--out", folder.toString());
        assertEquals(1, run.exitCode());
        assertTrue(run.err().contains("has no study 'nope'; its studies: reference"), run.err());
    }

    @Test
    void blowUpIsReportedWithItsTime() throws Exception {
        // x' = x^2, x(0) = 1 has the closed form x = 1/(1 - t): it leaves every bound as t -> 1.
        Path file = write("blowup.phase", "model blowup\nstate x = 1\nrate x = x^2\nstudy s { simulate to t = 2 }\n");
        CommandLine run = CommandLine.run("run", file.toString(), "--out", folder.resolve("out").toString());
        assertEquals(3, run.exitCode(), run.out() + run.err());
        assertTrue(run.out().contains("BLEW_UP") || run.out().contains("blew up"), run.out());
        assertTrue(run.out().matches("(?s).*t = (9\\.99|1\\.00)\\d*e-01.*|(?s).*t = 1\\.0+e\\+00.*|(?s).*t = 0\\.99.*"),
                run.out());
        assertNoStackTrace(run);
    }

    @Test
    void modelWithErrorsIsNotRun() throws Exception {
        Path file = write("broken.phase", "model m\nstate x = 1\nstate y = 1\nrate x = y\n");
        CommandLine run = CommandLine.run("run", file.toString(), "--out", folder.resolve("out").toString());
        assertEquals(1, run.exitCode());
        assertTrue(run.err().contains(":3:7: error: State 'y' has no rate"), run.err());
        assertFalse(Files.exists(folder.resolve("out")));
    }

    @Test
    void defaultResultsFolderSitsBesideTheModel() throws Exception {
        Path file = write("decay.phase", "model decay\nparam k = 0.5\nstate x = 2\nrate x = -k*x\n"
                + "study check { simulate to t = 4\n equilibria }\n");
        CommandLine run = CommandLine.run("run", file.toString(), "--quiet");
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.out());
        Path trajectory = folder.resolve("decay.results/check/trajectory.csv");
        assertTrue(Files.isRegularFile(trajectory));
        // Closed form x(t) = 2 exp(-k t): the last row at t = 4.
        String[] last = Files.readAllLines(trajectory).getLast().split(",");
        assertEquals(4.0, Double.parseDouble(last[0]), 1e-12);
        assertEquals(2 * Math.exp(-2), Double.parseDouble(last[1]), 1e-7);
    }
}
