package org.phasewright.runtime.sweep;

import java.util.List;

/** Every column of an orbit diagram in parameter order; columns not run (budget, cancellation) are left out. */
public record SweepOutcome(String parameterName, double from, double to, double endTime, List<SweepColumn> columns,
        int requested, int threads, Ending ending) {

    /** COMPLETED: every parameter value ran to its end time. */
    public enum Ending { COMPLETED, SOME_FAILED, TIME_LIMIT, CANCELLED }

    public SweepOutcome {
        columns = List.copyOf(columns);
    }

    public String message() {
        long points = columns.stream().mapToLong(c -> {
            long s = 0;
            for (int i = 0; i < c.states(); i++) {
                s += c.maxima(i).length;
            }
            return s;
        }).sum();
        String done = columns.size() + " of " + requested + " parameter values on " + threads
                + (threads == 1 ? " thread, " : " threads, ") + points + " maxima";
        return switch (ending) {
            case COMPLETED -> done;
            case SOME_FAILED -> done + "; some integrations ended early (see the ending of each column)";
            case TIME_LIMIT -> done + "; stopped at the wall-time limit";
            case CANCELLED -> done + "; cancelled";
        };
    }
}
