package org.phasewright.language.ide.hover;

/** A hover for the token at {@code offset} (length {@code length}) of the document. */
public record HoverResult(int offset, int length, SymbolFacts facts) {
}
