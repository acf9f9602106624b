package org.phasewright.runtime.ensemble;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.continuation.ParameterVector;

/** Parameter vectors of a two-parameter grid: each axis value replaces its parameter and what depends on it. */
final class GridParameters {
    private GridParameters() {
    }

    static double[] at(CompiledModel model, double[] base, Axis first, double a, Axis second, double b) {
        double[] p = new ParameterVector(model.model(), base, first.index()).at(a);
        return new ParameterVector(model.model(), p, second.index()).at(b);
    }
}
