package org.phasewright.runtime.study;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.DerivedValues;
import org.phasewright.runtime.integrate.DenseStep;
import org.phasewright.runtime.integrate.StepObserver;

/**
 * Output of a simulation with more than {@link #LIMIT} states, where a full row per output time would not fit in
 * memory (10^6 states × 1000 samples is 8 GB): at each output time it keeps the first {@link #KEPT} states, the
 * derived quantities (the first {@link #KEPT} when there are more than {@link #LIMIT}), and the mean and
 * root-mean-square over all states. The full final state stays in the integration outcome.
 */
final class ReducedSampler implements StepObserver {
    /** Models with more states than this get reduced output. */
    static final int LIMIT = ReducedOutput.LIMIT;
    static final int KEPT = ReducedOutput.KEPT;
    static final String MEAN = ReducedOutput.MEAN, RMS = ReducedOutput.RMS;

    private final CompiledModel model;
    private final double[] p;
    private final double[] times;
    private final double direction;
    private final int keptStates, keptDerived;
    private final double[] full, derived; // scratch for one full row
    private final double[][] states, derivedRows;
    private int filled;

    ReducedSampler(CompiledModel model, double[] p, double[] times) {
        this.model = model;
        this.p = p.clone();
        this.times = times.clone();
        this.direction = times.length > 1 && times[times.length - 1] < times[0] ? -1 : 1;
        int nd = model.derivedValues().derivedCount();
        this.keptStates = Math.min(KEPT, model.dimension());
        this.keptDerived = nd > LIMIT ? KEPT : nd;
        this.full = new double[model.dimension()];
        this.derived = new double[nd];
        // one extra row for the point where a failed integration stopped
        this.states = new double[times.length + 1][];
        this.derivedRows = new double[times.length + 1][];
    }

    static boolean needed(CompiledModel model) {
        return model.dimension() > LIMIT;
    }

    @Override
    public void start(double t0, double[] u0) {
        while (filled < times.length && (times[filled] - t0) * direction <= 0) {
            record(times[filled], u0);
        }
    }

    @Override
    public void step(DenseStep step) {
        double end = step.endTime();
        while (filled < times.length && (times[filled] - end) * direction <= 0) {
            if (times[filled] == end) {
                record(end, step.endState());
            } else {
                step.stateAt(times[filled], full);
                record(times[filled], full);
            }
        }
    }

    /** Records state {@code u} at the next of the times (points found by other means, such as crossings). */
    void next(double[] u) {
        record(times[filled], u);
    }

    private void record(double t, double[] u) {
        double[] row = Arrays.copyOf(u, keptStates);
        DerivedValues dv = model.derivedValues();
        double[] d = new double[keptDerived + 2];
        if (derived.length > 0) {
            dv.derived(t, u, p, derived);
            System.arraycopy(derived, 0, d, 0, keptDerived);
        }
        double[] summary = ReducedOutput.meanAndRms(u);
        d[keptDerived] = summary[0];
        d[keptDerived + 1] = summary[1];
        states[filled] = row;
        derivedRows[filled] = d;
        filled++;
    }

    /** The samples taken, plus {@code (lastTime, lastState)} when the integration stopped before the last one. */
    Trajectory trajectory(boolean completed, double lastTime, double[] lastState) {
        double[] t = Arrays.copyOf(times, filled + 1);
        int rows = filled;
        if (!completed && (rows == 0 || lastTime > times[rows - 1])) {
            t[rows] = lastTime;
            record(lastTime, lastState);
            rows++;
        }
        List<String> stateNames = model.model().states().subList(0, keptStates).stream().map(s -> s.name())
                .toList();
        List<String> derivedNames = new ArrayList<>(model.model().derived().subList(0, keptDerived).stream()
                .map(q -> q.name()).toList());
        derivedNames.add(MEAN);
        derivedNames.add(RMS);
        String lets = derived.length == 0 ? "" : keptDerived == derived.length ? "every derived quantity, "
                : "the first " + keptDerived + " of " + derived.length + " derived quantities, ";
        String kept = String.format(Locale.ROOT, "first %d of %d states, %s%s and %s over all states; the final state"
                + " in full", keptStates, model.dimension(), lets, MEAN, RMS);
        return new Trajectory(model.timeName(), stateNames, derivedNames, Arrays.copyOf(t, rows),
                Arrays.copyOf(states, rows), Arrays.copyOf(derivedRows, rows), kept);
    }
}
