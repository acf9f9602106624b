package org.phasewright.runtime.study;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.phasewright.runtime.ensemble.Axis;
import org.phasewright.runtime.ensemble.LyapunovPoint;

/**
 * The largest Lyapunov exponent over a two-parameter grid.
 *
 * @param first    the slow axis (rows); null when the request could not be evaluated
 * @param second   the fast axis (columns)
 * @param points   one entry per grid point, {@code i * second.steps() + j}; null where a point did not run
 * @param executor where the points ran, for people
 */
public record LyapunovMapResult(Axis first, Axis second, double endTime, List<LyapunovPoint> points,
        String executor, Status status, String outcome, String message) implements AnalysisResult {

    public LyapunovMapResult {
        points = points == null ? List.of() : Collections.unmodifiableList(new ArrayList<>(points));
    }

    /** The exponent at row i, column j, or NaN if that point did not run. */
    public double exponent(int i, int j) {
        if (points.isEmpty()) { // the executor failed: no point ran
            return Double.NaN;
        }
        LyapunovPoint p = points.get(i * second.steps() + j);
        return p == null ? Double.NaN : p.exponent();
    }
}
