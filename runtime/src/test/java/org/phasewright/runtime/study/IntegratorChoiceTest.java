package org.phasewright.runtime.study;

import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.integrate.DormandPrince54;
import org.phasewright.runtime.integrate.ExplicitMethod;
import org.phasewright.runtime.integrate.TiledDormandPrince54;
import org.phasewright.runtime.linalg.LatticeModels;
import org.phasewright.runtime.model.IntegrationMethod;

/**
 * The explicit method runs tile by tile only for cyclic lattices of at least {@link ExplicitMethod#TILED_FROM_CELLS}
 * cells (our own rule; no outside source).
 */
class IntegratorChoiceTest {
    @Test
    void largeCyclicRingRunsTileByTile() {
        CompiledModel ring = ModelCompiler.compile(LatticeModels.lorenz96(ExplicitMethod.TILED_FROM_CELLS, 8, true));
        assertInstanceOf(TiledDormandPrince54.class,
                IntegratorChoice.create(IntegrationMethod.EXPLICIT, ring, ring.parameters()));
    }

    @Test
    void smallRingsAndBoundedChainsRunOnTheWholeState() {
        CompiledModel small = ModelCompiler.compile(LatticeModels.lorenz96(40, 8, true));
        assertInstanceOf(DormandPrince54.class,
                IntegratorChoice.create(IntegrationMethod.EXPLICIT, small, small.parameters()));
        CompiledModel bounded = ModelCompiler.compile(
                LatticeModels.lorenz96(ExplicitMethod.TILED_FROM_CELLS, 8, false));
        assertInstanceOf(DormandPrince54.class,
                IntegratorChoice.create(IntegrationMethod.EXPLICIT, bounded, bounded.parameters()));
    }

    @Test
    void ensemblesAskForOneWorkerAndGetTilesForLargeLattices() {
        CompiledModel ring = ModelCompiler.compile(LatticeModels.lorenz96(ExplicitMethod.TILED_FROM_CELLS, 8, true));
        assertInstanceOf(TiledDormandPrince54.class, ExplicitMethod.create(ring, ring.parameters(), 1));
        CompiledModel interpreted = ModelCompiler.interpret(ring.model()); // no window rates
        assertInstanceOf(DormandPrince54.class, ExplicitMethod.create(interpreted, ring.parameters(), 1));
    }
}
