package org.phasewright.language.ui.highlight;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.phasewright.language.ui.PhaseLanguage;
import org.phasewright.language.ui.ExampleModels;

class PhaseLexerTest {
    private final PhaseLexer lexer = new PhaseLexer();

    private static TokenClass classAt(List<Span> spans, String text, String word, int occurrence) {
        int at = -1;
        for (int i = 0; i <= occurrence; i++) {
            at = text.indexOf(word, at + 1);
        }
        for (Span span : spans) {
            if (span.offset() == at) {
                assertEquals(word.length(), span.length(), "span of '" + word + "'");
                return span.tokenClass();
            }
        }
        throw new AssertionError("no span starts at '" + word + "'");
    }

    @Test
    void classifiesKeywordsNumbersStringsCommentsAndOperators() {
        String text = "// heat\nmodel m \"title\"\nparam a = 2.5e-3 /* two\nlines */ state x = 1\nrate x = -a*x^2\n";
        List<Span> spans = lexer.scan(text, Map.of());
        assertEquals(TokenClass.COMMENT, classAt(spans, text, "// heat\n", 0), "a line comment takes its line end");
        assertEquals(TokenClass.KEYWORD, classAt(spans, text, "model", 0));
        assertEquals(TokenClass.STRING, classAt(spans, text, "\"title\"", 0));
        assertEquals(TokenClass.NUMBER, classAt(spans, text, "2.5e-3", 0));
        assertEquals(TokenClass.COMMENT, classAt(spans, text, "/* two\nlines */", 0));
        assertEquals(TokenClass.KEYWORD, classAt(spans, text, "state", 0));
        assertEquals(TokenClass.OPERATOR, classAt(spans, text, "^", 0));
        int name = text.indexOf("-a*") + 1;
        assertTrue(spans.contains(new Span(name, 1, TokenClass.IDENTIFIER)), "without a parse, names are plain");
    }

    @Test
    void declaredNamesGetTheirKindAndCalledFunctionsAreFunctions() {
        String text = ExampleModels.read("thermosyphon.phase");
        Map<String, TokenClass> kinds = DeclaredKinds.of(PhaseLanguage.get().check("t", "t.phase", text).ast());
        assertEquals(Map.of("t", TokenClass.TIME, "p", TokenClass.PARAM, "ra", TokenClass.PARAM, "k",
                TokenClass.PARAM, "q", TokenClass.STATE, "h", TokenClass.STATE, "v", TokenClass.STATE, "flux",
                TokenClass.LET), kinds);
        List<Span> spans = lexer.scan(text, kinds);
        int rate = text.indexOf("rate v = flux - k*v");
        assertEquals(TokenClass.LET, classAt(spans, text, "flux", countBefore(text, "flux", rate)));
        String call = "rate x = sin(x) + sin";
        List<Span> callSpans = lexer.scan(call, Map.of("x", TokenClass.STATE));
        assertEquals(TokenClass.FUNCTION, classAt(callSpans, call, "sin", 0));
        assertEquals(TokenClass.IDENTIFIER, classAt(callSpans, call, "sin", 1), "a function name not called");
        assertEquals(TokenClass.STATE, classAt(callSpans, call, "x", 1));
    }

    private static int countBefore(String text, String word, int end) {
        int count = 0;
        for (int at = text.indexOf(word); at >= 0 && at < end; at = text.indexOf(word, at + 1)) {
            count++;
        }
        return count;
    }

    @Test
    void spansAreOrderedAndDisjointEvenWithAnUnclosedString() {
        String text = "model m\nstate x = 1 \"never closed\nrate x = x $ 2\n";
        List<Span> spans = lexer.scan(text, Map.of());
        int end = 0;
        for (Span span : spans) {
            assertTrue(span.offset() >= end, "overlap at " + span);
            assertTrue(span.end() <= text.length());
            end = span.end();
        }
    }
}
