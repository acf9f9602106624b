package org.phasewright.runtime.study;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.equilibria.EquilibriumFinder;
import org.phasewright.runtime.equilibria.EquilibriumSearchOutcome;
import org.phasewright.runtime.equilibria.EquilibriumSettings;
import org.phasewright.runtime.equilibria.PolynomialRoots;
import org.phasewright.runtime.equilibria.StartPoints;
import org.phasewright.runtime.integrate.ExplicitMethod;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.linalg.RightmostEigenvalues;
import org.phasewright.runtime.symmetry.SymmetryAnalysis;
import org.phasewright.runtime.symmetry.SymmetryReport;

/** Runs one equilibrium search, seeding Newton from a trajectory of the study or from a short one of its own. */
final class EquilibriumSearchRunner {
    /** Steps of the exploratory trajectory when the study has none: enough to see transients, cheap for any model. */
    private static final int SHORT_RUN_STEPS = 2000;
    /** Large models: trajectory points kept as Newton starts, steps of the short run, Newton iterations in all. */
    private static final int LARGE_TRAJECTORY_STARTS = 4;
    private static final int LARGE_SHORT_RUN_STEPS = 200;
    private static final long LARGE_ITERATIONS = 100;

    private EquilibriumSearchRunner() {
    }

    static EquilibriumResult run(CompiledModel model, Trajectory trajectory, RunSettings settings, Budget budget) {
        if (!model.autonomous()) {
            return new EquilibriumResult(List.of(), null, Status.FAILED, "NOT_AUTONOMOUS",
                    "equilibria are only defined for autonomous models, but the rates depend on time "
                            + model.timeName());
        }
        double[] p = model.parameters();
        if (model.dimension() > SparseJacobian.DENSE_LIMIT) {
            return large(model, p, trajectory, settings, budget);
        }
        List<double[]> points = trajectory != null ? rows(trajectory, Integer.MAX_VALUE)
                : runPoints(model, p, model.initialState(), false, settings, budget);
        Search found = search(model, p, model.initialState(), points, false, settings, budget);
        EquilibriumSearchOutcome search = found.outcome();
        Status status = search.ending() == EquilibriumSearchOutcome.Ending.COMPLETED ? Status.COMPLETED
                : Status.INCOMPLETE;
        String message = search.message() + found.homotopy().map(h -> "; " + h.message()).orElse("");
        return new EquilibriumResult(search.equilibria(), search, status, search.ending().name(), message,
                symmetry(model, search.equilibria()));
    }

    /**
     * What a search found, from how many starts, and the polynomial homotopy's summary (empty for a large model or
     * rates that are not polynomials).
     */
    record Search(EquilibriumSearchOutcome outcome, int starts, Optional<PolynomialRoots.Summary> homotopy) {
    }

    /**
     * Equilibria at parameters p by Newton from the initial state, the origin and {@code points} (late points of a
     * run). A small model also starts from the real roots of the polynomial homotopy first, when its rate laws are
     * polynomials; a large one takes sparse Newton from those few starts only (the homotopy's start system has a
     * root count exponential in the dimension), with fewer iterations.
     */
    static Search search(CompiledModel model, double[] p, double[] initial, List<double[]> points, boolean large,
            RunSettings settings, Budget budget) {
        EquilibriumSettings equilibria = large ? largeSettings(settings) : settings.equilibria();
        StartPoints starts = StartPoints.build(p, initial, points, equilibria);
        Optional<PolynomialRoots.Summary> homotopy = large ? Optional.empty()
                : PolynomialRoots.find(model.model(), p, budget.deadlineNanos(), budget.cancelled());
        if (homotopy.isPresent()) {
            starts = starts.withLeading(homotopy.get().realRoots());
        }
        EquilibriumSearchOutcome outcome = new EquilibriumFinder(model.field(), p, equilibria)
                .find(starts, budget.deadlineNanos(), budget.cancelled());
        return new Search(outcome, starts.points().size(), homotopy);
    }

    /** The late points of a short run from {@code initial} that {@link #search} starts from besides the others. */
    static List<double[]> runPoints(CompiledModel model, double[] p, double[] initial, boolean large,
            RunSettings settings, Budget budget) {
        return large ? shortRun(model, p, initial, LARGE_SHORT_RUN_STEPS, LARGE_TRAJECTORY_STARTS, settings, budget)
                : shortRun(model, p, initial, SHORT_RUN_STEPS, Integer.MAX_VALUE, settings, budget);
    }

    /**
     * A model above {@link SparseJacobian#DENSE_LIMIT} states: sparse Newton from the initial state, the origin and
     * a few late points of a short run; no polynomial homotopy (its start system has a root count exponential in
     * the dimension) and only the rightmost eigenvalues, both said in the message.
     */
    private static EquilibriumResult large(CompiledModel model, double[] p, Trajectory trajectory, RunSettings settings,
            Budget budget) {
        int n = model.dimension();
        if (model.field().sparseJacobian() == null) {
            return new EquilibriumResult(List.of(), null, Status.FAILED, "MODEL_TOO_LARGE", "a model of " + n
                    + " states needs a sparse Jacobian for Newton's method, but its Jacobian has too many nonzeros");
        }
        List<double[]> points = trajectory != null ? rows(trajectory, LARGE_TRAJECTORY_STARTS)
                : runPoints(model, p, model.initialState(), true, settings, budget);
        Search found = search(model, p, model.initialState(), points, true, settings, budget);
        EquilibriumSearchOutcome search = found.outcome();
        Status status = search.ending() == EquilibriumSearchOutcome.Ending.COMPLETED ? Status.COMPLETED
                : Status.INCOMPLETE;
        String message = search.message() + "; a model of " + n + " states (more than "
                + SparseJacobian.DENSE_LIMIT + ") is searched by sparse Newton from " + found.starts()
                + " starts without polynomial homotopy; each equilibrium is classified by its rightmost eigenvalues "
                + "from the sparse Jacobian (all eigenvalues when it is the same in every cell of a ring), and at most "
                + RightmostEigenvalues.WANTED + " are listed";
        return new EquilibriumResult(search.equilibria(), search, status, search.ending().name(), message,
                symmetry(model, search.equilibria()));
    }

    /** The equilibrium settings of a large model's search: no quasi-random starts, fewer Newton iterations. */
    private static EquilibriumSettings largeSettings(RunSettings settings) {
        EquilibriumSettings defaults = settings.equilibria();
        return new EquilibriumSettings(0, LARGE_TRAJECTORY_STARTS, defaults.maxNewtonIterations(),
                Math.min(defaults.maxTotalIterations(), LARGE_ITERATIONS), defaults.residualTolerance(),
                defaults.stepTolerance(), defaults.duplicateTolerance(), defaults.eigenTolerance());
    }

    /** Orbits, isotropy and invariant subspaces under the declared symmetries (empty when there are none). */
    private static SymmetryReport symmetry(CompiledModel model, List<Equilibrium> equilibria) {
        return SymmetryAnalysis.analyse(SymmetryAnalysis.linearMaps(model.model()),
                equilibria.stream().map(Equilibrium::name).toList(),
                equilibria.stream().map(Equilibrium::coordinates).toList(), model.stateNames());
    }

    /** The last {@code count} rows of a trajectory (all of them when it has no more). */
    private static List<double[]> rows(Trajectory trajectory, int count) {
        int first = Math.max(0, trajectory.size() - count);
        List<double[]> out = new ArrayList<>(trajectory.size() - first);
        for (int k = first; k < trajectory.size(); k++) {
            out.add(trajectory.stateRow(k));
        }
        return out;
    }

    /**
     * The last {@code keep} accepted step points of a run from {@code initial} with no meaningful end time (the
     * step limit ends it), so the sample does not depend on guessing the model's time scale. Only {@code keep}
     * points are held at a time, since each costs n doubles.
     */
    private static List<double[]> shortRun(CompiledModel model, double[] p, double[] initial, int maxSteps, int keep,
            RunSettings settings, Budget budget) {
        ArrayDeque<double[]> last = new ArrayDeque<>();
        IntegratorSettings s = IntegratorSettings.DEFAULT.withMaxSteps(maxSteps)
                .withTolerances(1e-6, 1e-8)
                .withBlowUpBound(settings.blowUpBound())
                .withDeadline(budget.deadlineNanos())
                .withCancellation(budget.cancelled());
        ExplicitMethod.create(model, p, Runtime.getRuntime().availableProcessors())
                .integrate(0.0, initial, 1e9, s, step -> {
            if (last.size() == keep) {
                last.removeFirst();
            }
            last.addLast(step.endState().clone());
        });
        return new ArrayList<>(last);
    }
}
