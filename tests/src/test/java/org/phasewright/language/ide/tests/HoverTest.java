package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;

import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Test;

/** Hover over names: description, value (evaluated when it is a formula), range, unit, rate law, functions. */
class HoverTest extends LanguageServerTestBase {
    private static final String TEXT = ThermosyphonText.TEXT;

    private Hover hoverAt(Position position) {
        String uri = openModel("loop.phase", TEXT);
        return get(languageServer.hover(new HoverParams(new TextDocumentIdentifier(uri), position)));
    }

    private static String markdown(Hover hover) {
        return Optional.ofNullable(hover.getContents()).filter(c -> c.isRight()).map(c -> c.getRight().getValue())
                .orElse("");
    }

    @Test
    void paramReferenceShowsDescriptionValueAndRange() {
        Position at = positionOf(TEXT, "ra*q", 0, 1);
        Hover hover = hoverAt(at);
        String text = markdown(hover);
        assertTrue(text.startsWith("**param** `ra` — scaled heating"), text);
        assertTrue(text.contains("value: `28`"), text);
        assertTrue(text.contains("range: `0 .. 60`"), text);
        // The hover covers exactly the hovered name.
        Assertions.assertEquals(positionOf(TEXT, "ra*q", 0, 0), hover.getRange().getStart());
        Assertions.assertEquals(positionOf(TEXT, "ra*q", 0, 2), hover.getRange().getEnd());
    }

    @Test
    void formulaValueIsEvaluated() {
        // 8/3 = 2.666..., shown to six significant digits.
        String text = markdown(hoverAt(positionOf(TEXT, "k*v", 0, 0)));
        assertTrue(text.contains("value: `8/3 (= 2.66667)`"), text);
    }

    @Test
    void stateDeclarationShowsUnitAndRateLaw() {
        String text = markdown(hoverAt(positionOf(TEXT, "state q", 0, 6)));
        assertTrue(text.startsWith("**state** `q` — loop flow"), text);
        assertTrue(text.contains("initial value: `1`"), text);
        assertTrue(text.contains("unit: `m/s`"), text);
        assertTrue(text.contains("rate: `p*(h - q)`"), text);
    }

    @Test
    void builtInFunctionIsExplained() {
        String text = markdown(hoverAt(positionOf(TEXT, "abs(q)", 0, 1)));
        assertTrue(text.startsWith("**function** `abs` — absolute value"), text);
    }

    @Test
    void keywordsHaveNoHover() {
        Assertions.assertEquals("", markdown(hoverAt(positionOf(TEXT, "rate h", 0, 1))));
    }
}
