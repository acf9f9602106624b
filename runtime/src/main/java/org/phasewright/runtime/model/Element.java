package org.phasewright.runtime.model;

/**
 * One element of an indexed family of states, parameters or derived quantities, chosen by an integer index
 * expression (built from {@link IndexValue}s, integer {@link Constant}s, +, - and *). The element with index value v
 * is the flat variable {@code offset + range.position(v)} of its kind; outside a bounded range it reads as zero.
 */
public record Element(VariableKind kind, String family, IndexRange range, int offset, Expr index) implements Expr {
    public Element {
        if (kind == VariableKind.TIME) {
            throw new IllegalArgumentException("time has no elements");
        }
        if (offset < 0) {
            throw new IllegalArgumentException("negative offset for " + family);
        }
    }

    /** The flat name of the element with index value {@code value}, as used in outputs: {@code x[3]}. */
    public static String elementName(String family, int value) {
        return family + "[" + value + "]";
    }
}
