package org.phasewright.language.ide.outline;

/** The kinds of entries in the outline of a `.phase` file. */
public enum OutlineKind {
    MODEL, TIME, PARAM, STATE, LET, RATE, SYMMETRY, STUDY, ANALYSIS
}
