package org.phasewright.runtime.equilibria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.linalg.LatticeModels;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.EquilibriumContinuation;
import org.phasewright.runtime.model.EquilibriumSearch;
import org.phasewright.runtime.model.LyapunovExponents;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.study.ContinuationResult;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.LyapunovResult;
import org.phasewright.runtime.study.RunSettings;
import org.phasewright.runtime.study.Status;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.StudyRunner;

/** Studies of a ring of 2000 states: what runs sparse, and the named outcomes for what cannot run at that size. */
class LargeModelStudiesTest {

    @Test
    void ringOfTwoThousandStatesGetsSparseAnswersOrNamedOutcomes() {
        CompiledModel ring = ModelCompiler.compile(LatticeModels.lorenz96(2000, 8, true));
        Variable forcing = new Variable(VariableKind.PARAMETER, 0, "F");
        Study study = new Study("large", List.of(new EquilibriumSearch(),
                new LyapunovExponents(new Constant(20), null, 0),
                new LyapunovExponents(new Constant(20), null, 2),
                new EquilibriumContinuation(forcing, new Constant(7), new Constant(9))));
        StudyResult result = StudyRunner.run(ring, study, RunSettings.DEFAULT);

        EquilibriumResult search = result.equilibriumSearches().get(0);
        // x_i = F is an equilibrium of Lorenz-96 for every N (closed form)
        assertTrue(search.equilibria().stream().anyMatch(e -> java.util.Arrays.stream(e.coordinates())
                .allMatch(x -> Math.abs(x - 8) < 1e-9)), search.message());
        assertTrue(search.message().contains("without polynomial homotopy"), search.message());
        // the uniform state is classified from all 2000 eigenvalues of its circulant Jacobian: λ_k = -1 + F e^{iθ}
        // - F e^{-2iθ}, θ = 2πk/N (DFT of the first row, Gray 2006, Section 3.1), unstable where Re λ_k > 0
        Equilibrium uniform = search.equilibria().stream().filter(e -> java.util.Arrays.stream(e.coordinates())
                .allMatch(x -> Math.abs(x - 8) < 1e-9)).findFirst().orElseThrow();
        int growing = 0;
        double rightmost = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < 2000; k++) {
            double theta = 2 * Math.PI * k / 2000, re = -1 + 8 * (Math.cos(theta) - Math.cos(2 * theta));
            growing += re > 0 ? 1 : 0;
            rightmost = Math.max(rightmost, re);
        }
        assertEquals("saddle-focus with " + growing + " unstable directions", uniform.type());
        assertEquals(growing, uniform.classification().unstableDimension());
        assertEquals(2000 - growing, uniform.classification().stableDimension());
        assertEquals(12, uniform.eigenvaluesReal().length);
        assertEquals(rightmost, uniform.eigenvaluesReal()[0], 1e-9);
        // a large model's rows keep 16 states with their mean and rms (every coordinate goes to
        // equilibria-states.csv) and its 12 rightmost eigenvalues, and every row is as wide as the header (RFC 4180)
        String[] lines = org.phasewright.runtime.report.EquilibriaCsv.render(result.stateNames(), search)
                .split("\r?\n");
        assertEquals(1 + 16 + 2 + 4 + 2 * 12, lines[0].split(",", -1).length);
        assertTrue(lines[0].contains("lambda12_im") && !lines[0].contains("lambda13"), lines[0]);
        for (int k = 1; k < lines.length; k++) {
            assertEquals(1 + 16 + 2 + 4 + 2 * 12, lines[k].split(",", -1).length);
        }

        List<LyapunovResult> spectra = result.lyapunovSpectra();
        assertEquals("MODEL_TOO_LARGE", spectra.get(0).outcome());
        assertEquals(Status.FAILED, spectra.get(0).status());
        assertTrue(spectra.get(0).message().contains("leading"), spectra.get(0).message());
        LyapunovResult leading = spectra.get(1);
        assertEquals(Status.COMPLETED, leading.status(), leading.message());
        assertEquals(2, leading.spectrum().exponents().length);
        // Lorenz-96 has divergence -N everywhere (closed form: ∂f_i/∂x_i = -1)
        assertEquals(-2000.0, leading.spectrum().meanDivergence(), 1e-6);
        assertTrue(leading.message().startsWith("leading 2 of 2000 exponents"), leading.message());

        ContinuationResult continuation = result.continuations().get(0);
        assertEquals("MODEL_TOO_LARGE", continuation.outcome());
        assertTrue(continuation.message().contains("200"), continuation.message());
    }
}
