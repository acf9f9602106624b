package org.phasewright.language.ui.highlight;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.TextAttribute;
import org.eclipse.jface.text.rules.IToken;
import org.eclipse.jface.text.rules.ITokenScanner;
import org.eclipse.jface.text.rules.Token;

/**
 * Feeds the editor's presentation reconciler from {@link PhaseLexer}. The whole document is lexed once per change
 * (models are small), which keeps multi-line block comments right without partitioning.
 */
public final class PhaseTokenScanner implements ITokenScanner {
    private final PhaseLexer lexer = new PhaseLexer();
    private final Map<TokenClass, IToken> tokens = new EnumMap<>(TokenClass.class);
    private volatile Map<String, TokenClass> declaredKinds = Map.of();

    private List<Span> spans = List.of();
    private int index;
    private int rangeEnd;
    private int cursor;
    private Span pending;
    private int tokenOffset;
    private int tokenLength;

    public PhaseTokenScanner(Map<TokenClass, TextAttribute> attributes) {
        for (TokenClass tokenClass : TokenClass.values()) {
            TextAttribute attribute = attributes.get(tokenClass);
            tokens.put(tokenClass, attribute == null ? Token.UNDEFINED : new Token(attribute));
        }
    }

    /** Updates the names used for semantic colouring; the caller then asks the viewer to redraw. */
    public void setDeclaredKinds(Map<String, TokenClass> kinds) {
        this.declaredKinds = Map.copyOf(kinds);
    }

    @Override
    public void setRange(IDocument document, int offset, int length) {
        spans = lexer.scan(document.get(), declaredKinds);
        rangeEnd = offset + length;
        cursor = offset;
        pending = null;
        index = 0;
        while (index < spans.size() && spans.get(index).end() <= offset) {
            index++;
        }
    }

    @Override
    public IToken nextToken() {
        if (cursor >= rangeEnd) {
            return Token.EOF;
        }
        if (pending == null && index < spans.size() && spans.get(index).offset() < rangeEnd) {
            pending = spans.get(index++);
        }
        if (pending == null || pending.offset() > cursor) {
            // A gap the lexer skipped (or the rest of the range): default colour up to the next span.
            int gapEnd = pending == null ? rangeEnd : Math.min(pending.offset(), rangeEnd);
            return emit(cursor, gapEnd - cursor, Token.UNDEFINED);
        }
        Span span = pending;
        pending = null;
        int start = Math.max(span.offset(), cursor);
        int end = Math.min(span.end(), rangeEnd);
        return emit(start, end - start, span.tokenClass() == TokenClass.WHITESPACE ? Token.WHITESPACE
                : tokens.get(span.tokenClass()));
    }

    private IToken emit(int offset, int length, IToken token) {
        tokenOffset = offset;
        tokenLength = length;
        cursor = offset + length;
        return token;
    }

    @Override
    public int getTokenOffset() {
        return tokenOffset;
    }

    @Override
    public int getTokenLength() {
        return tokenLength;
    }
}
