package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionContext;
import org.eclipse.lsp4j.CodeActionKind;
import org.eclipse.lsp4j.CodeActionParams;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DiagnosticSeverity;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Test;
import org.phasewright.language.linking.PhaseLinkingDiagnosticMessageProvider;
import org.phasewright.language.validation.IssueCodes;

/** Diagnostics are published with positions and codes; each quick fix, applied, removes its problem. */
class DiagnosticsAndQuickFixTest extends LanguageServerTestBase {
    private static final String POND = """
            model pond "Algae in a pond"
            time t in d
            param growth = 0.4 "growth rate"
            param spare = 3
            state algae = 1
            state nutrient = 5
            rate algae = growht*algae*nutrient
            study look {
              simulate to days = 10
            }
            """;

    private static boolean hasCode(String text, String code) {
        return problems(text).stream().anyMatch(p -> code.equals(p.code()));
    }

    private List<CodeAction> actionsFor(String uri, Diagnostic diagnostic) {
        CodeActionParams params = new CodeActionParams(new TextDocumentIdentifier(uri), diagnostic.getRange(),
                new CodeActionContext(List.of(diagnostic)));
        return get(languageServer.codeAction(params)).stream().map(Either::getRight).toList();
    }

    private static String applyAction(String uri, CodeAction action) {
        return apply(POND, action.getEdit().getChanges().get(uri));
    }

    @Test
    void diagnosticsCarryPositionSeverityAndCode() {
        String uri = openModel("pond.phase", POND);
        Diagnostic unknown = diagnostic(uri, PhaseLinkingDiagnosticMessageProvider.UNKNOWN_NAME);
        Assertions.assertEquals(DiagnosticSeverity.Error, unknown.getSeverity());
        Assertions.assertEquals(new Range(positionOf(POND, "growht", 0, 0), positionOf(POND, "growht", 0, 6)), unknown.getRange());
        assertTrue(unknown.getMessage().getLeft().startsWith("Unknown name 'growht'"));
        Assertions.assertEquals(DiagnosticSeverity.Warning, diagnostic(uri, IssueCodes.UNUSED_PARAM).getSeverity());
        Assertions.assertEquals(positionOf(POND, "nutrient = 5", 0, 0),
                diagnostic(uri, IssueCodes.MISSING_RATE).getRange().getStart());
    }

    @Test
    void unknownNameIsChangedToTheClosestDeclaredName() {
        String uri = openModel("pond.phase", POND);
        List<CodeAction> actions = actionsFor(uri, diagnostic(uri, PhaseLinkingDiagnosticMessageProvider.UNKNOWN_NAME));
        // 'growht' -> 'growth' is one swap of neighbours (optimal string alignment distance 1).
        Assertions.assertEquals(List.of("Change to 'growth'", "Declare 'param growht = 0'"),
                actions.stream().map(CodeAction::getTitle).toList());
        Assertions.assertEquals(CodeActionKind.QuickFix, actions.get(0).getKind());
        String fixed = applyAction(uri, actions.get(0));
        assertTrue(fixed.contains("rate algae = growth*algae*nutrient"), fixed);
        assertTrue(!hasCode(fixed, PhaseLinkingDiagnosticMessageProvider.UNKNOWN_NAME), fixed);
        String declared = applyAction(uri, actions.get(1));
        assertTrue(declared.contains("param spare = 3\nparam growht = 0\n"), declared);
        assertTrue(!hasCode(declared, PhaseLinkingDiagnosticMessageProvider.UNKNOWN_NAME), declared);
    }

    @Test
    void missingRateIsAddedAfterTheLastRate() {
        String uri = openModel("pond.phase", POND);
        List<CodeAction> actions = actionsFor(uri, diagnostic(uri, IssueCodes.MISSING_RATE));
        Assertions.assertEquals(List.of("Add 'rate nutrient = 0'"), actions.stream().map(CodeAction::getTitle).toList());
        String fixed = applyAction(uri, actions.get(0));
        assertTrue(fixed.contains("rate algae = growht*algae*nutrient\nrate nutrient = 0\n"), fixed);
        assertTrue(!hasCode(fixed, IssueCodes.MISSING_RATE), fixed);
    }

    @Test
    void missingRateOfAFamilyNamesItsIndex() {
        String cells = """
                model cells
                index i in 1 .. 4 cyclic
                state x[i] = 1
                state y = 0
                rate y = -y
                """;
        String uri = openModel("cells.phase", cells);
        List<CodeAction> actions = actionsFor(uri, diagnostic(uri, IssueCodes.MISSING_RATE));
        Assertions.assertEquals(List.of("Add 'rate x[i] = 0'"), actions.stream().map(CodeAction::getTitle).toList());
        String fixed = apply(cells, actions.get(0).getEdit().getChanges().get(uri));
        assertTrue(fixed.contains("rate y = -y\nrate x[i] = 0\n"), fixed);
        assertTrue(!hasCode(fixed, IssueCodes.MISSING_RATE), fixed);
    }

    @Test
    void unusedParamIsRemovedWithItsLine() {
        String uri = openModel("pond.phase", POND);
        Diagnostic unused = diagnosticsOf(uri).stream()
                .filter(d -> d.getRange().getStart().equals(positionOf(POND, "spare", 0, 0))).findFirst().orElseThrow();
        List<CodeAction> actions = actionsFor(uri, unused);
        Assertions.assertEquals(List.of("Remove param 'spare'"), actions.stream().map(CodeAction::getTitle).toList());
        Assertions.assertEquals(POND.replace("param spare = 3\n", ""), applyAction(uri, actions.get(0)));
    }

    @Test
    void wrongTimeNameIsReplacedByTheModelsTime() {
        String uri = openModel("pond.phase", POND);
        List<CodeAction> actions = actionsFor(uri, diagnostic(uri, IssueCodes.WRONG_TIME_NAME));
        Assertions.assertEquals(List.of("Change to 't'"), actions.stream().map(CodeAction::getTitle).toList());
        String fixed = applyAction(uri, actions.get(0));
        assertTrue(fixed.contains("simulate to t = 10"), fixed);
        assertTrue(!hasCode(fixed, IssueCodes.WRONG_TIME_NAME), fixed);
    }
}
