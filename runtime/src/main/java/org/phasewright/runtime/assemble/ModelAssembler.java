package org.phasewright.runtime.assemble;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.IntFunction;

import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.ExpandedList;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Parameter;
import org.phasewright.runtime.model.ParameterRange;
import org.phasewright.runtime.model.StateVariable;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.model.Symmetry;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.IndexExpansion;

/**
 * Builds a {@link DynamicalModel} from scalar and indexed declarations in declaration order. Indexed declarations
 * become one {@link Family} each plus a run of flat elements expanded on demand, so a family of 10^6 elements costs a
 * few objects. Formulas of a family refer to its index as {@code new IndexValue(range.name())} and to elements of
 * families through {@link #element}.
 * <p>
 * Declare every state, parameter and derived quantity first, then give each state (or state family) its rate.
 */
public final class ModelAssembler {
    private final String name;
    private final String title;
    private final TimeAxis time;

    private final ExpandedList.Builder<StateVariable> states = ExpandedList.builder();
    private final ExpandedList.Builder<Parameter> parameters = ExpandedList.builder();
    private final ExpandedList.Builder<DerivedQuantity> derived = ExpandedList.builder();
    private final Map<String, Family> families = new LinkedHashMap<>();
    private final Map<Integer, Expr> scalarRates = new HashMap<>();
    private final Map<String, Expr> familyRates = new HashMap<>();

    public ModelAssembler(String name, String title, TimeAxis time) {
        this.name = name;
        this.title = title;
        this.time = time;
    }

    // ---- scalars

    public Variable state(String stateName, Expr initial, String unit, String description) {
        states.add(new StateVariable(stateName, IndexExpansion.expand(initial, Map.of()), unit, description));
        return new Variable(VariableKind.STATE, states.size() - 1, stateName);
    }

    public Variable parameter(String parameterName, Expr value, String unit, ParameterRange range,
            String description) {
        parameters.add(new Parameter(parameterName, IndexExpansion.expand(value, Map.of()), unit, range,
                description));
        return new Variable(VariableKind.PARAMETER, parameters.size() - 1, parameterName);
    }

    /** A derived quantity; a definition with sums or family elements is also kept as a one-element family. */
    public Variable derived(String derivedName, Expr definition, String unit) {
        int index = derived.size();
        // expanded on demand: a scalar sum over 10^6 elements would otherwise be built whenever a model is lowered
        derived.addGenerated(1, k -> new DerivedQuantity(derivedName, IndexExpansion.expand(definition, Map.of()),
                unit));
        if (IndexExpansion.indexed(definition)) {
            register(new Family(VariableKind.DERIVED, derivedName, single(derivedName), index, definition));
        }
        return new Variable(VariableKind.DERIVED, index, derivedName);
    }

    // ---- families

    /** A family of states; {@code initial} may use the family's index. Give its rate with {@link #familyRate}. */
    public Family stateFamily(String familyName, IndexRange range, Expr initial, String unit, String description) {
        int offset = states.size();
        states.addGenerated(range.size(), k -> new StateVariable(elementName(familyName, range, k),
                expandAt(initial, range, k), unit, description));
        return register(new Family(VariableKind.STATE, familyName, range, offset, null));
    }

    /** A coefficient table given by a formula of its index. */
    public Family parameterFamily(String familyName, IndexRange range, Expr value, String unit, String description) {
        int offset = parameters.size();
        parameters.addGenerated(range.size(), k -> new Parameter(elementName(familyName, range, k),
                expandAt(value, range, k), unit, null, description));
        return register(new Family(VariableKind.PARAMETER, familyName, range, offset, value));
    }

    /** A coefficient table listed value by value, one per index value in order. */
    public Family parameterTable(String familyName, IndexRange range, List<Expr> values, String unit,
            String description) {
        if (values.size() != range.size()) {
            throw new IllegalArgumentException("table " + familyName + " lists " + values.size() + " values for "
                    + range.size() + " index values");
        }
        List<Expr> listed = List.copyOf(values);
        int offset = parameters.size();
        parameters.addGenerated(range.size(), k -> new Parameter(elementName(familyName, range, k),
                listed.get(k), unit, null, description));
        return register(new Family(VariableKind.PARAMETER, familyName, range, offset, null));
    }

    /** A family of derived quantities; the definition may use the family's index and elements of families. */
    public Family derivedFamily(String familyName, IndexRange range, Expr definition, String unit) {
        int offset = derived.size();
        derived.addGenerated(range.size(), k -> new DerivedQuantity(elementName(familyName, range, k),
                expandAt(definition, range, k), unit));
        return register(new Family(VariableKind.DERIVED, familyName, range, offset, definition));
    }

    /** The element of {@code family} at index expression {@code index}. */
    public static Element element(Family family, Expr index) {
        return new Element(family.kind(), family.name(), family.range(), family.offset(), index);
    }

    /** The family's own index, for use in its formulas. */
    public static IndexValue index(Family family) {
        return new IndexValue(family.range().name());
    }

    // ---- rates

    public void rate(Variable state, Expr law) {
        if (state.kind() != VariableKind.STATE) {
            throw new IllegalArgumentException(state.name() + " is not a state");
        }
        if (scalarRates.putIfAbsent(state.index(), law) != null) {
            throw new IllegalArgumentException("second rate for " + state.name());
        }
        if (IndexExpansion.indexed(law)) { // compiled as a loop like any family
            register(new Family(VariableKind.STATE, state.name(), single(state.name()), state.index(), null));
            familyRates.put(state.name(), law);
        }
    }

    /** The range of a one-element family made for a scalar whose formula has sums or family elements. */
    private static IndexRange single(String scalarName) {
        return new IndexRange(Family.SCALAR_RANGE_PREFIX + scalarName, 0, 0, false);
    }

    public void familyRate(Family family, Expr law) {
        if (family.kind() != VariableKind.STATE || !families.containsKey(family.name())) {
            throw new IllegalArgumentException(family.name() + " is not a state family of this model");
        }
        if (familyRates.putIfAbsent(family.name(), law) != null) {
            throw new IllegalArgumentException("second rate for " + family.name());
        }
    }

    // ---- symmetries

    /**
     * A symmetry whose images are given per scalar state (by flat index) and per state family (a formula of the
     * family's index, e.g. {@code x[i+1]} for a cyclic shift). States not mentioned map to themselves.
     */
    public Symmetry symmetry(String symmetryName, Map<Integer, Expr> scalarImages, Map<String, Expr> familyImages,
            boolean reversesTime) {
        Map<Integer, Expr> scalars = Map.copyOf(scalarImages);
        Map<String, Expr> byFamily = Map.copyOf(familyImages);
        List<Family> stateFamilies = families.values().stream().filter(f -> f.kind() == VariableKind.STATE).toList();
        List<StateVariable> flatStates = states.build();
        IntFunction<Expr> image = k -> {
            Expr scalar = scalars.get(k);
            if (scalar != null) {
                return scalar;
            }
            for (Family f : stateFamilies) {
                if (f.contains(k)) {
                    Expr formula = byFamily.get(f.name());
                    return formula == null ? identity(k, flatStates)
                            : expandAt(formula, f.range(), k - f.offset());
                }
            }
            return identity(k, flatStates);
        };
        return new Symmetry(symmetryName, ExpandedList.of(flatStates.size(), image), reversesTime);
    }

    private static Expr identity(int k, List<StateVariable> flatStates) {
        return new Variable(VariableKind.STATE, k, flatStates.get(k).name());
    }

    // ---- result

    public DynamicalModel build(List<Symmetry> symmetries, List<Study> studies) {
        List<StateVariable> flatStates = states.build();
        List<Family> finalFamilies = new ArrayList<>();
        ExpandedList.Builder<Expr> rates = ExpandedList.builder();
        int next = 0;
        List<Family> ordered = new ArrayList<>(families.values());
        ordered.sort(java.util.Comparator.comparing((Family f) -> f.kind()).thenComparingInt(Family::offset));
        for (Family f : ordered) {
            if (f.kind() != VariableKind.STATE) {
                finalFamilies.add(f);
                continue;
            }
            for (; next < f.offset(); next++) {
                rates.add(scalarRate(next, flatStates));
            }
            Expr law = familyRates.get(f.name());
            if (law == null) {
                throw new IllegalArgumentException("state family " + f.name() + " has no rate");
            }
            Family withLaw = new Family(f.kind(), f.name(), f.range(), f.offset(), law);
            finalFamilies.add(withLaw);
            if (f.scalar()) {
                rates.addGenerated(1, k -> IndexExpansion.expand(law, Map.of()));
            } else {
                rates.addGenerated(f.size(), k -> expandAt(law, f.range(), k));
            }
            next = f.offset() + f.size();
        }
        for (; next < flatStates.size(); next++) {
            rates.add(scalarRate(next, flatStates));
        }
        return new DynamicalModel(name, title, time, flatStates, parameters.build(), derived.build(), rates.build(),
                symmetries, studies, finalFamilies);
    }

    private Expr scalarRate(int k, List<StateVariable> flatStates) {
        Expr law = scalarRates.get(k);
        if (law == null) {
            throw new IllegalArgumentException("state " + flatStates.get(k).name() + " has no rate");
        }
        return IndexExpansion.expand(law, Map.of());
    }

    private Family register(Family f) {
        if (families.putIfAbsent(f.name(), f) != null) {
            throw new IllegalArgumentException("family " + f.name() + " declared twice");
        }
        return f;
    }

    private static String elementName(String familyName, IndexRange range, int position) {
        return Element.elementName(familyName, range.valueAt(position));
    }

    private static Expr expandAt(Expr formula, IndexRange range, int position) {
        return IndexExpansion.expand(formula, range.name(), range.valueAt(position));
    }
}
