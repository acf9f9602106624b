package org.phasewright.runtime.report;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.study.EquilibriumResult;

/**
 * equilibria-states.csv: every coordinate of every equilibrium, one row per state (name, then one column per
 * equilibrium), for models too large for equilibria.csv to hold a column per state.
 */
public final class EquilibriumStatesCsv {
    private EquilibriumStatesCsv() {
    }

    public static void write(List<String> stateNames, EquilibriumResult result, Appendable out) throws IOException {
        List<Equilibrium> equilibria = result.equilibria();
        List<String> header = new ArrayList<>(List.of("state"));
        equilibria.forEach(e -> header.add(e.name()));
        Csv.row(out, header);
        // coordinates() copies its array: once per equilibrium, not once per state (10^5 states made it quadratic)
        List<double[]> coordinates = equilibria.stream().map(Equilibrium::coordinates).toList();
        List<String> row = new ArrayList<>();
        for (int i = 0; i < stateNames.size(); i++) {
            row.clear();
            row.add(stateNames.get(i));
            for (double[] x : coordinates) {
                row.add(Csv.number(x[i]));
            }
            Csv.row(out, row);
        }
    }
}
