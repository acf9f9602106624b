package org.phasewright.language.ui.builder;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.BooleanSupplier;

import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.StudyPipeline;
import org.phasewright.language.standalone.StudyPipelineException;
import org.phasewright.language.standalone.StudyRun;
import org.phasewright.language.ui.results.EquilibriumRow;
import org.phasewright.language.ui.results.ModelResults;
import org.phasewright.language.ui.results.StudyResults;
import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.RunSettings;
import org.phasewright.runtime.study.SimulationResult;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.Trajectory;
import org.phasewright.runtime.symmetry.EquilibriumSymmetry;
import org.phasewright.runtime.symmetry.SymmetryReport;

/**
 * Runs a checked model's studies through the shared {@link StudyPipeline} (results written beside the model, as the
 * command line does) and turns the numbers into what the results view shows. All numerics are the runtime's.
 */
final class StudyExecution {
    private StudyExecution() {
    }

    /** A study that could not run: the message is for the user. */
    static final class StudyFailure extends Exception {
        StudyFailure(String message) {
            super(message);
        }
    }

    static ModelResults run(CheckedModel checked, Path modelFile, BooleanSupplier cancelled) throws StudyFailure {
        long start = System.nanoTime();
        List<StudyRun> runs;
        try {
            runs = StudyPipeline.run(checked.ast(), StudyPipeline.resultsFolderFor(modelFile), null,
                    RunSettings.DEFAULT.withCancellation(cancelled));
        } catch (StudyPipelineException e) {
            throw new StudyFailure("The studies could not run: " + e.getMessage());
        }
        List<StudyResults> shown = new ArrayList<>();
        for (StudyRun run : runs) {
            shown.add(toView(run.result(), run.folder()));
        }
        long elapsed = (System.nanoTime() - start) / 1_000_000;
        return new ModelResults(modelFile.getFileName().toString(), null, shown, elapsed);
    }

    static StudyResults toView(StudyResult result, Path folder) {
        double[] times = new double[0];
        double[][] states = new double[result.stateNames().size()][0];
        List<SimulationResult> simulations = result.simulations();
        if (!simulations.isEmpty()) {
            Trajectory trajectory = simulations.get(0).trajectory();
            times = trajectory.times();
            states = new double[result.stateNames().size()][trajectory.size()];
            for (int row = 0; row < trajectory.size(); row++) {
                for (int k = 0; k < states.length; k++) {
                    states[k][row] = trajectory.state(row, k);
                }
            }
        }
        List<EquilibriumRow> rows = new ArrayList<>();
        for (EquilibriumResult search : result.equilibriumSearches()) {
            for (Equilibrium equilibrium : search.equilibria()) {
                rows.add(new EquilibriumRow(equilibrium.name(), equilibrium.coordinates(),
                        eigenvalueText(equilibrium.eigenvaluesReal(), equilibrium.eigenvaluesImag()),
                        equilibrium.classification().type(), orbitText(search.symmetry(), equilibrium.name())));
            }
        }
        String note = result.status().name().toLowerCase(Locale.ROOT).replace('_', ' ');
        return new StudyResults(result.studyName(), result.timeName(), result.stateNames(), times, states, rows, folder,
                note);
    }

    /**
     * The symmetry column: which orbit the equilibrium is in, the declared symmetries that fix it and where the others
     * send it, e.g. "orbit 2; reversal: E3"; a dash when the model declares no symmetry.
     */
    static String orbitText(SymmetryReport report, String equilibrium) {
        for (EquilibriumSymmetry entry : report.equilibria()) {
            if (entry.equilibrium().equals(equilibrium)) {
                List<String> parts = new ArrayList<>();
                parts.add("orbit " + entry.orbit());
                if (!entry.isotropy().isEmpty()) {
                    parts.add("fixed by " + String.join(", ", entry.isotropy()));
                }
                entry.images().stream().filter(image -> !image.endsWith(": " + equilibrium)).forEach(parts::add);
                return String.join("; ", parts);
            }
        }
        return "—";
    }

    static String eigenvalueText(double[] re, double[] im) {
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < re.length; i++) {
            if (i > 0) {
                text.append(", ");
            }
            text.append(String.format(Locale.ROOT, "%.4g", re[i]));
            if (im[i] != 0) {
                text.append(String.format(Locale.ROOT, " %s %.4gi", im[i] < 0 ? "-" : "+", Math.abs(im[i])));
            }
        }
        return text.toString();
    }
}
