package org.phasewright.runtime.integrate;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.LatticeRates;

/** The Dormand–Prince 5(4) integrator for a model: tile by tile for large cyclic lattices, else the whole state. */
public final class ExplicitMethod {
    /** Lattices from this many cells run tile by tile. */
    public static final int TILED_FROM_CELLS = 8192;

    private ExplicitMethod() {
    }

    /**
     * @param workers threads for one integration's tiles: all processors for a single run, 1 inside an ensemble
     *                that already runs many integrations at once
     */
    public static Integrator create(CompiledModel model, double[] parameters, int workers) {
        // a lattice has at least as many states as cells: smaller models never compile window rates
        LatticeRates lattice = model.dimension() >= TILED_FROM_CELLS ? model.lattice() : null;
        return lattice != null && lattice.cells() >= TILED_FROM_CELLS
                ? new TiledDormandPrince54(model.field(), lattice, parameters, workers)
                : new DormandPrince54(model.field(), parameters);
    }
}
