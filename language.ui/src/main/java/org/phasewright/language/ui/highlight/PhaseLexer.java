package org.phasewright.language.ui.highlight;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.antlr.runtime.ANTLRStringStream;
import org.antlr.runtime.Token;
import org.phasewright.language.parser.antlr.internal.InternalPhaseLexer;
import org.phasewright.language.parser.antlr.internal.InternalPhaseParser;
import org.phasewright.runtime.model.MathFunction;

/**
 * Splits `.phase` text into classified spans with the language's own generated lexer, so colouring agrees with the
 * parser on every keyword, number and comment. Plain Java: no SWT, no OSGi.
 */
public final class PhaseLexer {

    /**
     * Classifies all of {@code text}. Identifiers that name a declared symbol get that symbol's class from
     * {@code declaredKinds}; an identifier followed by '(' that names a known function is a FUNCTION. Gaps the lexer
     * could not read (a stray character, an unclosed string) are left out.
     */
    public List<Span> scan(String text, Map<String, TokenClass> declaredKinds) {
        InternalPhaseLexer lexer = new InternalPhaseLexer(new ANTLRStringStream(text));
        List<Span> spans = new ArrayList<>();
        Token token;
        while ((token = lexer.nextToken()).getType() != Token.EOF) {
            if (!(token instanceof org.antlr.runtime.CommonToken common)) {
                continue;
            }
            int start = common.getStartIndex();
            int length = common.getStopIndex() - start + 1;
            if (length <= 0) {
                continue;
            }
            TokenClass tokenClass = classify(token.getType(), token.getText());
            if (tokenClass == TokenClass.IDENTIFIER) {
                tokenClass = identifierClass(text, start + length, token.getText(), declaredKinds);
            }
            spans.add(new Span(start, length, tokenClass));
        }
        return spans;
    }

    static TokenClass classify(int type, String text) {
        String name = type >= 0 && type < InternalPhaseParser.tokenNames.length ? InternalPhaseParser.tokenNames[type]
                : "";
        switch (name) {
            case "RULE_ID":
                return TokenClass.IDENTIFIER;
            case "RULE_INT":
            case "RULE_DECIMAL":
                return TokenClass.NUMBER;
            case "RULE_STRING":
                return TokenClass.STRING;
            case "RULE_SL_COMMENT":
            case "RULE_ML_COMMENT":
                return TokenClass.COMMENT;
            case "RULE_WS":
                return TokenClass.WHITESPACE;
            default:
                // Literal tokens are named with their quotes: 'model', '->', ...
                return name.length() > 2 && Character.isLetter(name.charAt(1)) ? TokenClass.KEYWORD
                        : TokenClass.OPERATOR;
        }
    }

    private static TokenClass identifierClass(String text, int after, String word, Map<String, TokenClass> declared) {
        TokenClass kind = declared.get(word);
        if (kind != null) {
            return kind;
        }
        int next = after;
        while (next < text.length() && Character.isWhitespace(text.charAt(next))) {
            next++;
        }
        boolean called = next < text.length() && text.charAt(next) == '(';
        return called && MathFunction.byNotationName(word).isPresent() ? TokenClass.FUNCTION : TokenClass.IDENTIFIER;
    }
}
