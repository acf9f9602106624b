package org.phasewright.runtime.compile;

/**
 * The rates of a lattice model, evaluated on a window of cells: every state is an element of one of a few families
 * over one cyclic index, and every rate reads states only at shifts {@code x[i + c]} of its own cell, with
 * {@code -reachBelow() <= c <= reachAbove()}. An integrator can then run all stages of a step on a cache-sized tile
 * of cells (plus a halo) instead of sweeping the whole state once per stage.
 * <p>
 * Component f of the flat state is the f-th state family: flat index {@code f * cells() + cell}.
 */
public interface LatticeRates {
    /** Cells per component (the index range's size). */
    int cells();

    /** State families, in flat order. */
    int components();

    /** Largest distance to a lower cell that a rate reads (c = -reachBelow), at least 0. */
    int reachBelow();

    /** Largest distance to a higher cell that a rate reads, at least 0. */
    int reachAbove();

    /**
     * For q in [from, to): writes into {@code out[f][q]} the rate of component f at the cell whose values are
     * {@code in[g][q + reachBelow()]}, reading {@code in[g][q .. q + reachBelow() + reachAbove()]}. That cell is
     * number {@code first + q} counted from the first cell of the range (any integer: it wraps around). The write
     * of an iteration never lies above its lowest read, so the JIT may vectorise the loops.
     */
    void rates(double t, double[][] in, double[] p, double[][] out, long first, int from, int to);
}
