package org.phasewright.runtime.model;

/** What a {@link Variable} refers to; its index counts within the model's list of that kind. */
public enum VariableKind {
    STATE, PARAMETER, DERIVED, TIME
}
