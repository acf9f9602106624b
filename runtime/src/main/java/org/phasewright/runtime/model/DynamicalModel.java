package org.phasewright.runtime.model;

import java.util.List;

/**
 * The runtime form of a `.phase` model: an autonomous or forced system du/dt = f(t, u; p).
 * {@code rates.get(i)} is the rate of {@code states.get(i)}. Title may be null.
 * <p>
 * States, parameters, derived quantities and rates are flat lists of scalars. Indexed declarations appear there
 * element by element (named {@code x[3]}), expanded on demand ({@link ExpandedList}), and once more in
 * {@code families} with their formula over the index, which compilers turn into loops.
 */
public record DynamicalModel(String name, String title, TimeAxis time, List<StateVariable> states,
        List<Parameter> parameters, List<DerivedQuantity> derived, List<Expr> rates, List<Symmetry> symmetries,
        List<Study> studies, List<Family> families) {

    public DynamicalModel {
        states = ExpandedList.immutable(states);
        parameters = ExpandedList.immutable(parameters);
        derived = ExpandedList.immutable(derived);
        rates = ExpandedList.immutable(rates);
        symmetries = List.copyOf(symmetries);
        studies = List.copyOf(studies);
        families = List.copyOf(families);
        if (rates.size() != states.size()) {
            throw new IllegalArgumentException(
                    "model " + name + ": " + states.size() + " states but " + rates.size() + " rates");
        }
        for (Family f : families) {
            int available = switch (f.kind()) {
                case STATE -> states.size();
                case PARAMETER -> parameters.size();
                case DERIVED -> derived.size();
                case TIME -> 0;
            };
            if (f.offset() + (long) f.size() > available) {
                throw new IllegalArgumentException("model " + name + ": family " + f.name() + " runs past the "
                        + available + " flat variables of its kind");
            }
        }
    }

    /** A model without indexed families. */
    public DynamicalModel(String name, String title, TimeAxis time, List<StateVariable> states,
            List<Parameter> parameters, List<DerivedQuantity> derived, List<Expr> rates, List<Symmetry> symmetries,
            List<Study> studies) {
        this(name, title, time, states, parameters, derived, rates, symmetries, studies, List.of());
    }

    public int dimension() {
        return states.size();
    }

    /** The families of one kind, in declaration order. */
    public List<Family> families(VariableKind kind) {
        return families.stream().filter(f -> f.kind() == kind).toList();
    }

    /** True when some declaration is indexed. */
    public boolean indexed() {
        return !families.isEmpty();
    }
}
