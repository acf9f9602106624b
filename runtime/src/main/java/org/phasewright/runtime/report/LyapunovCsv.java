package org.phasewright.runtime.report;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.lyapunov.LyapunovOutcome;

/**
 * lyapunov.csv: the running estimates of the exponents (largest first) against time, ending with the final values,
 * so a reader can see whether they have settled.
 */
public final class LyapunovCsv {
    private LyapunovCsv() {
    }

    public static String render(String timeName, LyapunovOutcome spectrum) {
        StringBuilder out = new StringBuilder();
        int n = spectrum.exponents().length;
        List<String> header = new ArrayList<>();
        header.add(timeName);
        for (int i = 1; i <= n; i++) {
            header.add("exponent_" + i);
        }
        try {
            Csv.row(out, header);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e); // StringBuilder does not throw
        }
        double[] times = spectrum.historyTimes();
        double[][] rows = spectrum.history();
        for (int k = 0; k < times.length; k++) {
            out.append(Csv.number(times[k]));
            for (double v : rows[k]) {
                out.append(',').append(Csv.number(v));
            }
            out.append('\n');
        }
        return out.toString();
    }
}
