package org.phasewright.runtime.model;

/**
 * A rate-law expression over states, parameters, derived quantities and time.
 * Immutable; the language lowers its AST into this tree and every analysis starts from it.
 */
public sealed interface Expr permits Constant, Variable, Negation, Binary, Call, IndexValue, Element, Sum {
}
