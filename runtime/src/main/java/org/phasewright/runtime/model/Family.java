package org.phasewright.runtime.model;

/**
 * An indexed family: the flat variables {@code offset .. offset + range.size() - 1} of one kind, declared once in
 * the notation. For states {@code formula} is the rate law, for derived quantities the definition and for parameters
 * the value (null when the values are listed one by one); it refers to the family's own index through
 * {@link IndexValue} {@code range.name()}. Compilers use families to emit one loop instead of one line per element;
 * analyses that need scalar expressions use the model's flat lists, which expand families element by element.
 */
public record Family(VariableKind kind, String name, IndexRange range, int offset, Expr formula) {
    public Family {
        if (kind == VariableKind.TIME) {
            throw new IllegalArgumentException("time is not a family");
        }
    }

    /**
     * Prefix of the range name of a one-element family made (by the assembler) for a scalar whose formula has sums
     * or family elements; compilers recognise such families by it and emit no loop for them.
     */
    public static final String SCALAR_RANGE_PREFIX = "_";

    public int size() {
        return range.size();
    }

    /** Whether this is a one-element family standing for a scalar (no index of its own, see SCALAR_RANGE_PREFIX). */
    public boolean scalar() {
        return size() == 1 && range.name().startsWith(SCALAR_RANGE_PREFIX);
    }

    public boolean contains(int flatIndex) {
        return flatIndex >= offset && flatIndex < offset + range.size();
    }
}
