package org.phasewright.runtime.study;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.DerivedValues;
import org.phasewright.runtime.integrate.CrossingLocator;
import org.phasewright.runtime.integrate.SwitchingFunction;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Section;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.ExprEvaluator;
import org.phasewright.runtime.symbolic.References;

/** Event functions g(t, u) from expressions of a study (sections and stop conditions). */
final class Surfaces {
    private Surfaces() {
    }

    /** g(t, u) = the expression; lets are computed only when it uses them. Not thread-safe (one buffer). */
    static SwitchingFunction of(CompiledModel model, Expr surface, double[] p) {
        boolean usesLets = References.of(surface).stream()
                .map(Variable::kind).anyMatch(k -> k == VariableKind.DERIVED);
        DerivedValues dv = model.derivedValues();
        double[] derived = new double[dv.derivedCount()];
        return (t, u) -> {
            if (usesLets) {
                dv.derived(t, u, p, derived);
            }
            return ExprEvaluator.evaluate(surface, t, u, p, derived);
        };
    }

    static CrossingLocator.Direction direction(Section.Crossing c) {
        return switch (c) {
            case RISING -> CrossingLocator.Direction.RISING;
            case FALLING -> CrossingLocator.Direction.FALLING;
            case BOTH -> CrossingLocator.Direction.BOTH;
        };
    }
}
