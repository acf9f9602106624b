package org.phasewright.language.ide.highlighting;

/**
 * What a piece of `.phase` text is, as far as colouring goes. Names declared in the model carry their role (a state
 * colours differently from a param), so a reader sees at a glance what a rate law depends on.
 */
public enum SemanticKind {
    KEYWORD, OPERATOR, COMMENT, STRING, NUMBER,
    /** The built-in constant `pi`. */
    CONSTANT,
    /** A built-in function such as `sin` or `max`. */
    FUNCTION,
    /** A unit name in `in ...` (or `1` for dimensionless). */
    UNIT,
    MODEL, STATE, PARAM, LET, TIME, SYMMETRY, STUDY
}
