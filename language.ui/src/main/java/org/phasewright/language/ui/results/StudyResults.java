package org.phasewright.language.ui.results;

import java.nio.file.Path;
import java.util.List;

/**
 * What the results view shows for one study: the trajectory ({@code states[k][row]} against {@code times[row]}),
 * the equilibria, and where the result files were written.
 */
public record StudyResults(String name, String timeName, List<String> stateNames, double[] times, double[][] states,
        List<EquilibriumRow> equilibria, Path folder, String note) {

    public boolean hasTrajectory() {
        return times.length > 0;
    }
}
