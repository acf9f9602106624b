package org.phasewright.runtime.continuation;

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

import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Variable;

/** Normal forms with closed-form bifurcation data, for the continuation, cycle and sweep tests. */
public final class NormalForms {
    private NormalForms() {
    }

    /**
     * The Hopf oscillator x, y (cycle of radius √μ, θ' = 1) driving w = (w1, w2) by
     * w' = [(μ − 1)I + 1.5·[[x, y], [y, −x]] + J/2] w, J the quarter turn: a frame turning by half the phase.
     */
    public static DynamicalModel halfTwist() {
        Variable x = state(0, "x"), y = state(1, "y"), w1 = state(2, "w1"), w2 = state(3, "w2"), mu = param(0, "mu");
        Expr r2 = add(pow(x, c(2)), pow(y, c(2)));
        Expr sigma = sub(mu, c(1));
        return model("half_twist", List.of(stateVar("x", 0), stateVar("y", 0), stateVar("w1", 0), stateVar("w2", 0)),
                List.of(parameter("mu", c(0))), List.of(),
                List.of(sub(sub(mul(mu, x), y), mul(x, r2)),
                        sub(add(x, mul(mu, y)), mul(y, r2)),
                        add(add(mul(sigma, w1), mul(c(1.5), add(mul(x, w1), mul(y, w2)))), mul(c(-0.5), w2)),
                        add(add(mul(sigma, w2), mul(c(1.5), sub(mul(y, w1), mul(x, w2)))), mul(c(0.5), w1))));
    }

    /**
     * ż = (μ + i)z + a z|z|² + b z|z|⁴ in x, y (z = x + iy), i.e. r' = μr + a r³ + b r⁵, θ' = 1; parameter μ
     * (initially 0), start (x0, 0).
     */
    public static DynamicalModel radial(double a, double b, double x0) {
        Variable x = state(0, "x"), y = state(1, "y"), mu = param(0, "mu");
        Expr r2 = add(pow(x, c(2)), pow(y, c(2)));
        Expr g = add(mu, add(mul(c(a), r2), mul(c(b), pow(r2, c(2))))); // μ + a r² + b r⁴
        return model("radial", List.of(stateVar("x", x0), stateVar("y", 0)), List.of(parameter("mu", c(0))),
                List.of(), List.of(sub(mul(g, x), y), add(x, mul(g, y))));
    }
}
