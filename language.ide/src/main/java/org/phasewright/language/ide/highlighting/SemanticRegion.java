package org.phasewright.language.ide.highlighting;

/**
 * One classified token: {@code length} characters at {@code offset} of the document text are a {@code kind};
 * {@code declaration} is true where the name is declared rather than used.
 */
public record SemanticRegion(int offset, int length, SemanticKind kind, boolean declaration) {
}
