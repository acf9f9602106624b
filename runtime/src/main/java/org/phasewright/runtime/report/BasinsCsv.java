package org.phasewright.runtime.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;

import org.phasewright.runtime.ensemble.BasinPoint;
import org.phasewright.runtime.study.BasinsResult;

/**
 * basins.csv: one row per start in grid order (the first state varying slowest): both initial values, the label
 * (index of the equilibrium reached, -1 for none), that equilibrium's name (empty for none) and how the
 * integration ended; starts that did not run are left out.
 */
public final class BasinsCsv {
    private BasinsCsv() {
    }

    public static String render(BasinsResult basins) {
        StringBuilder out = new StringBuilder();
        try {
            Csv.row(out, List.of(basins.first().name(), basins.second().name(), "label", "equilibrium", "ending"));
            for (int i = 0; i < basins.first().steps(); i++) {
                for (int j = 0; j < basins.second().steps(); j++) {
                    BasinPoint p = basins.points().get(i * basins.second().steps() + j);
                    if (p != null) {
                        String name = p.label() >= 0 ? basins.equilibria().get(p.label()).name() : "";
                        Csv.row(out, List.of(Csv.number(basins.first().value(i)),
                                Csv.number(basins.second().value(j)), Integer.toString(p.label()), name,
                                p.ending()));
                    }
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a StringBuilder does not throw
        }
        return out.toString();
    }
}
