package org.phasewright.runtime.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.lyapunov.LyapunovOutcome;
import org.phasewright.runtime.lyapunov.LyapunovSpectrum;
import org.phasewright.runtime.model.LyapunovExponents;
import org.phasewright.runtime.symbolic.InitialValues;
import org.phasewright.runtime.symbolic.ModelEvaluationException;

/** Runs one {@link LyapunovExponents} request from the model's initial values. */
final class LyapunovRunner {
    /** Benettin's method needs accurate tangent vectors; this is tighter than the simulation default. */
    static final double DEFAULT_RTOL = 1e-9;

    private LyapunovRunner() {
    }

    static LyapunovResult run(CompiledModel model, LyapunovExponents request, RunSettings settings, Budget budget) {
        double[] p = model.parameters();
        double endTime = Double.NaN;
        double rtol = DEFAULT_RTOL;
        try {
            // By hand, not Ensembles.positive: the FAILED result reports the rejected end time.
            endTime = InitialValues.evaluate(request.endTime(), p, "end time");
            if (!(endTime > 0)) {
                throw new ModelEvaluationException("end time must be positive, got " + endTime);
            }
            rtol = Ensembles.tolerance(request.tolerance(), p, rtol);
        } catch (ModelEvaluationException e) {
            return new LyapunovResult(null, endTime, Status.FAILED, "INVALID_INPUT", e.getMessage());
        }
        String tooLarge = tooLarge(model, request);
        if (tooLarge != null) {
            return new LyapunovResult(null, endTime, Status.FAILED, "MODEL_TOO_LARGE", tooLarge);
        }
        IntegratorSettings s = IntegratorSettings.DEFAULT
                .withTolerances(rtol, rtol * SimulationRunner.ATOL_PER_RTOL)
                .withMaxSteps(settings.maxSteps())
                .withBlowUpBound(settings.blowUpBound())
                .withDeadline(budget.deadlineNanos())
                .withCancellation(budget.cancelled());
        LyapunovOutcome spectrum = new LyapunovSpectrum(model.field(), p, request.leading()).compute(
                model.initialState(), endTime, s,
                ProgressObserver.timeListener(settings, ProgressObserver.task("lyapunov", model.timeName(), endTime),
                        0.0, endTime));
        String time = model.timeName();
        if (!spectrum.integration().completed()) {
            return new LyapunovResult(spectrum, endTime, IntegratorChoice.status(spectrum.integration()),
                    spectrum.integration().ending().name(), spectrum.integration().message(time)
                            + "; exponents so far " + list(spectrum.exponents()));
        }
        int k = spectrum.exponents().length;
        String what = k < model.dimension()
                ? String.format(Locale.ROOT, "leading %d of %d exponents %s per unit %s (mean divergence %s, "
                        + "which all %d sum to)", k, model.dimension(), list(spectrum.exponents()), time,
                        number(spectrum.meanDivergence()), model.dimension())
                : String.format(Locale.ROOT, "exponents %s per unit %s (sum %s, mean divergence %s)",
                        list(spectrum.exponents()), time, number(spectrum.sum()), number(spectrum.meanDivergence()));
        String message = String.format(Locale.ROOT, "%s; %s", what,
                spectrum.converged()
                        ? "converged: no exponent moved by more than " + number(spectrum.largestChange())
                                + " over the second half"
                        : "not converged: an exponent moved by " + number(spectrum.largestChange())
                                + " over the second half; integrate longer");
        return new LyapunovResult(spectrum, endTime, Status.COMPLETED,
                spectrum.converged() ? "COMPLETED" : "NOT_CONVERGED", message);
    }

    /**
     * Why a request cannot run on this model, or null. The whole spectrum of n exponents needs n² tangent entries;
     * above {@link SparseJacobian#DENSE_LIMIT} states only the leading ones are affordable, and only with a sparse
     * Jacobian.
     */
    static String tooLarge(CompiledModel model, LyapunovExponents request) {
        int n = model.dimension();
        if (n <= SparseJacobian.DENSE_LIMIT) {
            return null;
        }
        if (request.leading() == 0 || request.leading() >= n) {
            return "the whole spectrum of a model with " + n + " states needs " + n + "² tangent entries; above "
                    + SparseJacobian.DENSE_LIMIT + " states ask for the few leading exponents only";
        }
        if ((long) n * request.leading() > LyapunovSpectrum.MAX_TANGENT_ENTRIES) {
            return "the leading " + request.leading() + " exponents of a model with " + n + " states need "
                    + "too many tangent entries; ask for fewer (states × exponents at most "
                    + LyapunovSpectrum.MAX_TANGENT_ENTRIES + ")";
        }
        if (model.field().sparseJacobian() == null) {
            return "the Jacobian of this model of " + n + " states has too many nonzeros for the sparse tangent "
                    + "equations";
        }
        return null;
    }

    private static String list(double[] values) {
        List<String> parts = new ArrayList<>();
        for (double v : values) {
            parts.add(number(v));
        }
        return String.join(", ", parts);
    }

    private static String number(double x) {
        return String.format(Locale.ROOT, "%.5g", x);
    }
}
