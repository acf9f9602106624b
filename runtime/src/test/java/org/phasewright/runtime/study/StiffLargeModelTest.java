package org.phasewright.runtime.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.linalg.LatticeModels;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.IntegrationMethod;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.model.Study;

/**
 * The stiff method of a large model needs a sparse Jacobian; an all-to-all coupling of 5,000 states (25 million
 * nonzeros) has none, and the run ends with a named outcome instead of an internal error. The explicit method still
 * runs (common practice: explicit methods need only the rates).
 */
class StiffLargeModelTest {

    @Test
    void stiffMethodOnADenselyCoupledLargeModelEndsAsModelTooLarge() {
        CompiledModel model = ModelCompiler.compile(LatticeModels.meanField(5000));
        Simulation stiff = new Simulation(new Constant(0.1), List.of(), null, IntegrationMethod.STIFF, null);
        Simulation explicit = new Simulation(new Constant(0.1), List.of(), null, IntegrationMethod.EXPLICIT, null);
        StudyResult result = StudyRunner.run(model, new Study("s", List.of(stiff, explicit)), RunSettings.DEFAULT);
        SimulationResult first = (SimulationResult) result.results().get(0);
        assertEquals(Status.FAILED, first.status());
        assertEquals("MODEL_TOO_LARGE", first.outcome(), first.message());
        assertTrue(first.message().contains("explicit"), first.message());
        SimulationResult second = (SimulationResult) result.results().get(1);
        assertEquals(Status.COMPLETED, second.status(), second.message());
    }
}
