package org.phasewright.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;

import org.phasewright.language.lowering.LoweringException;
import org.phasewright.language.lowering.ModelLowering;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.standalone.StudyPipeline;
import org.phasewright.language.standalone.StudyPipelineException;
import org.phasewright.language.standalone.StudyRun;
import org.phasewright.report.ReportContext;
import org.phasewright.report.StudyReport;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.study.RunSettings;

/**
 * The HTML report and results.json of `run`: runs the studies one at a time to time each, then writes each study's
 * report from its result, the model text and the lowered model (for units and settings).
 */
final class ReportStep {
    private final Path file;
    private final String text;
    private final DynamicalModel model;
    private final List<List<String>> axes;
    private final Map<StudyRun, Duration> times = new IdentityHashMap<>();
    private final Map<StudyRun, Instant> finished = new IdentityHashMap<>();

    private ReportStep(Path file, String text, DynamicalModel model, List<List<String>> axes) {
        this.file = file;
        this.text = text;
        this.model = model;
        this.axes = axes;
    }

    /** The model text as read for the report (null if it could not be read). */
    String text() {
        return text;
    }

    /** @param axesOption "a,b" or several pairs "a,b;c,d" of state names, or null for the default projections */
    static ReportStep prepare(Path file, PhaseModel ast, String axesOption) throws UsageException {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException | RuntimeException e) {
            text = null; // the report then omits the model text
        }
        DynamicalModel model;
        try {
            model = new ModelLowering().lower(ast);
        } catch (LoweringException | IllegalArgumentException e) {
            model = null;
        }
        return new ReportStep(file, text, model, axes(axesOption, model));
    }

    static List<List<String>> axes(String option, DynamicalModel model) throws UsageException {
        if (option == null) {
            return List.of();
        }
        List<List<String>> pairs = new ArrayList<>();
        for (String pair : option.split("[;\\s]+")) {
            if (pair.isEmpty()) {
                continue;
            }
            String[] names = pair.split(",", -1);
            if (names.length != 2 || names[0].isBlank() || names[1].isBlank()) {
                throw new UsageException("--axes wants two state names separated by a comma, e.g. --axes x,z; got '"
                        + pair + "'");
            }
            List<String> both = List.of(names[0].strip(), names[1].strip());
            if (model != null) {
                List<String> states = model.states().stream().map(s -> s.name()).toList();
                for (String n : both) {
                    if (!states.contains(n)) {
                        throw new UsageException("--axes: the model has no state '" + n + "'; its states: "
                                + String.join(", ", states));
                    }
                }
            }
            pairs.add(both);
        }
        return pairs;
    }

    /** {@link StudyPipeline#run}, one study at a time so that each report states its own run time. */
    List<StudyRun> run(PhaseModel ast, Path resultsRoot, String studyName, RunSettings settings)
            throws StudyPipelineException {
        List<String> names = new ArrayList<>();
        if (studyName == null && model != null && model.studies().size() > 1) {
            model.studies().stream().map(Study::name).forEach(names::add);
        } else {
            names.add(studyName);
        }
        List<StudyRun> runs = new ArrayList<>();
        for (String name : names) {
            long start = System.nanoTime();
            List<StudyRun> some = StudyPipeline.run(ast, resultsRoot, name, settings);
            Duration took = Duration.ofNanos(System.nanoTime() - start);
            for (StudyRun r : some) {
                times.put(r, some.size() == 1 ? took : took.dividedBy(some.size()));
                finished.put(r, Instant.now());
            }
            runs.addAll(some);
        }
        return runs;
    }

    /** Writes the report of one study; on failure says why on {@code err} and returns null. */
    Path write(StudyRun run, PrintStream err) {
        ReportContext context = new ReportContext(file.getFileName().toString(), text, model, Main.VERSION,
                times.get(run), finished.get(run), axes);
        try {
            return StudyReport.write(run.result(), run.folder(), context);
        } catch (IOException e) {
            err.println(file + ": error: cannot write the report to " + run.folder().resolve(StudyReport.FOLDER)
                    + " (" + e.getMessage() + "); the previous report, if any, is unchanged");
        } catch (RuntimeException e) {
            err.println(file + ": error: the report of study '" + run.result().studyName()
                    + "' could not be drawn (internal error: " + e + "); the previous report, if any, is unchanged");
        }
        return null;
    }
}
