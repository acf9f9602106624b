package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Test;
import org.phasewright.language.linking.PhaseLinkingDiagnosticMessageProvider;
import org.phasewright.language.standalone.Problem;

/**
 * CR, LF and CRLF are each one line break for the server as for {@code phasewright check} (the LSP specification
 * counts all three); the expected positions are the command-line checker's, which reads a lone CR as LF.
 */
class LineBreaksInServerTest extends LanguageServerTestBase {
    /** An unknown name (`algea`) on line 3, column 18, whatever the line ends. */
    private static final String POND = """
            model pond "Algae in a pond"
            state algae = 1
            rate algae = 0.4*algea
            study look {
              simulate to days = 10
            }
            """;

    /** The checker's problems as LSP ranges' starts (0-based), with their messages. */
    private static List<String> checkerSays(String text) {
        List<String> said = new ArrayList<>();
        for (Problem p : problems(text)) {
            said.add((p.line() - 1) + ":" + (p.column() - 1) + " " + p.message());
        }
        return said;
    }

    private List<String> serverSays(String uri) {
        List<String> said = new ArrayList<>();
        for (Diagnostic d : diagnosticsOf(uri)) {
            said.add(d.getRange().getStart().getLine() + ":" + d.getRange().getStart().getCharacter() + " "
                    + d.getMessage().getLeft());
        }
        return said;
    }

    private static void assertSameProblems(List<String> checker, List<String> server) {
        Assertions.assertEquals(checker.stream().sorted().toList(), server.stream().sorted().toList());
    }

    private Diagnostic unknownName(String uri) {
        return diagnostic(uri, PhaseLinkingDiagnosticMessageProvider.UNKNOWN_NAME);
    }

    @Test
    void loneCarriageReturnsAreLineBreaks() {
        String text = POND.replace('\n', '\r');
        initialize();
        try (LoggedErrors logged = new LoggedErrors()) {
            String uri = openAsIs("old-mac.phase", text);
            // Line 3, column 18 (1-based), as an editor that shows old-Mac line ends counts them.
            Assertions.assertEquals(new Range(new Position(2, 17), new Position(2, 22)), unknownName(uri).getRange());
            assertSameProblems(checkerSays(text), serverSays(uri));
            Assertions.assertEquals(List.of(), logged.messages());
        }
    }

    @Test
    void mixedLineEndsGiveTheCheckersPositions() {
        String text = POND.replaceFirst("\n", "\r\n").replaceFirst("\n(?=rate)", "\r").replaceFirst("\n(?=study)",
                "\r\n");
        initialize();
        String uri = openAsIs("mixed.phase", text);
        Assertions.assertEquals(new Position(2, 17), unknownName(uri).getRange().getStart());
        assertSameProblems(checkerSays(text), serverSays(uri));
    }

    @Test
    void aTrailingLoneCarriageReturnKeepsTheSyntaxErrorAndLogsNothing() {
        // The study is not closed: a syntax error at the end of the text, which used to be lost (and logged).
        String text = POND.replace('\n', '\r').substring(0, POND.lastIndexOf('}'));
        assertTrue(text.endsWith("\r"));
        initialize();
        try (LoggedErrors logged = new LoggedErrors()) {
            String uri = openAsIs("unclosed.phase", text);
            List<String> expected = checkerSays(text);
            assertTrue(expected.stream().anyMatch(p -> p.contains("'<EOF>'")), "checker: " + expected);
            assertSameProblems(expected, serverSays(uri));
            Assertions.assertEquals(List.of(), logged.messages());
        }
    }

    @Test
    void filesReadFromDiskAreReadAsTheCheckerReadsThem() {
        String text = POND.replace('\n', '\r').substring(0, POND.lastIndexOf('}'));
        try (LoggedErrors logged = new LoggedErrors()) {
            String uri = writeFile("on-disk.phase", text);
            initialize(); // builds the workspace, file not opened
            assertSameProblems(checkerSays(text), serverSays(uri));
            Assertions.assertEquals(List.of(), logged.messages());
        }
    }

    @Test
    void anIncrementalEditAfterALoneCarriageReturnMakesOneLineBreak() {
        // The client's text: the first line ends in a lone CR; inserting LF right after it makes one CRLF break,
        // so the unknown name stays on line 3.
        String text = POND.replace('\n', '\r');
        initialize();
        String uri = openAsIs("edited.phase", text);
        int afterFirstCr = text.indexOf('\r') + 1;
        TextDocumentContentChangeEvent insertLf = new TextDocumentContentChangeEvent(
                new Range(new Position(1, 0), new Position(1, 0)), "\n");
        languageServer.didChange(new DidChangeTextDocumentParams(new VersionedTextDocumentIdentifier(uri, 2),
                List.of(insertLf)));
        String edited = text.substring(0, afterFirstCr) + "\n" + text.substring(afterFirstCr);
        Assertions.assertEquals(new Position(2, 17), unknownName(uri).getRange().getStart());
        assertSameProblems(checkerSays(edited), serverSays(uri));
        // An edit inside line 3, addressed with lone-CR line counting: `algea` becomes `algae`.
        TextDocumentContentChangeEvent fix = new TextDocumentContentChangeEvent(
                new Range(new Position(2, 17), new Position(2, 22)), "algae");
        languageServer.didChange(new DidChangeTextDocumentParams(new VersionedTextDocumentIdentifier(uri, 3),
                List.of(fix)));
        Assertions.assertEquals(List.of(), serverSays(uri).stream().filter(s -> s.contains("algea")).toList());
        assertSameProblems(checkerSays(edited.replace("algea", "algae")), serverSays(uri));
    }
}
