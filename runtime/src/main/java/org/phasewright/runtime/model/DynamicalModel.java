package org.phasewright.runtime.model;

import java.util.List;

/**
 * The runtime form of a `.phase` model: an autonomous or forced system du/dt = f(t, u; p).
 * {@code rates.get(i)} is the rate of {@code states.get(i)}. Title may be null.
 */
public record DynamicalModel(String name, String title, TimeAxis time, List<StateVariable> states,
        List<Parameter> parameters, List<DerivedQuantity> derived, List<Expr> rates, List<Symmetry> symmetries,
        List<Study> studies) {

    public DynamicalModel {
        states = List.copyOf(states);
        parameters = List.copyOf(parameters);
        derived = List.copyOf(derived);
        rates = List.copyOf(rates);
        symmetries = List.copyOf(symmetries);
        studies = List.copyOf(studies);
        if (rates.size() != states.size()) {
            throw new IllegalArgumentException(
                    "model " + name + ": " + states.size() + " states but " + rates.size() + " rates");
        }
    }

    public int dimension() {
        return states.size();
    }
}
