package org.phasewright.runtime.report;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.ReducedOutput;

/**
 * equilibria.csv: name, coordinates (one column per state; above {@link ReducedOutput#LIMIT} states the first
 * {@link ReducedOutput#KEPT} and the mean and root mean square over all, with every coordinate in
 * {@link EquilibriumStatesCsv}), eigenvalue k as columns lambda{k}_re and lambda{k}_im (sorted by real part,
 * descending; none for equilibria too large to classify), type, and the stable, unstable and centre dimensions.
 */
public final class EquilibriaCsv {
    private EquilibriaCsv() {
    }

    public static String render(List<String> stateNames, EquilibriumResult result) {
        StringBuilder out = new StringBuilder();
        List<String> header = new ArrayList<>();
        header.add("name");
        boolean reduced = ReducedOutput.reduced(stateNames.size());
        int shown = reduced ? ReducedOutput.KEPT : stateNames.size();
        header.addAll(stateNames.subList(0, shown));
        if (reduced) {
            header.addAll(List.of(ReducedOutput.MEAN, ReducedOutput.RMS));
        }
        // equilibria of large models carry only their rightmost eigenvalues (or none): only columns some row fills
        int eigenvalues = result.equilibria().stream().mapToInt(e -> e.eigenvaluesReal().length).max().orElse(0);
        for (int k = 1; k <= eigenvalues; k++) {
            header.add("lambda" + k + "_re");
            header.add("lambda" + k + "_im");
        }
        header.addAll(List.of("type", "stable_dim", "unstable_dim", "centre_dim"));
        try {
            Csv.row(out, header);
            for (Equilibrium e : result.equilibria()) {
                List<String> row = new ArrayList<>();
                row.add(e.name());
                double[] x = e.coordinates();
                for (int i = 0; i < shown; i++) {
                    row.add(Csv.number(x[i]));
                }
                if (reduced) {
                    for (double v : ReducedOutput.meanAndRms(x)) {
                        row.add(Csv.number(v));
                    }
                }
                double[] re = e.eigenvaluesReal();
                double[] im = e.eigenvaluesImag();
                for (int k = 0; k < eigenvalues; k++) {
                    row.add(k < re.length ? Csv.number(re[k]) : "");
                    row.add(k < re.length ? Csv.number(im[k]) : "");
                }
                row.add(e.type());
                row.add(Integer.toString(e.classification().stableDimension()));
                row.add(Integer.toString(e.classification().unstableDimension()));
                row.add(Integer.toString(e.classification().centreDimension()));
                Csv.row(out, row);
            }
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        return out.toString();
    }
}
