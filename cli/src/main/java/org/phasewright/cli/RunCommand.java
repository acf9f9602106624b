package org.phasewright.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.PhaseFiles;
import org.phasewright.language.standalone.StudyPipeline;
import org.phasewright.language.standalone.StudyPipelineException;
import org.phasewright.language.standalone.StudyRun;
import org.phasewright.runtime.report.TextSummary;
import org.phasewright.runtime.study.ProgressListener;
import org.phasewright.runtime.study.RunSettings;
import org.phasewright.runtime.study.Status;

/**
 * `phasewright run FILE [--study NAME] [--out DIR] [--quiet] [--master URL | --no-spark]`: check, run the studies
 * (ensembles through Spark unless --no-spark), write results.
 */
final class RunCommand {
    private final PrintStream out;
    private final PrintStream err;

    RunCommand(PrintStream out, PrintStream err) {
        this.out = out;
        this.err = err;
    }

    int execute(List<String> args) throws UsageException {
        Arguments parsed = Arguments.parse(args, Set.of("study", "out", "axes", "master"), Set.of("quiet",
                "no-spark"));
        if (parsed.operands().size() != 1) {
            throw new UsageException("run needs exactly one .phase file, got " + parsed.operands().size());
        }
        Path file = Path.of(parsed.operands().get(0));
        CheckedModel checked = new PhaseFiles().check(file);
        ProblemPrinter.print(checked, err);
        if (checked.hasErrors() || checked.ast() == null) {
            err.println("phasewright: " + file + " has errors; nothing was run.");
            return ExitCodes.MODEL_ERRORS;
        }
        Path resultsRoot = parsed.option("out") != null ? Path.of(parsed.option("out"))
                : StudyPipeline.resultsFolderFor(file);
        ReportStep reports = ReportStep.prepare(file, checked.ast(), parsed.option("axes"));
        ProgressListener progress = TerminalProgress.forTerminal(err, parsed.flag("quiet"));
        List<StudyRun> runs;
        try (EnsembleChoice ensembles = EnsembleChoice.of(parsed.option("master"), parsed.flag("no-spark"),
                new PhaseSourceRecipe(file.getFileName().toString(), reports.text()), err)) {
            runs = reports.run(checked.ast(), resultsRoot, parsed.option("study"), RunSettings.DEFAULT.withProgress(
                    progress).withEnsembles(ensembles.executor()));
        } catch (StudyPipelineException e) {
            TerminalProgress.clear(progress);
            err.println(file + ": error: " + e.getMessage());
            return ExitCodes.MODEL_ERRORS;
        }
        TerminalProgress.clear(progress);
        Status worst = Status.COMPLETED;
        boolean reportFailed = false;
        for (StudyRun run : runs) {
            Path report = reports.write(run, err);
            reportFailed |= report == null;
            if (!parsed.flag("quiet")) {
                out.print(TextSummary.render(run.result()));
                out.println("Results: " + run.folder());
                if (report != null) {
                    out.println("Report: " + report);
                }
                out.println();
            }
            if (run.result().status().compareTo(worst) > 0) {
                worst = run.result().status();
            }
        }
        if (!parsed.flag("quiet")) {
            out.println(TextSummary.CAUTION);
        }
        if (reportFailed) {
            return ExitCodes.MODEL_ERRORS;
        }
        return worst == Status.COMPLETED ? ExitCodes.OK : ExitCodes.ANALYSIS_FAILED;
    }
}
