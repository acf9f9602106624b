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

    public int size() {
        return range.size();
    }

    public boolean contains(int flatIndex) {
        return flatIndex >= offset && flatIndex < offset + range.size();
    }
}
