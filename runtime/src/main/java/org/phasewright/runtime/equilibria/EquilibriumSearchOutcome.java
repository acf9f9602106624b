package org.phasewright.runtime.equilibria;

import java.util.List;

/**
 * What a search found and whether it looked everywhere it meant to.
 *
 * @param startsTried      Newton runs begun
 * @param startsConverged  runs that reached a root (before de-duplication)
 * @param totalIterations  Newton iterations over all runs
 */
public record EquilibriumSearchOutcome(Ending ending, List<Equilibrium> equilibria, int startsTried,
        int startsConverged, long totalIterations) {

    /** COMPLETED: every start was tried. The others stopped early; what was found so far is still listed. */
    public enum Ending { COMPLETED, WORK_LIMIT, TIME_LIMIT, CANCELLED }

    public EquilibriumSearchOutcome {
        equilibria = List.copyOf(equilibria);
    }

    public String message() {
        String found = "found " + equilibria.size() + (equilibria.size() == 1 ? " equilibrium" : " equilibria");
        return switch (ending) {
            case COMPLETED -> found + " from " + startsTried + " starts";
            case WORK_LIMIT -> found + "; stopped at the work limit after " + startsTried
                    + " starts, so the list may be incomplete";
            case TIME_LIMIT -> found + "; stopped at the wall-time limit after " + startsTried
                    + " starts, so the list may be incomplete";
            case CANCELLED -> found + "; cancelled after " + startsTried + " starts";
        };
    }
}
