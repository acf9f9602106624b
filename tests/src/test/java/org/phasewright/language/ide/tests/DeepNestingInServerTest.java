package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.TimeUnit;

import org.eclipse.emf.common.util.URI;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.SymbolInformation;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Test;
import org.phasewright.language.ide.server.PhaseServerModule;
import org.phasewright.language.standalone.PhaseFiles;

import com.google.inject.Module;

/**
 * Deeply nested text in the server as it runs for an editor: with the server's own request manager (the harness's
 * direct one would run everything on the test thread), whose requests run on large-stack threads. 2,000 nested
 * parentheses overflowed the parser on a normal 1 MB stack (it did at about 500; see docs/reliability.md).
 */
class DeepNestingInServerTest extends LanguageServerTestBase {
    /** 2,000 by default; {@code -Dphasewright.lsp.deepLevels=N} to measure deeper. */
    private static final int LEVELS = Integer.getInteger("phasewright.lsp.deepLevels", 2_000);

    @Override
    protected Module getServerModule() {
        return PhaseServerModule.withDefaults();
    }

    private static String deep(int levels) {
        return "model deep \"Deep\"\nstate x = 1 \"amount\"\nrate x = " + "(".repeat(levels) + "-x"
                + ")".repeat(levels) + "\n";
    }

    @Test
    void twoThousandNestedParenthesesAreCheckedAndTheServerAnswersOn() throws Exception {
        String text = deep(LEVELS);
        // Expected problems: the command-line checker's, which parses on a large stack (parentheses add no depth).
        List<?> expected = new PhaseFiles().check("deep.phase", URI.createURI("inmemory:/deep.phase"), text)
                .problems();
        initialize();
        try (LoggedErrors logged = new LoggedErrors()) {
            long start = System.nanoTime();
            String uri = openAsIs("deep.phase", text);
            List<Diagnostic> diagnostics = diagnosticsOf(uri); // waits for the build (requests run in order)
            long openMillis = (System.nanoTime() - start) / 1_000_000;
            Assertions.assertEquals(expected.size(), diagnostics.size(), "checker: " + expected + "\nserver: " + diagnostics);
            assertFalse(diagnostics.stream().anyMatch(d -> d.getSeverity() == org.eclipse.lsp4j.DiagnosticSeverity.Error),
                    diagnostics.toString());

            // The next requests are answered: symbols, a hover inside the nesting, then an edit and its check.
            start = System.nanoTime();
            List<Either<SymbolInformation, DocumentSymbol>> symbols = languageServer
                    .documentSymbol(new DocumentSymbolParams(new TextDocumentIdentifier(uri)))
                    .get(60, TimeUnit.SECONDS);
            assertFalse(symbols.isEmpty());
            Hover hover = languageServer
                    .hover(new HoverParams(new TextDocumentIdentifier(uri), new Position(2, 9 + LEVELS + 1)))
                    .get(60, TimeUnit.SECONDS);
            long requestsMillis = (System.nanoTime() - start) / 1_000_000;
            assertTrue(hover == null || hover.getContents() != null);

            String broken = text.replace("-x)", "-y)");
            start = System.nanoTime();
            languageServer.didChange(new DidChangeTextDocumentParams(new VersionedTextDocumentIdentifier(uri, 2),
                    List.of(new TextDocumentContentChangeEvent(broken))));
            List<Diagnostic> after = diagnosticsOf(uri);
            long changeMillis = (System.nanoTime() - start) / 1_000_000;
            assertTrue(after.stream().anyMatch(d -> d.getRange().getStart().getLine() == 2
                    && d.getMessage().getLeft().contains("'y'")), after.toString());
            Assertions.assertEquals(List.of(), logged.messages());
            System.out.printf("deep nesting in the server: %d levels, open %d ms, symbols+hover %d ms, edit %d ms%n",
                    LEVELS, openMillis, requestsMillis, changeMillis);
        }
    }
}
