package org.phasewright.runtime.ensemble;

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
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.model.Variable;

/** Models for ensemble tests. */
public final class EnsembleModels {
    private EnsembleModels() {
    }

    /** The damped double-well Duffing oscillator x'' = x − x³ − δx' as x' = v, v' = x − x³ − δv. */
    public static DynamicalModel duffing(double delta, Study... studies) {
        Variable x = state(0, "x"), v = state(1, "v"), d = param(0, "delta");
        return model("duffing", List.of(stateVar("x", 0.5), stateVar("v", 0)), List.of(parameter("delta",
                c(delta))), List.of(), List.of(v, sub(sub(x, pow(x, c(3))), mul(d, v))), studies);
    }
}
