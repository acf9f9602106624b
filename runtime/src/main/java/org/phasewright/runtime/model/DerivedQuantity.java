package org.phasewright.runtime.model;

/**
 * A `let` quantity. Its definition may refer to states, parameters, time and derived quantities that come
 * earlier in {@link DynamicalModel#derived()} (the language orders them). Unit may be null.
 */
public record DerivedQuantity(String name, Expr definition, String unit) {
}
