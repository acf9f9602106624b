package org.phasewright.runtime.integrate;

import org.phasewright.runtime.compile.LatticeRates;
import org.phasewright.runtime.compile.VectorField;

/** The Dormand–Prince 5(4) integrator for a model: tile by tile for large cyclic lattices, else the whole state. */
public final class ExplicitMethod {
    /** Lattices from this many cells run tile by tile. */
    public static final int TILED_FROM_CELLS = 8192;

    private ExplicitMethod() {
    }

    /**
     * @param lattice the model's window rates, or null when it is not a lattice
     * @param workers threads for one integration's tiles: all processors for a single run, 1 inside an ensemble
     *                that already runs many integrations at once
     */
    public static Integrator create(VectorField field, LatticeRates lattice, double[] parameters, int workers) {
        return lattice != null && lattice.cells() >= TILED_FROM_CELLS
                ? new TiledDormandPrince54(field, lattice, parameters, workers)
                : new DormandPrince54(field, parameters);
    }
}
