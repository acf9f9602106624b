package org.phasewright.runtime.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.study.Trajectory;

/** trajectory.csv: a header of time, state and derived names, then one row per output time. */
public final class TrajectoryCsv {
    private TrajectoryCsv() {
    }

    public static String render(Trajectory trajectory) {
        StringBuilder out = new StringBuilder();
        try {
            write(trajectory, out);
        } catch (IOException e) {
            throw new UncheckedIOException(e); // StringBuilder does not throw
        }
        return out.toString();
    }

    public static void write(Trajectory trajectory, Appendable out) throws IOException {
        List<String> header = new ArrayList<>();
        header.add(trajectory.timeName());
        header.addAll(trajectory.stateNames());
        header.addAll(trajectory.derivedNames());
        Csv.row(out, header);
        int n = trajectory.stateNames().size();
        int nd = trajectory.derivedNames().size();
        for (int k = 0; k < trajectory.size(); k++) {
            out.append(Csv.number(trajectory.time(k)));
            for (int i = 0; i < n; i++) {
                out.append(',').append(Csv.number(trajectory.state(k, i)));
            }
            for (int j = 0; j < nd; j++) {
                out.append(',').append(Csv.number(trajectory.derived(k, j)));
            }
            out.append('\n');
        }
    }
}
