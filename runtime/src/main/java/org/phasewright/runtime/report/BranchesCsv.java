package org.phasewright.runtime.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.continuation.Branch;
import org.phasewright.runtime.continuation.ContinuationOutcome;
import org.phasewright.runtime.continuation.ContinuationPoint;

/**
 * branches.csv: one row per point of every branch, in the order followed: branch, point, the parameter, the states,
 * stable (true/false: no eigenvalue with positive real part), unstable_dimension, type, and special (fold, Hopf,
 * branch point where one was located, else empty).
 */
public final class BranchesCsv {
    private BranchesCsv() {
    }

    public static String render(List<String> stateNames, ContinuationOutcome outcome) {
        StringBuilder out = new StringBuilder();
        try {
            List<String> header = new ArrayList<>(List.of("branch", "point", outcome.parameterName()));
            header.addAll(stateNames);
            header.addAll(List.of("stable", "unstable_dimension", "type", "special"));
            Csv.row(out, header);
            for (Branch b : outcome.branches()) {
                int k = 0;
                for (ContinuationPoint p : b.points()) {
                    List<String> row = new ArrayList<>();
                    row.add(Integer.toString(b.number()));
                    row.add(Integer.toString(++k));
                    row.add(Csv.number(p.parameter()));
                    for (double x : p.state()) {
                        row.add(Csv.number(x));
                    }
                    row.add(Boolean.toString(p.stable()));
                    var c = p.classification(); // empty when the point could not be classified
                    row.add(c.classified() ? Integer.toString(c.unstableDimension()) : "");
                    row.add(p.classification().type());
                    row.add(p.special() == null ? "" : p.special().word());
                    Csv.row(out, row);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a StringBuilder does not throw
        }
        return out.toString();
    }
}
