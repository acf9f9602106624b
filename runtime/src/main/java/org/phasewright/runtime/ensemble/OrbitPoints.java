package org.phasewright.runtime.ensemble;

import java.util.function.BooleanSupplier;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.continuation.ParameterVector;
import org.phasewright.runtime.sweep.OrbitDiagram;
import org.phasewright.runtime.sweep.SweepColumn;

/**
 * Orbit diagram points: one column of local maxima per value of the parameter axis, computed by
 * {@link OrbitDiagram#column} so that every executor gives the orbit diagram's own numbers.
 *
 * @param baseParameters the model's parameter values; the axis value replaces one of them (and what depends on it)
 */
public record OrbitPoints(ModelShape shape, double[] baseParameters, Axis parameter, double endTime,
        IntegrationRecipe integration) implements PointTask<OrbitColumn> {

    public static OrbitPoints of(CompiledModel model, Axis parameter, double endTime, IntegrationRecipe integration) {
        return new OrbitPoints(ModelShape.of(model), model.parameters(), parameter, endTime, integration);
    }

    @Override
    public int points() {
        return parameter.steps();
    }

    @Override
    public OrbitColumn compute(CompiledModel model, int point, long deadlineNanos, BooleanSupplier cancelled) {
        ParameterVector vector = new ParameterVector(model.model(), baseParameters, parameter.index());
        SweepColumn c = OrbitDiagram.column(model, vector, parameter.value(point), endTime,
                integration.settings(deadlineNanos, cancelled), cancelled);
        return c == null ? null : OrbitColumn.of(c);
    }

    @Override
    public void checkModel(CompiledModel model) {
        shape.check(model);
    }
}
