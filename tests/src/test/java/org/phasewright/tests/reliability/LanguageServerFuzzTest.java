package org.phasewright.tests.reliability;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.Position;
import org.junit.jupiter.api.Test;
import org.phasewright.language.ide.server.PhaseServerModule;
import org.phasewright.language.ide.tests.LanguageServerTestBase;
import org.phasewright.language.ide.tests.LoggedErrors;

import com.google.inject.Module;

/**
 * A share of the fuzz campaign through an in-process language server as it runs for an editor (its own request
 * manager, so parsing and validation run on its large-stack threads): each text is opened as the client holds it,
 * line ends included; its diagnostics must have ranges inside the text, counting CR, LF and CRLF as line breaks as
 * the LSP specification does, and nothing may be logged as an error. Size: {@code phasewright.fuzz.lspTexts}
 * (default 300). No text is left out: deep nesting (up to 4,000 levels here) and lone carriage returns are checked
 * like any other text.
 */
class LanguageServerFuzzTest extends LanguageServerTestBase {

    @Override
    protected Module getServerModule() {
        return PhaseServerModule.withDefaults();
    }

    @Test
    void diagnosticsOfEveryTextLieInsideIt() throws IOException {
        int count = Integer.getInteger("phasewright.fuzz.lspTexts", 300);
        long seed = Long.getLong("phasewright.fuzz.seed", 20261202L) + 2;
        PhaseTextFuzzer fuzzer = new PhaseTextFuzzer(seed, PhaseTextFuzzer.exampleTexts());
        initialize();
        List<String> findings = new ArrayList<>();
        long start = System.nanoTime();
        long slowest = 0;
        int longest = 0;
        try (LoggedErrors logged = new LoggedErrors()) {
            for (int i = 0; i < count; i++) {
                String text = fuzzer.next();
                // A new file per text: reusing one name let diagnostics of an earlier text be read for a later one.
                long opened = System.nanoTime();
                String uri = openAsIs("f" + i + ".phase", text);
                // Requests run in order, so this read waits for the build of the opened text.
                List<Diagnostic> diagnostics = getDiagnostics().getOrDefault(uri, List.of());
                slowest = Math.max(slowest, System.nanoTime() - opened);
                longest = Math.max(longest, text.length());
                String[] lines = text.split("\r\n|\r|\n", -1);
                for (Diagnostic d : diagnostics) {
                    if (!inside(d.getRange().getStart(), lines) || !inside(d.getRange().getEnd(), lines)) {
                        findings.add("text " + i + ": range " + d.getRange() + " outside the text: " + d.getMessage());
                    }
                }
                List<String> errors = logged.take();
                if (!errors.isEmpty()) {
                    findings.add("text " + i + ": logged " + errors);
                }
                if (!findings.isEmpty() && findings.get(findings.size() - 1).startsWith("text " + i + ":")) {
                    FuzzOracle.save(Path.of("target", "fuzz-findings"), "lsp-seed" + seed + "-" + i, text);
                }
                // Delete before closing, so the server drops the file from its index and the workspace does not
                // grow by one file per text (names no longer resolve across files: OwnFileGlobalScopeProvider).
                Files.deleteIfExists(Path.of(java.net.URI.create(uri)));
                close(uri);
            }
        }
        System.out.printf("language server fuzz: seed %d, %d texts opened in %.1f s (slowest %.0f ms, longest %,d"
                + " characters)%n", seed, count, (System.nanoTime() - start) / 1e9, slowest / 1e6, longest);
        assertTrue(findings.isEmpty(), findings.size() + " findings:\n"
                + String.join("\n", findings.subList(0, Math.min(5, findings.size()))));
    }

    private static boolean inside(Position p, String[] lines) {
        return p.getLine() >= 0 && p.getLine() < lines.length && p.getCharacter() >= 0
                && p.getCharacter() <= lines[p.getLine()].length() + 1;
    }
}
