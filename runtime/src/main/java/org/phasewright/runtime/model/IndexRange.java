package org.phasewright.runtime.model;

/**
 * A declared index: the integers {@code lower..upper}. A cyclic index wraps around (the element after
 * {@code upper} is {@code lower}); a bounded index has no elements outside its range, and a reference to one reads
 * as zero (the usual convention for truncated mode expansions and lattices with fixed zero ends).
 */
public record IndexRange(String name, int lower, int upper, boolean cyclic) {
    public IndexRange {
        if (upper < lower) {
            throw new IllegalArgumentException("index " + name + ": empty range " + lower + ".." + upper);
        }
    }

    public int size() {
        return upper - lower + 1;
    }

    /** The position 0..size-1 of index value {@code value}, or -1 when a bounded range does not contain it. */
    public int position(long value) {
        long offset = value - lower;
        if (cyclic) {
            return (int) Math.floorMod(offset, (long) size());
        }
        return offset < 0 || offset >= size() ? -1 : (int) offset;
    }

    /** The index value at position {@code position}. */
    public int valueAt(int position) {
        return lower + position;
    }
}
