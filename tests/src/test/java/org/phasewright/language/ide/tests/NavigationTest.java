package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.stream.Collectors;

import org.eclipse.lsp4j.DefinitionParams;
import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.Location;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.ReferenceContext;
import org.eclipse.lsp4j.ReferenceParams;
import org.eclipse.lsp4j.RenameParams;
import org.eclipse.lsp4j.SymbolKind;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Test;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.PhaseFiles;
import org.phasewright.language.standalone.Problem;

/** Go to definition, find references, rename across the file, and the outline (document symbols). */
class NavigationTest extends LanguageServerTestBase {
    private static final String TEXT = ThermosyphonText.TEXT;

    private static Range rangeOf(String snippet, int occurrence, int length) {
        return new Range(positionOf(TEXT, snippet, occurrence, 0), positionOf(TEXT, snippet, occurrence, length));
    }

    @Test
    void definitionOfAReferenceIsItsDeclaredName() {
        String uri = openModel("loop.phase", TEXT);
        List<? extends Location> found = get(languageServer.definition(
                new DefinitionParams(new TextDocumentIdentifier(uri), positionOf(TEXT, "flux - k", 0, 2)))).getLeft();
        Assertions.assertEquals(1, found.size());
        Assertions.assertEquals(uri, found.get(0).getUri());
        Assertions.assertEquals(rangeOf("flux = q*h", 0, 4), found.get(0).getRange());
    }

    @Test
    void referencesOfAStateAreEveryUse() {
        String uri = openModel("loop.phase", TEXT);
        ReferenceParams params = new ReferenceParams(new TextDocumentIdentifier(uri),
                positionOf(TEXT, "state h", 0, 6), new ReferenceContext(false));
        List<? extends Location> found = get(languageServer.references(params));
        // Uses of h: (h - q) in rate q; q*h in flux; the target and "- h" of rate h; "h -> -h" twice.
        List<Position> expected = List.of(positionOf(TEXT, "h - q)", 0, 0), positionOf(TEXT, "q*h", 0, 2),
                positionOf(TEXT, "rate h", 0, 5), positionOf(TEXT, "- h -", 0, 2), positionOf(TEXT, "h -> -h", 0, 0),
                positionOf(TEXT, "h -> -h", 0, 6));
        Assertions.assertEquals(expected.stream().map(NavigationTest::key).sorted().toList(),
                found.stream().map(l -> key(l.getRange().getStart())).sorted().toList());
        assertTrue(found.stream().allMatch(l -> l.getUri().equals(uri)));
    }

    private static String key(Position p) {
        return String.format("%03d:%03d", p.getLine(), p.getCharacter());
    }

    @Test
    void renameChangesTheDeclarationAndEveryUse() {
        String uri = openModel("loop.phase", TEXT);
        WorkspaceEdit edit = get(languageServer.rename(
                new RenameParams(new TextDocumentIdentifier(uri), positionOf(TEXT, "ra*q", 0, 1), "heating")));
        List<TextEdit> edits = edit.getChanges().get(uri);
        String renamed = apply(TEXT, edits);
        Assertions.assertEquals(TEXT.replace("param ra =", "param heating =").replace("ra*q", "heating*q"), renamed);
        CheckedModel checked = new PhaseFiles().check("renamed.phase",
                org.eclipse.emf.common.util.URI.createURI("inmemory:/renamed.phase"), renamed);
        assertTrue(checked.problems().stream().allMatch(p -> p.severity() == Problem.Severity.INFO),
                () -> checked.problems().toString());
    }

    @Test
    void renameRefusesKeywordsNonNamesAndTakenNames() {
        String uri = openModel("loop.phase", TEXT);
        for (String bad : List.of("rate", "2ra", "k")) {
            RenameParams params = new RenameParams(new TextDocumentIdentifier(uri), positionOf(TEXT, "ra*q", 0, 1), bad);
            ExecutionException refused = assertThrows(ExecutionException.class,
                    () -> languageServer.rename(params).get());
            assertTrue(refused.getCause() instanceof ResponseErrorException, refused::toString);
            assertTrue(refused.getCause().getMessage().contains("'" + bad + "'"), refused.getCause()::getMessage);
        }
    }

    @Test
    void outlineListsDeclarationsInFileOrder() {
        String uri = openModel("loop.phase", TEXT);
        List<DocumentSymbol> symbols = get(languageServer.documentSymbol(
                new DocumentSymbolParams(new TextDocumentIdentifier(uri)))).stream().map(e -> e.getRight()).toList();
        Assertions.assertEquals(1, symbols.size());
        DocumentSymbol model = symbols.get(0);
        Assertions.assertEquals("thermosyphon", model.getName());
        Assertions.assertEquals(SymbolKind.Module, model.getKind());
        Assertions.assertEquals(List.of("t", "p", "ra", "k", "q", "h", "v", "flux", "speed", "dq/dt", "dh/dt", "dv/dt",
                "reversal", "first_look"), model.getChildren().stream().map(DocumentSymbol::getName).toList());
        DocumentSymbol study = model.getChildren().get(13);
        Assertions.assertEquals(List.of("simulate to t = 5", "equilibria"),
                study.getChildren().stream().map(DocumentSymbol::getName).collect(Collectors.toList()));
        DocumentSymbol ra = model.getChildren().get(2);
        Assertions.assertEquals(SymbolKind.Constant, ra.getKind());
        Assertions.assertEquals("= 28", ra.getDetail());
        // LSP 3.17, DocumentSymbol: selectionRange must be contained in range.
        for (DocumentSymbol child : model.getChildren()) {
            assertTrue(contains(child.getRange(), child.getSelectionRange()), child::getName);
        }
        Assertions.assertEquals(rangeOf("ra = 28", 0, 2), ra.getSelectionRange());
    }

    private static boolean contains(Range outer, Range inner) {
        return compare(outer.getStart(), inner.getStart()) <= 0 && compare(inner.getEnd(), outer.getEnd()) <= 0;
    }

    private static int compare(Position a, Position b) {
        return a.getLine() != b.getLine() ? Integer.compare(a.getLine(), b.getLine())
                : Integer.compare(a.getCharacter(), b.getCharacter());
    }
}
