package org.phasewright.runtime.periodic;

import java.util.List;

/**
 * The family of periodic orbits born at one Hopf point, in the order followed.
 *
 * @param number     1-based, over all cycle families of the run
 * @param hopfParameter the parameter at the Hopf point it starts from
 * @param ending     why it stopped, e.g. "reached r = 30", "period above 50 times the Hopf period"
 */
public record CycleBranch(int number, double hopfParameter, List<CyclePoint> points, String ending) {

    /** Bifurcations of periodic orbits, named in full words. */
    public enum Special {
        PERIOD_DOUBLING("period doubling"), FOLD_OF_CYCLES("fold of cycles");

        private final String word;

        Special(String word) {
            this.word = word;
        }

        public String word() {
            return word;
        }
    }

    public CycleBranch {
        points = List.copyOf(points);
    }

    public List<CyclePoint> specialPoints() {
        return points.stream().filter(p -> p.special() != null).toList();
    }
}
