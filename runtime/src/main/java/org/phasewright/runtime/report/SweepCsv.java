package org.phasewright.runtime.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;

import org.phasewright.runtime.sweep.SweepColumn;
import org.phasewright.runtime.sweep.SweepOutcome;

/** sweep.csv: one row per local maximum: the parameter value, the state's name and the maximum, in sweep order. */
public final class SweepCsv {
    private SweepCsv() {
    }

    public static String render(List<String> stateNames, SweepOutcome outcome) {
        StringBuilder out = new StringBuilder();
        try {
            Csv.row(out, List.of(outcome.parameterName(), "state", "maximum"));
            for (SweepColumn c : outcome.columns()) {
                for (int i = 0; i < c.states(); i++) {
                    for (double m : c.maxima(i)) {
                        Csv.row(out, List.of(Csv.number(c.parameter()), stateNames.get(i), Csv.number(m)));
                    }
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a StringBuilder does not throw
        }
        return out.toString();
    }
}
