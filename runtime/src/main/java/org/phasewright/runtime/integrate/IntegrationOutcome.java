package org.phasewright.runtime.integrate;

import java.util.Locale;

/**
 * How an integration ended, where, and what it cost.
 *
 * @param time  the time reached: the end time, or where the integration stopped
 * @param state the last accepted state (at {@code time})
 * @param stiffnessDetectedAt where an explicit method found the problem stiff (NaN if it did not, or could not tell)
 */
public record IntegrationOutcome(Ending ending, double time, double[] state, long rhsEvaluations,
        long acceptedSteps, long rejectedSteps, double lastStepSize, double blowUpBound, double stiffnessDetectedAt) {

    public IntegrationOutcome(Ending ending, double time, double[] state, long rhsEvaluations, long acceptedSteps,
            long rejectedSteps, double lastStepSize, double blowUpBound) {
        this(ending, time, state, rhsEvaluations, acceptedSteps, rejectedSteps, lastStepSize, blowUpBound,
                Double.NaN);
    }

    /** The ways an integration can end. Only COMPLETED reaches the requested end time. */
    public enum Ending {
        COMPLETED, BLEW_UP, STEP_SIZE_UNDERFLOW, NOT_FINITE, STEP_LIMIT, TIME_LIMIT, CANCELLED,
        /** An observer asked to stop (an event); integrators report the end of the step that contains it. */
        STOPPED
    }

    public IntegrationOutcome {
        state = state.clone();
    }

    @Override
    public double[] state() {
        return state.clone();
    }

    public boolean completed() {
        return ending == Ending.COMPLETED;
    }

    /** True when an explicit method saw the step size held down by stability rather than accuracy. */
    public boolean stiffnessDetected() {
        return !Double.isNaN(stiffnessDetectedAt);
    }

    /** One line for a person, e.g. "integration blew up at t = 3.2e-01: |u| exceeded 1e12". */
    public String message() {
        return message("t");
    }

    /** {@link #message()} with the model's own name for time. */
    public String message(String timeName) {
        String main = describe(timeName + " = " + number(time));
        return stiffnessDetected() ? main + "; stiff near " + timeName + " = " + number(stiffnessDetectedAt)
                + ", use a stiff method (method stiff)" : main;
    }

    private String describe(String at) {
        return switch (ending) {
            case COMPLETED -> "integrated to " + at + " in " + acceptedSteps + " steps (" + rejectedSteps
                    + " rejected, " + rhsEvaluations + " evaluations)";
            case BLEW_UP -> "integration blew up at " + at + ": |u| exceeded " + bound(blowUpBound);
            case STEP_SIZE_UNDERFLOW -> "step size underflow at " + at + " (h = " + number(Math.abs(lastStepSize))
                    + "): the solution may have a singularity there, or the system is too stiff for this method";
            case NOT_FINITE -> "the rates became NaN or infinite at " + at;
            case STEP_LIMIT -> "step limit reached at " + at + " after " + (acceptedSteps + rejectedSteps)
                    + " steps";
            case TIME_LIMIT -> "wall-time limit reached at " + at;
            case CANCELLED -> "cancelled at " + at;
            case STOPPED -> "stopped by an event at " + at;
        };
    }

    static String number(double x) {
        return String.format(Locale.ROOT, "%.1e", x);
    }

    /** Powers of ten read best as "1e12". */
    static String bound(double b) {
        long e = Math.round(Math.log10(b));
        return Math.pow(10, e) == b ? "1e" + e : String.format(Locale.ROOT, "%.3g", b);
    }
}
