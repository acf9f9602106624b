package org.phasewright.runtime.study;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.phasewright.runtime.ensemble.Axis;
import org.phasewright.runtime.ensemble.BasinPoint;
import org.phasewright.runtime.ensemble.BasinPoints;
import org.phasewright.runtime.equilibria.Equilibrium;

/**
 * Basins of attraction over a grid of initial values of two states.
 *
 * @param first      the slow axis (rows, a state); null when the request could not be evaluated
 * @param second     the fast axis (columns, a state)
 * @param equilibria the equilibria found beforehand; labels index this list
 * @param points     one entry per start, {@code i * second.steps() + j}; null where a start did not run
 * @param executor   where the points ran, for people
 */
public record BasinsResult(Axis first, Axis second, double endTime, List<Equilibrium> equilibria,
        List<BasinPoint> points, String executor, Status status, String outcome, String message)
        implements AnalysisResult {

    public BasinsResult {
        equilibria = equilibria == null ? List.of() : List.copyOf(equilibria);
        points = points == null ? List.of() : Collections.unmodifiableList(new ArrayList<>(points));
    }

    /**
     * The label at row i, column j: an index into {@link #equilibria()}, {@link BasinPoints#NONE} for no
     * equilibrium reached, or {@link #NOT_RUN}.
     */
    public int label(int i, int j) {
        if (points.isEmpty()) { // the executor failed: no start ran
            return NOT_RUN;
        }
        BasinPoint p = points.get(i * second.steps() + j);
        return p == null ? NOT_RUN : p.label();
    }

    /** The label of a start that did not run (deadline or cancellation). */
    public static final int NOT_RUN = -2;
}
