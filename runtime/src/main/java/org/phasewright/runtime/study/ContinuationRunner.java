package org.phasewright.runtime.study;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.continuation.BranchFollower;
import org.phasewright.runtime.continuation.ContinuationOutcome;
import org.phasewright.runtime.continuation.ContinuationSettings;
import org.phasewright.runtime.continuation.ParameterVector;
import org.phasewright.runtime.continuation.SpecialPoint;
import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.equilibria.EquilibriumSearchOutcome;
import org.phasewright.runtime.model.EquilibriumContinuation;
import org.phasewright.runtime.periodic.CycleBranch;
import org.phasewright.runtime.periodic.CycleFollower;
import org.phasewright.runtime.periodic.CycleSettings;
import org.phasewright.runtime.symbolic.InitialValues;
import org.phasewright.runtime.symbolic.ModelEvaluationException;

/**
 * Runs one {@link EquilibriumContinuation}: finds every equilibrium at the start value as an equilibrium search
 * does (short exploratory run, homotopy for polynomial rates, Newton with deflation), then follows their branches.
 */
final class ContinuationRunner {
    /** Hopf points whose periodic orbits are followed; each family costs hundreds of shots. */
    static final int MAX_CYCLE_FAMILIES = 8;

    private ContinuationRunner() {
    }

    static ContinuationResult run(CompiledModel model, EquilibriumContinuation request, RunSettings settings,
            Budget budget) {
        if (!model.autonomous()) {
            return new ContinuationResult(null, Status.FAILED, "NOT_AUTONOMOUS",
                    "equilibria are only defined for autonomous models, but the rates depend on time "
                            + model.timeName());
        }
        boolean large = model.field().large();
        // each point records the whole state, like a row of equilibria.csv before it is reduced
        if (large && (model.dimension() > ReducedOutput.LIMIT || model.field().sparseJacobian() == null)) {
            return new ContinuationResult(null, Status.FAILED, "MODEL_TOO_LARGE", "continuation follows models of "
                    + "up to " + ReducedOutput.LIMIT + " states (with a sparse Jacobian above "
                    + SparseJacobian.DENSE_LIMIT + "); this model has " + model.dimension()
                    + (model.field().sparseJacobian() == null ? " states and no sparse Jacobian" : " states"));
        }
        double[] base = model.parameters();
        double from, to;
        ParameterVector parameters;
        double[] p;
        double[] initial;
        try {
            from = InitialValues.evaluate(request.from(), base, "start value");
            to = InitialValues.evaluate(request.to(), base, "end value");
            if (from == to) {
                throw new ModelEvaluationException("the start and end values are equal (" + from + ")");
            }
            parameters = new ParameterVector(model.model(), base, request.parameter().index());
            p = parameters.at(from);
            initial = InitialValues.resolve(model.model(), p);
        } catch (ModelEvaluationException e) {
            return new ContinuationResult(null, Status.FAILED, "INVALID_INPUT", e.getMessage());
        }
        // the equilibria at the start, searched as an equilibrium study searches them
        EquilibriumSearchOutcome search = EquilibriumSearchRunner.search(model, p, initial,
                EquilibriumSearchRunner.runPoints(model, p, initial, large, settings, budget), large, settings,
                budget).outcome();
        List<double[]> roots = search.equilibria().stream().map(Equilibrium::coordinates).toList();
        ContinuationOutcome outcome = new BranchFollower(model.field(), parameters, base.length, from, to,
                ContinuationSettings.DEFAULT.withBlowUpBound(settings.blowUpBound()), budget.deadlineNanos(),
                budget.cancelled()).follow(roots);
        // shooting for periodic orbits integrates the n×n variational equations: not for large models
        List<CycleBranch> cycles = large ? List.of()
                : cycles(model, parameters, base.length, from, to, outcome, settings, budget);
        boolean complete = outcome.ending() == ContinuationOutcome.Ending.COMPLETED
                && search.ending() == EquilibriumSearchOutcome.Ending.COMPLETED;
        String message = roots.size() + (roots.size() == 1 ? " equilibrium" : " equilibria") + " at "
                + parameters.name() + " = " + SectionRunner.plain(from) + "; " + outcome.message();
        if (!cycles.isEmpty()) {
            long special = cycles.stream().mapToLong(c -> c.specialPoints().size()).sum();
            message += "; " + cycles.size() + (cycles.size() == 1 ? " family" : " families")
                    + " of periodic orbits from Hopf points, " + special + " special "
                    + (special == 1 ? "point" : "points") + " on them";
        }
        if (large) {
            message += "; a model of " + model.dimension() + " states is followed with its sparse Jacobian: "
                    + "stability from the rightmost eigenvalues (all of them at a state the same in every cell of a "
                    + "ring), no periodic orbits from Hopf points";
            if (!Double.isNaN(outcome.hopfSightLostAt())) {
                message += "; from " + parameters.name() + " = " + BranchFollower.number(outcome.hopfSightLostAt())
                        + " on branch " + outcome.hopfSightLostOn() + " every listed eigenvalue is unstable, so Hopf "
                        + "points further down the spectrum may be missed";
            }
        }
        if (search.ending() != EquilibriumSearchOutcome.Ending.COMPLETED) {
            message += "; the search at the start " + search.message().replaceFirst("^found [^;]*; ", "");
        }
        return new ContinuationResult(outcome, cycles, complete ? Status.COMPLETED : Status.INCOMPLETE,
                complete ? "COMPLETED" : outcome.ending() != ContinuationOutcome.Ending.COMPLETED
                        ? outcome.ending().name() : search.ending().name(), message);
    }

    /** The periodic orbits born at each Hopf point (at most {@link #MAX_CYCLE_FAMILIES}), within the budget. */
    private static List<CycleBranch> cycles(CompiledModel model, ParameterVector parameters, int parameterCount,
            double from, double to, ContinuationOutcome outcome, RunSettings settings, Budget budget) {
        List<CycleBranch> out = new ArrayList<>();
        CycleFollower follower = new CycleFollower(model.field(), parameters, parameterCount, from, to,
                CycleSettings.DEFAULT, settings.blowUpBound(), budget.deadlineNanos(), budget.cancelled());
        for (SpecialPoint s : outcome.specialPoints()) {
            if (s.kind() != SpecialPoint.Kind.HOPF || out.size() >= MAX_CYCLE_FAMILIES || budget.expired()
                    || budget.cancelled().getAsBoolean()) {
                continue;
            }
            out.add(follower.follow(out.size() + 1, s.state(), s.parameter(), s.frequency()));
        }
        return out;
    }
}
