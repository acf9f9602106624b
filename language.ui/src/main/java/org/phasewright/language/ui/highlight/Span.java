package org.phasewright.language.ui.highlight;

/** A classified stretch of text: 0-based {@code offset}, {@code length} characters. */
public record Span(int offset, int length, TokenClass tokenClass) {
    public int end() {
        return offset + length;
    }
}
