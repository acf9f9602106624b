package org.phasewright.runtime.periodic;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.add;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.model;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.param;
import static org.phasewright.runtime.TestModels.parameter;
import static org.phasewright.runtime.TestModels.pow;
import static org.phasewright.runtime.TestModels.state;
import static org.phasewright.runtime.TestModels.stateVar;
import static org.phasewright.runtime.TestModels.sub;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.continuation.ParameterVector;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Variable;

class CycleFollowerTest {

    /** ż = (μ + i)z + a z|z|² + b z|z|⁴ written in x, y (z = x + iy): r' = μr + a r³ + b r⁵, θ' = 1. */
    static DynamicalModel radial(double a, double b) {
        Variable x = state(0, "x"), y = state(1, "y"), mu = param(0, "mu");
        Expr r2 = add(pow(x, c(2)), pow(y, c(2)));
        Expr g = add(mu, add(mul(c(a), r2), mul(c(b), pow(r2, c(2))))); // μ + a r² + b r⁴
        return model("radial", List.of(stateVar("x", 0), stateVar("y", 0)), List.of(parameter("mu", c(0))),
                List.of(), List.of(sub(mul(g, x), y), add(x, mul(g, y))));
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
