package org.phasewright.language.lowering;

import java.util.OptionalDouble;
import java.util.OptionalLong;

import org.phasewright.language.phase.IndexDecl;
import org.phasewright.runtime.model.IndexRange;

/** The runtime range of a declared index, with bounds evaluated from literals and constant params. */
public final class IndexRanges {
    /** More elements than this in one index is an error: the flat lists are indexed by int, and memory is finite. */
    public static final int MAX_SIZE = 10_000_000;

    private IndexRanges() {
    }

    /** The value of one bound as a whole number, or empty when it is not a constant integer. */
    public static OptionalDouble bound(org.phasewright.language.phase.Expression bound, ConstantValues constants) {
        if (bound == null) {
            return OptionalDouble.empty();
        }
        OptionalDouble value = constants.evaluate(bound);
        if (value.isEmpty() || value.getAsDouble() != Math.rint(value.getAsDouble())
                || Math.abs(value.getAsDouble()) > Integer.MAX_VALUE / 2) {
            return OptionalDouble.empty();
        }
        return value;
    }

    /**
     * The number of values, upper - lower + 1 (zero or less when the range is empty), or empty when a bound is not
     * a constant integer.
     */
    public static OptionalLong size(IndexDecl index, ConstantValues constants) {
        OptionalDouble lower = bound(index.getLower(), constants);
        OptionalDouble upper = bound(index.getUpper(), constants);
        return lower.isEmpty() || upper.isEmpty() ? OptionalLong.empty()
                : OptionalLong.of((long) upper.getAsDouble() - (long) lower.getAsDouble() + 1);
    }

    /** The range of {@code index}; throws {@link LoweringException} for bounds the validator rejects. */
    public static IndexRange of(IndexDecl index, ConstantValues constants) {
        OptionalLong values = size(index, constants);
        if (values.isEmpty()) {
            throw new LoweringException("the bounds of index " + index.getName() + " are not integer constants");
        }
        long size = values.getAsLong();
        if (size < 1 || size > MAX_SIZE) {
            throw new LoweringException("index " + index.getName() + " has " + size + " values");
        }
        int lower = (int) bound(index.getLower(), constants).getAsDouble();
        return new IndexRange(index.getName(), lower, (int) (lower + size - 1), index.isCyclic());
    }
}
