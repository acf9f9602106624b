package org.phasewright.runtime.ensemble;

import java.util.function.BooleanSupplier;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.lyapunov.LyapunovOutcome;
import org.phasewright.runtime.lyapunov.LyapunovSpectrum;
import org.phasewright.runtime.symbolic.InitialValues;
import org.phasewright.runtime.symbolic.ModelEvaluationException;

/**
 * Lyapunov map points: the largest exponent at every (first, second) parameter pair, the first axis varying
 * slowest (point = i * second.steps() + j), from the initial values those parameters give.
 */
public record LyapunovPoints(ModelShape shape, double[] baseParameters, Axis first, Axis second, double endTime,
        IntegrationRecipe integration) implements PointTask<LyapunovPoint> {

    public static LyapunovPoints of(CompiledModel model, Axis first, Axis second, double endTime,
            IntegrationRecipe integration) {
        return new LyapunovPoints(ModelShape.of(model), model.parameters(), first, second, endTime, integration);
    }

    @Override
    public int points() {
        return first.steps() * second.steps();
    }

    @Override
    public LyapunovPoint compute(CompiledModel model, int point, long deadlineNanos, BooleanSupplier cancelled) {
        double[] p;
        double[] u0;
        try {
            p = GridParameters.at(model, baseParameters, first, first.value(point / second.steps()), second,
                    second.value(point % second.steps()));
            u0 = InitialValues.resolve(model.model(), p);
        } catch (ModelEvaluationException e) {
            return new LyapunovPoint(Double.NaN, false, "INVALID_INPUT");
        }
        // One tangent vector is enough for the largest exponent (and affordable for large lattices).
        LyapunovOutcome o = new LyapunovSpectrum(model.field(), p, 1).compute(u0, endTime,
                integration.settings(deadlineNanos, cancelled));
        return new LyapunovPoint(o.exponents()[0], o.converged(), o.integration().ending().name());
    }

    @Override
    public void checkModel(CompiledModel model) {
        shape.check(model);
    }
}
