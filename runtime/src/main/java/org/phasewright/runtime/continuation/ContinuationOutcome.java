package org.phasewright.runtime.continuation;

import java.util.List;

/**
 * Every branch followed and every special point located on them, and whether the run did all it meant to.
 *
 * @param corrections     Newton corrections over all branches (a measure of work)
 * @param hopfSightLostAt the parameter value at the first point where a large model's list of rightmost
 *                        eigenvalues held none left of the imaginary axis, so pairs crossing it further down could be
 *                        out of the Hopf test's sight; NaN when that never happened
 * @param hopfSightLostOn the number of that point's branch (0 when none)
 */
public record ContinuationOutcome(String parameterName, double from, double to, Ending ending, List<Branch> branches,
        List<SpecialPoint> specialPoints, long corrections, double hopfSightLostAt, int hopfSightLostOn) {

    /** COMPLETED: every branch ran to an end of its own; the others stopped early and keep what was found. */
    public enum Ending { COMPLETED, WORK_LIMIT, TIME_LIMIT, CANCELLED }

    public ContinuationOutcome {
        branches = List.copyOf(branches);
        specialPoints = List.copyOf(specialPoints);
    }

    public int pointCount() {
        return branches.stream().mapToInt(b -> b.points().size()).sum();
    }

    public String message() {
        long folds = count(SpecialPoint.Kind.FOLD), hopf = count(SpecialPoint.Kind.HOPF),
                bps = count(SpecialPoint.Kind.BRANCH_POINT);
        String found = branches.size() + (branches.size() == 1 ? " branch, " : " branches, ") + pointCount()
                + " points; " + folds + (folds == 1 ? " fold, " : " folds, ") + hopf + " Hopf, " + bps
                + (bps == 1 ? " branch point" : " branch points");
        return switch (ending) {
            case COMPLETED -> found;
            case WORK_LIMIT -> found + "; stopped at the work limit, so branches may be missing or short";
            case TIME_LIMIT -> found + "; stopped at the wall-time limit, so branches may be missing or short";
            case CANCELLED -> found + "; cancelled";
        };
    }

    private long count(SpecialPoint.Kind kind) {
        return specialPoints.stream().filter(s -> s.kind() == kind).count();
    }
}
