package org.phasewright.runtime.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.periodic.CycleBranch;
import org.phasewright.runtime.periodic.CyclePoint;

/**
 * cycles.csv: one row per periodic orbit of every family followed from a Hopf point: family, point, the parameter,
 * period, a point on the orbit (the states), min_ and max_ of each state along it, stable, largest_multiplier (modulus
 * of the largest Floquet multiplier other than the trivial 1) and special (period doubling, fold of cycles, or empty).
 */
public final class CyclesCsv {
    private CyclesCsv() {
    }

    public static String render(String parameterName, List<String> stateNames, List<CycleBranch> cycles) {
        StringBuilder out = new StringBuilder();
        try {
            List<String> header = new ArrayList<>(List.of("family", "point", parameterName, "period"));
            header.addAll(stateNames);
            stateNames.forEach(s -> header.add("min_" + s));
            stateNames.forEach(s -> header.add("max_" + s));
            header.addAll(List.of("stable", "largest_multiplier", "special"));
            Csv.row(out, header);
            for (CycleBranch b : cycles) {
                int k = 0;
                for (CyclePoint p : b.points()) {
                    List<String> row = new ArrayList<>(List.of(Integer.toString(b.number()), Integer.toString(++k),
                            Csv.number(p.parameter()), Csv.number(p.period())));
                    for (double[] values : List.of(p.state(), p.minimum(), p.maximum())) {
                        for (double x : values) {
                            row.add(Csv.number(x));
                        }
                    }
                    row.add(Boolean.toString(p.stable()));
                    row.add(Csv.number(largestNontrivial(p)));
                    row.add(p.special() == null ? "" : p.special().word());
                    Csv.row(out, row);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e); // a StringBuilder does not throw
        }
        return out.toString();
    }

    /** The largest modulus among the multipliers after leaving out the one nearest 1. */
    static double largestNontrivial(CyclePoint p) {
        double[] re = p.multipliersReal(), im = p.multipliersImag();
        int trivial = 0;
        for (int k = 1; k < re.length; k++) {
            if (Math.hypot(re[k] - 1, im[k]) < Math.hypot(re[trivial] - 1, im[trivial])) {
                trivial = k;
            }
        }
        double largest = 0;
        for (int k = 0; k < re.length; k++) {
            if (k != trivial) {
                largest = Math.max(largest, Math.hypot(re[k], im[k]));
            }
        }
        return largest;
    }
}
