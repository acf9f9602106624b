package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensLegend;
import org.eclipse.lsp4j.SemanticTokensParams;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Test;

/**
 * Semantic tokens, decoded as the LSP 3.17 specification describes (textDocument/semanticTokens: five integers per
 * token — line delta, start delta relative to the previous token on the same line, length, index into the legend's
 * token types, bit set over the legend's modifiers).
 */
class SemanticTokensTest extends LanguageServerTestBase {
    private static final String TEXT = ThermosyphonText.TEXT;

    record Token(int line, int character, int length, String type, Set<String> modifiers) {
    }

    private List<Token> tokens;

    @BeforeEach
    void requestTokens() {
        String uri = openModel("loop.phase", TEXT);
        SemanticTokens result = get(languageServer.semanticTokensFull(
                new SemanticTokensParams(new TextDocumentIdentifier(uri))));
        SemanticTokensLegend legend = initializeResult.getCapabilities().getSemanticTokensProvider().getLegend();
        tokens = decode(result.getData(), legend);
    }

    private static List<Token> decode(List<Integer> data, SemanticTokensLegend legend) {
        Assertions.assertEquals(0, data.size() % 5, "five integers per token");
        List<Token> decoded = new ArrayList<>();
        int line = 0;
        int character = 0;
        for (int i = 0; i < data.size(); i += 5) {
            int deltaLine = data.get(i);
            int deltaStart = data.get(i + 1);
            assertTrue(deltaLine >= 0 && deltaStart >= 0, "tokens are sorted");
            line += deltaLine;
            character = deltaLine == 0 ? character + deltaStart : deltaStart;
            Set<String> modifiers = new TreeSet<>();
            for (int bit = 0; bit < legend.getTokenModifiers().size(); bit++) {
                if ((data.get(i + 4) & (1 << bit)) != 0) {
                    modifiers.add(legend.getTokenModifiers().get(bit));
                }
            }
            decoded.add(new Token(line, character, data.get(i + 2), legend.getTokenTypes().get(data.get(i + 3)),
                    modifiers));
        }
        return decoded;
    }

    private Token tokenAt(String snippet, int occurrence, int shift) {
        Position at = positionOf(TEXT, snippet, occurrence, shift);
        return tokens.stream().filter(t -> t.line() == at.getLine() && t.character() == at.getCharacter()).findFirst()
                .orElseThrow(() -> new AssertionError("no token at " + snippet));
    }

    @Test
    void namesAreColouredByWhatTheyDeclare() {
        Assertions.assertEquals(new Token(positionOf(TEXT, "state q", 0, 6).getLine(), 6, 1, "variable", Set.of("declaration")),
                tokenAt("state q", 0, 6));
        Assertions.assertEquals(new Token(tokenAt("ra*q", 0, 0).line(), tokenAt("ra*q", 0, 0).character(), 2, "parameter",
                Set.of("readonly")), tokenAt("ra*q", 0, 0));
        Assertions.assertEquals("property", tokenAt("flux - k", 0, 0).type());
        Assertions.assertEquals(Set.of("declaration", "static"), tokenAt("time t", 0, 5).modifiers());
        Assertions.assertEquals(Set.of("static"), tokenAt("t = 5", 0, 0).modifiers());
        Assertions.assertEquals("namespace", tokenAt("thermosyphon", 0, 0).type());
        Assertions.assertEquals("struct", tokenAt("reversal", 0, 0).type());
    }

    @Test
    void lexicalTokensAreClassified() {
        Assertions.assertEquals("comment", tokenAt("// Solar", 0, 0).type());
        Assertions.assertEquals("keyword", tokenAt("param ra", 0, 0).type());
        Assertions.assertEquals("number", tokenAt("28", 0, 0).type());
        Assertions.assertEquals("string", tokenAt("\"scaled heating\"", 0, 0).type());
        Assertions.assertEquals(new Token(tokenAt("abs(", 0, 0).line(), tokenAt("abs(", 0, 0).character(), 3, "function",
                Set.of("defaultLibrary")), tokenAt("abs(", 0, 0));
        Assertions.assertEquals("type", tokenAt("m/s \"loop", 0, 0).type());
        Assertions.assertEquals("type", tokenAt("m/s \"loop", 0, 2).type());
        Assertions.assertEquals("operator", tokenAt("m/s \"loop", 0, 1).type());
    }

    @Test
    void tokensDoNotOverlap() {
        for (int i = 1; i < tokens.size(); i++) {
            Token previous = tokens.get(i - 1);
            Token current = tokens.get(i);
            assertTrue(current.line() > previous.line()
                    || current.character() >= previous.character() + previous.length(), current::toString);
        }
    }
}
