package org.phasewright.runtime.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;

import org.phasewright.runtime.ensemble.LyapunovPoint;
import org.phasewright.runtime.study.LyapunovMapResult;

/**
 * lyapunov-map.csv: one row per grid point in grid order (the first parameter varying slowest): both parameter
 * values, the largest exponent, whether it converged and how the integration ended; points that did not run are
 * left out.
 */
public final class LyapunovMapCsv {
    private LyapunovMapCsv() {
    }

    public static String render(LyapunovMapResult map) {
        StringBuilder out = new StringBuilder();
        try {
            Csv.row(out, List.of(map.first().name(), map.second().name(), "largest_exponent", "converged",
                    "ending"));
            for (int i = 0; i < map.first().steps(); i++) {
                for (int j = 0; j < map.second().steps(); j++) {
                    LyapunovPoint p = map.points().get(i * map.second().steps() + j);
                    if (p != null) {
                        Csv.row(out, List.of(Csv.number(map.first().value(i)), Csv.number(map.second().value(j)),
                                Csv.number(p.exponent()), Boolean.toString(p.converged()), p.ending()));
                    }
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a StringBuilder does not throw
        }
        return out.toString();
    }
}
