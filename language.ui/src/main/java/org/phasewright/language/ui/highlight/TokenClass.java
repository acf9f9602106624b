package org.phasewright.language.ui.highlight;

/** What a stretch of `.phase` text is, for colouring: lexical classes first, then the kinds of declared names. */
public enum TokenClass {
    KEYWORD, NUMBER, STRING, COMMENT, OPERATOR, FUNCTION, IDENTIFIER, WHITESPACE,
    /** Names resolved against the model's declarations (semantic colouring). */
    STATE, PARAM, LET, TIME
}
