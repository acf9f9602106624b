package org.phasewright.tests.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.Problem;
import org.phasewright.language.standalone.StudyPipeline;
import org.phasewright.language.standalone.StudyRun;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.report.AtomicFiles;
import org.phasewright.runtime.study.RunSettings;

import com.google.gson.JsonParser;

/**
 * Names and strings in a model cannot inject code into the generated Java, break the JSON or CSV results, or steer
 * result files out of the results folder; a failed write leaves the previous file whole.
 */
class HostileInputTest {
    /** Descriptions full of what Java, JSON, CSV and HTML give meaning to. {@code \\u000a} is a Java line break. */
    private static final String HOSTILE = """
            model _x__ "title */ \\" \\\\u000a } class Evil { static { System.exit(3); } } /* <script>alert(1)</script>"
            param a_ = 2 "=cmd|' /C calc'!A0 */ \\\\u000a System.exit(4); //"
            state x = 1 "*/ static { System.exit(5); } /*"
            state _ = 2 "\\\\u0022; System.exit(6); \\\\u0022 ,\\"quoted\\",=1+2 @SUM(A1) -3+4"
            let u000a = x*_ "\\\\u002a/ System.exit(7); /\\\\u002a"
            rate x = -a_*x + u000a
            rate _ = -_
            study _study { simulate to t = 1 equilibria }
            """;

    @TempDir
    Path folder;

    @Test
    void namesAndDescriptionsNeverReachGeneratedSource() {
        CompiledModel model = Models.compile(HOSTILE);
        assertEquals(CompiledModel.Backend.GENERATED_CODE, model.backend(), String.valueOf(model.note()));
        String source = model.generatedSource();
        assertNotNull(source);
        for (String forbidden : List.of("*/", "/*", "\\", "System", "Evil", "\"", "script", "cmd")) {
            assertFalse(source.contains(forbidden), "generated source contains " + forbidden + ":\n" + source);
        }
        // The generated class computes the same rates as the interpreter would: -2*1 + 1*2 and -2.
        double[] dudt = new double[2];
        model.field().rates(0, model.initialState(), model.parameters(), dudt);
        assertEquals(0.0, dudt[0], 1e-12);
        assertEquals(-2.0, dudt[1], 1e-12);
    }

    @Test
    void resultsStayParseableAndInsideTheirFolder() throws Exception {
        CheckedModel checked = Models.check(HOSTILE);
        assertFalse(checked.hasErrors(), checked.problems().toString());
        Path root = folder.resolve("results");
        List<StudyRun> runs = StudyPipeline.run(checked.ast(), root, null, RunSettings.DEFAULT);
        assertEquals(1, runs.size());
        try (Stream<Path> files = Files.walk(folder)) {
            for (Path f : files.filter(Files::isRegularFile).toList()) {
                assertTrue(f.normalize().startsWith(root.normalize()), "written outside the results folder: " + f);
                String text = Files.readString(f, StandardCharsets.UTF_8);
                if (f.toString().endsWith(".json")) {
                    JsonParser.parseString(text); // throws on a broken document
                }
                if (f.toString().endsWith(".csv")) {
                    for (String line : text.split("\n")) {
                        for (String cell : line.split(",", -1)) {
                            assertFalse(cell.startsWith("=") || cell.startsWith("+") || cell.startsWith("@"),
                                    f + ": a cell a spreadsheet would run as a formula: " + cell);
                            if (cell.startsWith("-")) {
                                Double.parseDouble(cell); // a negative number, not a formula
                            }
                        }
                    }
                }
            }
        }
    }

    @Test
    void theHtmlReportShowsHostileTextAsText() throws Exception {
        Path model = folder.resolve("hostile.phase");
        Files.writeString(model, HOSTILE, StandardCharsets.UTF_8);
        Path out = folder.resolve("out");
        CliRun run = CliRun.of("run", model.toString(), "--quiet", "--out", out.toString());
        assertEquals(0, run.exitCode(), run.toString());
        run.assertNoTrace();
        try (Stream<Path> files = Files.walk(out)) {
            List<Path> written = files.filter(Files::isRegularFile).toList();
            assertTrue(written.stream().anyMatch(f -> f.toString().endsWith(".html")), written.toString());
            for (Path f : written) {
                if (f.toString().endsWith(".html")) {
                    String html = Files.readString(f, StandardCharsets.UTF_8);
                    assertFalse(html.contains("<script>alert(1)"), f + " lets markup from the model through");
                    assertTrue(html.contains("&lt;script&gt;alert(1)") || !html.contains("alert(1)"),
                            f + " shows the title unescaped");
                }
                if (f.toString().endsWith(".json")) {
                    JsonParser.parseString(Files.readString(f, StandardCharsets.UTF_8));
                }
            }
        }
    }

    @Test
    void studyAndModelNamesCannotBePaths() {
        // Study names become folder names; the grammar admits only letters, digits and '_' there.
        for (String name : List.of("../escape", "/tmp/x", "a/b", "..", "a\\\\b", "\"quoted\"", "C:x", "a.b")) {
            CheckedModel checked = Models.check("""
                    model m
                    state x = 1
                    rate x = -x
                    study %s { equilibria }
                    """.formatted(name));
            assertTrue(checked.hasErrors(), name + " must be rejected");
            for (Problem p : checked.problems()) {
                assertTrue(p.line() >= 1 && p.column() >= 1, p.toString());
            }
        }
    }

    @Test
    void aFailedWriteKeepsThePreviousFile() throws IOException {
        Path target = folder.resolve("equilibria.csv");
        AtomicFiles.write(target, "old,complete\n1,2\n");
        IOException full = assertThrows(IOException.class, () -> AtomicFiles.write(target, out -> {
            out.write("new,partial\n");
            out.write("9".repeat(100_000));
            throw new IOException("disk full (injected)");
        }));
        assertEquals("disk full (injected)", full.getMessage());
        // A crash of the writer itself (an Error, as when the process runs out of memory) behaves the same.
        assertThrows(OutOfMemoryError.class, () -> AtomicFiles.write(target, out -> {
            out.write("new,partial\n");
            throw new OutOfMemoryError("injected");
        }));
        assertEquals("old,complete\n1,2\n", Files.readString(target));
        try (Stream<Path> left = Files.list(folder)) {
            assertEquals(List.of(target), left.toList(), "no temporary file may be left behind");
        }
    }

    @Test
    void aStudyThatCannotWriteKeepsEveryPreviousResult() throws Exception {
        String text = """
                model decay
                state x = 1
                rate x = -x
                study s { simulate to t = 1 equilibria }
                """;
        Path root = folder.resolve("results");
        List<StudyRun> first = StudyPipeline.run(Models.check(text).ast(), root, null, RunSettings.DEFAULT);
        List<Path> files = first.get(0).files();
        assertTrue(files.size() >= 3, files.toString());
        java.util.Map<Path, String> before = new java.util.HashMap<>();
        for (Path f : files) {
            before.put(f, Files.readString(f));
        }
        // Inject a fault mid-run: the second file's place is taken by a folder, so its rename fails.
        Path blocked = files.get(1);
        Files.delete(blocked);
        Files.createDirectories(blocked.resolve("occupied"));
        String changed = text.replace("x = 1\n", "x = 3\n");
        assertThrows(org.phasewright.language.standalone.StudyPipelineException.class,
                () -> StudyPipeline.run(Models.check(changed).ast(), root, null, RunSettings.DEFAULT));
        for (int i = 0; i < files.size(); i++) {
            Path f = files.get(i);
            if (f.equals(blocked)) {
                continue;
            }
            String now = Files.readString(f);
            if (i > 1) {
                assertEquals(before.get(f), now, f + ": written after the fault, so it must be the previous result");
            } else {
                // Written before the fault: the complete new file (same rows, other values), never a fragment.
                assertEquals(before.get(f).split("\n").length, now.split("\n").length, f + " is damaged");
            }
        }
        try (Stream<Path> all = Files.walk(root)) {
            assertTrue(all.noneMatch(p -> p.getFileName().toString().endsWith(".tmp")), "temporary files left");
        }
    }
}
