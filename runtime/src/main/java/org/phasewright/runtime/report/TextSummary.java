package org.phasewright.runtime.report;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.integrate.IntegrationOutcome;
import org.phasewright.runtime.study.AnalysisResult;
import org.phasewright.runtime.study.ContinuationResult;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.LyapunovResult;
import org.phasewright.runtime.study.SectionResult;
import org.phasewright.runtime.study.SimulationResult;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.SweepResult;
import org.phasewright.runtime.study.LyapunovMapResult;
import org.phasewright.runtime.study.BasinsResult;

/** A plain-text account of a study for a terminal: outcomes, counts, final states and a table of equilibria. */
public final class TextSummary {
    /** Shown with every report: models of heaters, reactors and the like can drive real decisions. */
    public static final String CAUTION = "These results describe the model, not the equipment it stands for; for any"
            + " design or safety decision defer to the applicable codes and qualified review.";

    /** Final states of larger models are shown up to this many states. */
    static final int SHOWN_STATES = 16;

    private TextSummary() {
    }

    public static String render(StudyResult study) {
        StringBuilder out = new StringBuilder();
        out.append("Model ").append(study.modelName()).append(", study ").append(study.studyName()).append('\n');
        if (!study.parameterNames().isEmpty()) {
            out.append("Parameters: ").append(assignments(study.parameterNames(), study.parameterValues()))
                    .append('\n');
        }
        int simulation = 0, search = 0;
        for (AnalysisResult r : study.results()) {
            out.append('\n');
            switch (r) {
                case SimulationResult s -> simulation(out, study, s, ++simulation);
                case EquilibriumResult e -> equilibria(out, study, e, ++search);
                case SectionResult x -> out.append("Section: ").append(x.outcome()).append(" - ")
                        .append(x.message()).append('\n');
                case LyapunovResult l -> out.append("Lyapunov exponents: ").append(l.outcome()).append(" - ")
                        .append(l.message()).append('\n');
                case ContinuationResult c -> ContinuationSummary.text(out, study, c);
                case SweepResult w -> out.append("Orbit diagram").append(w.sweep() == null ? ""
                        : " in " + w.sweep().parameterName() + " from " + Numbers.compact(w.sweep().from()) + " to "
                                + Numbers.compact(w.sweep().to())).append(": ").append(w.outcome()).append(" - ")
                        .append(w.message()).append('\n');
                case LyapunovMapResult m -> out.append("Lyapunov map").append(m.first() == null ? ""
                        : " over " + m.first().name() + " and " + m.second().name()).append(": ").append(m.outcome())
                        .append(" - ").append(m.message()).append('\n');
                case BasinsResult b -> out.append("Basins").append(b.first() == null ? ""
                        : " over " + b.first().name() + " and " + b.second().name()).append(": ").append(b.outcome())
                        .append(" - ").append(b.message()).append('\n');
            }
        }
        return out.toString();
    }

    private static void simulation(StringBuilder out, StudyResult study, SimulationResult s, int number) {
        out.append("Simulation ").append(number).append(": ").append(s.outcome()).append(" - ").append(s.message())
                .append('\n');
        IntegrationOutcome o = s.integration();
        if (o == null) {
            return;
        }
        if (!o.completed()) { // the message of a completed run already gives the counts
            out.append("  steps: ").append(o.acceptedSteps()).append(" accepted, ").append(o.rejectedSteps())
                    .append(" rejected; ").append(o.rhsEvaluations()).append(" rate evaluations\n");
        }
        double[] state = o.state();
        boolean many = state.length > SHOWN_STATES;
        out.append("  state at ").append(study.timeName()).append(" = ").append(Numbers.compact(o.time()))
                .append(": ").append(assignments(study.stateNames(), many
                        ? java.util.Arrays.copyOf(state, SHOWN_STATES) : state))
                .append(many ? ", ... (" + state.length + " states; every one in final-state.csv)" : "")
                .append('\n');
        if (s.trajectory() != null) {
            out.append("  output: ").append(s.trajectory().size()).append(" samples")
                    .append(s.trajectory().kept() == null ? "" : " keeping the " + s.trajectory().kept())
                    .append('\n');
        }
    }

    private static void equilibria(StringBuilder out, StudyResult study, EquilibriumResult e, int number) {
        out.append("Equilibria").append(number > 1 ? " " + number : "").append(": ").append(e.outcome())
                .append(" - ").append(e.message()).append('\n');
        if (e.equilibria().isEmpty()) {
            return;
        }
        List<List<String>> rows = new ArrayList<>();
        List<String> header = new ArrayList<>(List.of("name"));
        int shown = Math.min(study.stateNames().size(), SHOWN_STATES); // large models: the first few coordinates
        boolean cut = shown < study.stateNames().size();
        header.addAll(study.stateNames().subList(0, shown));
        if (cut) {
            header.add("...");
        }
        header.addAll(List.of("eigenvalues", "type"));
        rows.add(header);
        for (Equilibrium q : e.equilibria()) {
            List<String> row = new ArrayList<>(List.of(q.name()));
            double[] coordinates = q.coordinates();
            for (int i = 0; i < shown; i++) {
                row.add(Numbers.compact(coordinates[i]));
            }
            if (cut) {
                row.add("...");
            }
            row.add(eigenvalues(q.eigenvaluesReal(), q.eigenvaluesImag()));
            row.add(q.type());
            rows.add(row);
        }
        table(out, rows);
        if (org.phasewright.runtime.study.ReducedOutput.reduced(study.stateNames().size())) {
            out.append("(").append(study.stateNames().size())
                    .append(" states; every coordinate in equilibria-states.csv)\n");
        }
        SymmetrySummary.text(out, e.symmetry());
    }

    /** Conjugate pairs (adjacent after sorting: +b then -b) are shown once as a ± bi. */
    static String eigenvalues(double[] re, double[] im) {
        List<String> parts = new ArrayList<>();
        for (int k = 0; k < re.length; k++) {
            boolean pair = k + 1 < re.length && im[k] != 0 && im[k + 1] == -im[k] && re[k + 1] == re[k];
            parts.add(Numbers.complex(re[k], im[k], pair));
            if (pair) {
                k++;
            }
        }
        return String.join(", ", parts);
    }

    private static String assignments(List<String> names, double[] values) {
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            parts.add(names.get(i) + " = " + Numbers.compact(values[i]));
        }
        return String.join(", ", parts);
    }

    private static void table(StringBuilder out, List<List<String>> rows) {
        int columns = rows.get(0).size();
        int[] width = new int[columns];
        for (List<String> row : rows) {
            for (int c = 0; c < columns; c++) {
                width[c] = Math.max(width[c], row.get(c).length());
            }
        }
        for (List<String> row : rows) {
            StringBuilder line = new StringBuilder("  ");
            for (int c = 0; c < columns; c++) {
                line.append(row.get(c));
                if (c < columns - 1) {
                    line.append(" ".repeat(width[c] - row.get(c).length() + 2));
                }
            }
            out.append(line.toString().stripTrailing()).append('\n');
        }
    }
}
