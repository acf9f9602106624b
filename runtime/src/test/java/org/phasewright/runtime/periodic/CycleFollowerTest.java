package org.phasewright.runtime.periodic;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.continuation.NormalForms;
import org.phasewright.runtime.continuation.ParameterVector;
import org.phasewright.runtime.model.DynamicalModel;

class CycleFollowerTest {

    static DynamicalModel radial(double a, double b) {
        return NormalForms.radial(a, b, 0);
    }

    static CycleBranch follow(DynamicalModel m, double from, double to) {
        CompiledModel cm = ModelCompiler.compile(m);
        ParameterVector pv = new ParameterVector(m, cm.parameters(), 0);
        return new CycleFollower(cm.field(), pv, 1, from, to, CycleSettings.DEFAULT, 1e12, Long.MAX_VALUE,
                () -> false).follow(1, new double[2], 0.0, 1.0);
    }

    @Test
    void supercriticalHopfCycleHasRadiusSqrtMu() {
        CycleBranch b = follow(radial(-1, 0), -0.5, 1);
        assertTrue(b.ending().startsWith("reached mu = 1"), b.ending());
        assertTrue(b.points().size() > 10, b.points().size() + " points");
        for (CyclePoint p : b.points()) {
            double mu = p.parameter();
            double r = Math.hypot(p.state()[0], p.state()[1]);
            // Strogatz, Nonlinear Dynamics and Chaos, §8.2 (supercritical Hopf): r' = μr − r³ has the stable
            // cycle r = √μ, θ' = 1 gives the period 2π.
            assertEquals(Math.sqrt(mu), r, 1e-7, "mu = " + mu);
            assertEquals(2 * Math.PI, p.period(), 1e-7);
            // Floquet multipliers: 1 along the orbit and exp(2π·(μ − 3r²)) = exp(−4πμ) across it (linearising
            // r' = μr − r³ at r = √μ over one period; closed form).
            double[] re = p.multipliersReal();
            double across = Math.abs(re[0] - 1) < Math.abs(re[1] - 1) ? re[1] : re[0];
            assertEquals(Math.exp(-4 * Math.PI * mu), across, 1e-6);
            assertTrue(p.stable());
        }
        assertTrue(b.specialPoints().isEmpty());
    }

    @Test
    void periodDoublingWhereAMultiplierCrossesMinusOne() {
        // Constructed so its Floquet multipliers are known in closed form: the Hopf cycle of radius √μ in (x, y)
        // drives (w1, w2) by w' = [(μ − 1)I + 1.5·[[x, y], [y, −x]] + J/2] w. In the frame turning with half the
        // phase, v = R(−θ/2)w obeys v' = diag(μ − 1 ± 1.5√μ) v, and after one period (θ advances by 2π) the frame
        // has turned by π, so the multipliers of w are −exp(2π(μ − 1 ± 1.5√μ)). One crosses −1 where
        // μ − 1 + 1.5√μ = 0, i.e. √μ = 1/2, μ = 1/4: a period doubling (derivation in this comment; closed form).
        DynamicalModel m = NormalForms.halfTwist();
        CompiledModel cm = ModelCompiler.compile(m);
        ParameterVector pv = new ParameterVector(m, cm.parameters(), 0);
        CycleBranch b = new CycleFollower(cm.field(), pv, 1, -0.2, 0.6, CycleSettings.DEFAULT, 1e12,
                Long.MAX_VALUE, () -> false).follow(1, new double[4], 0.0, 1.0);
        List<CyclePoint> pd = b.specialPoints().stream()
                .filter(p -> p.special() == CycleBranch.Special.PERIOD_DOUBLING).toList();
        assertEquals(1, pd.size(), b.ending());
        assertEquals(0.25, pd.get(0).parameter(), 1e-7);
        CyclePoint first = b.points().get(0), last = b.points().get(b.points().size() - 1);
        assertTrue(first.stable() && !last.stable()); // the multiplier leaves the unit circle through −1
    }

    @Test
    void subcriticalHopfCyclesTurnAtTheFoldOfCycles() {
        // r' = μr + r³ − r⁵: cycles where μ = r⁴ − r², which is smallest at r² = 1/2, μ = −1/4: a fold of cycles
        // (closed form; the model is the subcritical Hopf example r' = μr + r³ − r⁵ of Strogatz, Nonlinear Dynamics
        // and Chaos, §8.2, from memory).
        CycleBranch b = follow(radial(1, -1), -0.5, 0.5);
        List<CyclePoint> folds = b.specialPoints().stream()
                .filter(p -> p.special() == CycleBranch.Special.FOLD_OF_CYCLES).toList();
        assertEquals(1, folds.size(), b.ending());
        assertEquals(-0.25, folds.get(0).parameter(), 1e-8);
        assertEquals(Math.sqrt(0.5), Math.hypot(folds.get(0).state()[0], folds.get(0).state()[1]), 1e-3);
        CyclePoint first = b.points().get(0), last = b.points().get(b.points().size() - 1);
        assertTrue(!first.stable() && last.stable()); // small cycles repel, large ones attract (d(r')/dr sign)
        // the outer cycles reach μ = 0.5 with r² = (1 + sqrt(1 + 4μ))/2 (closed form)
        assertEquals(Math.sqrt((1 + Math.sqrt(1 + 4 * last.parameter())) / 2),
                Math.hypot(last.state()[0], last.state()[1]), 1e-7);
    }
}
