package org.phasewright.runtime.report;

import java.io.IOException;
import java.util.List;

import org.phasewright.runtime.integrate.IntegrationOutcome;

/**
 * final-state.csv: the state where a simulation ended, one row per state (name, value), for models too large for a
 * row of the trajectory to hold every state.
 */
public final class FinalStateCsv {
    private FinalStateCsv() {
    }

    public static void write(List<String> stateNames, IntegrationOutcome outcome, Appendable out) throws IOException {
        Csv.row(out, List.of("state", "value at " + Csv.number(outcome.time())));
        double[] u = outcome.state();
        for (int i = 0; i < u.length; i++) {
            Csv.row(out, List.of(stateNames.get(i), Csv.number(u[i])));
        }
    }
}
