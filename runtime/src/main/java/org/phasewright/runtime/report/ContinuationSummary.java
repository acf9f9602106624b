package org.phasewright.runtime.report;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.continuation.Branch;
import org.phasewright.runtime.continuation.ContinuationOutcome;
import org.phasewright.runtime.continuation.SpecialPoint;
import org.phasewright.runtime.periodic.CycleBranch;
import org.phasewright.runtime.periodic.CyclePoint;
import org.phasewright.runtime.study.ContinuationResult;
import org.phasewright.runtime.study.StudyResult;

/** The continuation part of the text summary: one line per branch and a table of special points in full words. */
final class ContinuationSummary {
    private ContinuationSummary() {
    }

    static void text(StringBuilder out, StudyResult study, ContinuationResult result) {
        ContinuationOutcome o = result.continuation();
        out.append("Continuation");
        if (o != null) {
            out.append(" in ").append(o.parameterName()).append(" from ").append(Numbers.compact(o.from()))
                    .append(" to ").append(Numbers.compact(o.to()));
        }
        out.append(": ").append(result.outcome()).append(" - ").append(result.message()).append('\n');
        if (o == null) {
            return;
        }
        for (Branch b : o.branches()) {
            out.append("  branch ").append(b.number()).append(": from ").append(b.origin()).append(", ")
                    .append(b.points().size()).append(" points, ").append(b.ending()).append('\n');
        }
        for (CycleBranch c : result.cycles()) {
            out.append("  periodic orbits ").append(c.number()).append(": from the Hopf point at ")
                    .append(o.parameterName()).append(" = ").append(Numbers.compact(c.hopfParameter())).append(", ")
                    .append(c.points().size()).append(" orbits, ").append(c.ending());
            if (!c.points().isEmpty()) {
                CyclePoint last = c.points().get(c.points().size() - 1);
                out.append("; last: ").append(o.parameterName()).append(" = ")
                        .append(Numbers.compact(last.parameter())).append(", period ")
                        .append(Numbers.compact(last.period())).append(last.stable() ? ", stable" : ", unstable");
            }
            out.append('\n');
            for (CyclePoint s : c.specialPoints()) {
                out.append("    ").append(s.special().word()).append(" at ").append(o.parameterName()).append(" = ")
                        .append(Numbers.compact(s.parameter())).append(", period ")
                        .append(Numbers.compact(s.period())).append('\n');
            }
        }
        if (o.specialPoints().isEmpty()) {
            return;
        }
        out.append("  special points:\n");
        List<List<String>> rows = new ArrayList<>();
        List<String> header = new ArrayList<>(List.of("kind", "branch", o.parameterName()));
        int shown = Math.min(study.stateNames().size(), TextSummary.SHOWN_STATES); // large models: the first few
        boolean cut = shown < study.stateNames().size();
        header.addAll(study.stateNames().subList(0, shown));
        if (cut) {
            header.add("...");
        }
        header.add("notes");
        rows.add(header);
        for (SpecialPoint s : o.specialPoints()) {
            List<String> row = new ArrayList<>(List.of(s.kind().word(), Integer.toString(s.branch()),
                    Numbers.compact(s.parameter())));
            double[] state = s.state();
            for (int i = 0; i < shown; i++) {
                row.add(Numbers.compact(state[i]));
            }
            if (cut) {
                row.add("...");
            }
            row.add(s.kind() != SpecialPoint.Kind.HOPF ? ""
                    : s.criticality() + (Double.isNaN(s.firstLyapunovCoefficient()) ? ""
                            : ", first Lyapunov coefficient " + Numbers.compact(s.firstLyapunovCoefficient()))
                            + ", frequency " + Numbers.compact(s.frequency()));
            rows.add(row);
        }
        int[] width = new int[header.size()];
        for (List<String> row : rows) {
            for (int c = 0; c < row.size(); c++) {
                width[c] = Math.max(width[c], row.get(c).length());
            }
        }
        for (List<String> row : rows) {
            StringBuilder line = new StringBuilder("    ");
            for (int c = 0; c < row.size(); c++) {
                line.append(row.get(c)).append(" ".repeat(width[c] - row.get(c).length() + 2));
            }
            out.append(line.toString().stripTrailing()).append('\n');
        }
    }
}
