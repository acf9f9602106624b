package org.phasewright.runtime.continuation;

import java.util.List;

/**
 * A branch of equilibria in the order it was followed.
 *
 * @param number 1-based
 * @param origin where it started, e.g. "equilibrium at r = 0" or "branch point at r = 1 on branch 1"
 * @param ending why it stopped, e.g. "reached r = 30", "closed loop", "point limit"
 */
public record Branch(int number, String origin, List<ContinuationPoint> points, String ending) {
    public Branch {
        points = List.copyOf(points);
    }
}
