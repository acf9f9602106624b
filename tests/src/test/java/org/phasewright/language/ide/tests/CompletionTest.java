package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

import org.eclipse.lsp4j.CompletionItem;
import org.eclipse.lsp4j.CompletionItemKind;
import org.eclipse.lsp4j.CompletionParams;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.lsp4j.CompletionList;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Test;

/**
 * Content assist over the language server: names that fit the place, functions, units, the time name, keywords.
 * Expected sets follow the notation reference (docs/notation.md: which declarations a place may use).
 */
class CompletionTest extends LanguageServerTestBase {
    private static final String TEXT = ThermosyphonText.TEXT;

    private List<CompletionItem> completeAt(Position position) {
        String uri = openModel("loop.phase", TEXT);
        Either<List<CompletionItem>, CompletionList> result = get(
                languageServer.completion(new CompletionParams(new TextDocumentIdentifier(uri), position)));
        return result.isLeft() ? result.getLeft() : result.getRight().getItems();
    }

    private static Set<String> labels(List<CompletionItem> items) {
        return items.stream().map(CompletionItem::getLabel).collect(Collectors.toSet());
    }

    @Test
    void rateLawOffersEverySymbolFunctionsAndPi() {
        List<CompletionItem> items = completeAt(positionOf(TEXT, "ra*q - h", 0, 0));
        Set<String> labels = labels(items);
        // A rate law may use states, params, lets and the declared time (docs/notation.md, Declarations).
        assertTrue(labels.containsAll(Set.of("p", "ra", "k", "q", "h", "v", "flux", "speed", "t")), labels::toString);
        assertTrue(labels.containsAll(Set.of("sin", "exp", "max", "pi")), labels::toString);
        assertFalse(labels.contains("thermosyphon.q"), "qualified names are noise in a one-model file");
        assertFalse(labels.contains("="), "punctuation is not offered");
        CompletionItem ra = items.stream().filter(i -> i.getLabel().equals("ra")).findFirst().orElseThrow();
        Assertions.assertEquals("param — scaled heating", ra.getDetail());
        CompletionItem max = items.stream().filter(i -> i.getLabel().equals("max")).findFirst().orElseThrow();
        Assertions.assertEquals(CompletionItemKind.Function, max.getKind());
        Assertions.assertEquals("function max(a, b)", max.getDetail());
    }

    @Test
    void rateTargetOffersStatesOnly() {
        Set<String> labels = labels(completeAt(positionOf(TEXT, "q = p*(h - q)", 0, 0)));
        assertTrue(labels.containsAll(Set.of("q", "h", "v")), labels::toString);
        assertTrue(labels.stream().noneMatch(Set.of("p", "ra", "k", "flux", "speed", "t")::contains), labels::toString);
    }

    @Test
    void paramValueOffersParamsOnly() {
        Set<String> labels = labels(completeAt(positionOf(TEXT, "28 range", 0, 0)));
        assertTrue(labels.containsAll(Set.of("p", "k")), labels::toString);
        assertTrue(labels.stream().noneMatch(Set.of("q", "h", "v", "flux", "t")::contains), labels::toString);
    }

    @Test
    void unitPlaceOffersUnitsUsedInTheFileAndSiUnits() {
        List<CompletionItem> items = completeAt(positionOf(TEXT, "m/s \"loop", 0, 0));
        Set<String> labels = labels(items);
        // SI base units (BIPM, The International System of Units, 9th edition 2019, table 2).
        assertTrue(labels.containsAll(Set.of("m", "s", "kg", "mol", "K")), labels::toString);
        assertTrue(items.stream().filter(i -> i.getLabel().equals("kg"))
                .allMatch(i -> i.getKind() == CompletionItemKind.Unit));
        assertFalse(labels.contains("q"), "names of the model are not units");
    }

    @Test
    void simulationOffersTheModelsTimeName() {
        Set<String> labels = labels(completeAt(positionOf(TEXT, "t = 5", 0, 0)));
        Assertions.assertEquals(Set.of("t"), labels);
    }

    @Test
    void declarationStartOffersKeywords() {
        Set<String> labels = labels(completeAt(positionOf(TEXT, "symmetry reversal", 0, 0)));
        assertTrue(labels.containsAll(Set.of("param", "state", "let", "rate", "symmetry", "study")), labels::toString);
    }
}
