package org.phasewright.tests.reliability;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.atomic.AtomicInteger;

import org.apache.log4j.AppenderSkeleton;
import org.apache.log4j.Level;
import org.apache.log4j.Logger;
import org.apache.log4j.spi.LoggingEvent;
import org.eclipse.emf.common.util.URI;
import org.phasewright.language.lowering.LoweringException;
import org.phasewright.language.lowering.ModelLowering;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.PhaseFiles;
import org.phasewright.language.standalone.Problem;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.equilibria.EquilibriumSettings;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.report.ReportWriter;
import org.phasewright.runtime.study.AnalysisResult;
import org.phasewright.runtime.study.RunSettings;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.StudyRunner;
import org.phasewright.runtime.symbolic.ModelEvaluationException;

/**
 * The fuzzing oracle for one text, in-process: checking never throws; every problem has a position inside the text;
 * a model without errors lowers, compiles (or is refused with a {@link ModelEvaluationException}, which the pipeline
 * reports by name) and runs every study under a tiny budget to a named outcome that is not an internal error.
 * Tallies what happened so the campaign can report numbers.
 */
final class FuzzOracle {
    /** Small budgets: the point is that every analysis ends with a named outcome, not that it finishes. */
    static final RunSettings TINY = RunSettings.DEFAULT.withMaxSteps(3_000).withWallTimeLimit(Duration.ofMillis(400))
            .withEquilibria(new EquilibriumSettings(8, 4, 30, 400, 1e-10, 1e-9, 1e-6, 1e-7));

    private final PhaseFiles files;
    private final Path scratch;
    final AtomicInteger texts = new AtomicInteger();
    final AtomicInteger withErrors = new AtomicInteger();
    final AtomicInteger problems = new AtomicInteger();
    final AtomicInteger compiled = new AtomicInteger();
    final AtomicInteger refusedByCompiler = new AtomicInteger();
    final AtomicInteger studiesRun = new AtomicInteger();
    final AtomicInteger written = new AtomicInteger();
    final Map<String, Integer> outcomes = new TreeMap<>();

    /** @param scratch folder for occasional result writing, or null to never write */
    FuzzOracle(PhaseFiles files, Path scratch) {
        this.files = files;
        this.scratch = scratch;
    }

    /** Errors that libraries log instead of throwing (an exception swallowed by a validator, say) are findings too. */
    private final List<String> logged = new ArrayList<>();
    private final AppenderSkeleton listener = new AppenderSkeleton() {
        @Override
        protected void append(LoggingEvent event) {
            if (event.getLevel().isGreaterOrEqual(Level.ERROR)) {
                String thrown = event.getThrowableInformation() == null ? ""
                        : " " + trace(event.getThrowableInformation().getThrowable());
                synchronized (logged) {
                    logged.add("logged " + event.getLoggerName() + ": " + event.getRenderedMessage() + thrown);
                }
            }
        }

        @Override
        public void close() {
        }

        @Override
        public boolean requiresLayout() {
            return false;
        }
    };

    /** Starts hearing errors logged through log4j (Xtext's logging); call once. */
    FuzzOracle listen() {
        Logger.getRootLogger().addAppender(listener);
        return this;
    }

    void stopListening() {
        Logger.getRootLogger().removeAppender(listener);
    }

    /** @return what went wrong, empty when the text was handled properly */
    List<String> judge(String text, boolean run, boolean write) {
        List<String> wrong = judgeQuietly(text, run, write);
        synchronized (logged) {
            wrong.addAll(logged);
            logged.clear();
        }
        return wrong;
    }

    private List<String> judgeQuietly(String text, boolean run, boolean write) {
        texts.incrementAndGet();
        List<String> wrong = new ArrayList<>();
        CheckedModel checked;
        try {
            checked = files.check("fuzz.phase", URI.createURI("inmemory:/fuzz.phase"), text);
        } catch (Throwable e) { // the oracle: nothing may escape the checker
            wrong.add("check threw " + trace(e));
            return wrong;
        }
        problems.addAndGet(checked.problems().size());
        int lines = 1 + count(text, '\n') + count(text, '\r') - text.split("\r\n", -1).length + 1; // \r\n counts once
        for (Problem p : checked.problems()) {
            String bad = positionFault(text, lines, p);
            if (bad != null) {
                wrong.add(bad + ": " + p);
            }
            if (p.message() == null || p.message().isBlank()) {
                wrong.add("problem without a message at " + p.line() + ":" + p.column());
            }
        }
        if (checked.hasErrors() || checked.ast() == null) {
            withErrors.incrementAndGet();
            if (checked.ast() == null && checked.problems().stream().noneMatch(Problem::isError)) {
                wrong.add("no model and no error");
            }
            return wrong;
        }
        if (!run) {
            return wrong;
        }
        DynamicalModel model;
        try {
            model = new ModelLowering().lower(checked.ast());
        } catch (LoweringException e) {
            wrong.add("lowering refused a model without errors: " + e.getMessage());
            return wrong;
        } catch (Throwable e) {
            wrong.add("lowering threw " + trace(e));
            return wrong;
        }
        CompiledModel compiledModel;
        try {
            compiledModel = ModelCompiler.compile(model);
        } catch (ModelEvaluationException e) {
            refusedByCompiler.incrementAndGet(); // named refusal: "cannot be prepared: <reason>"
            return wrong;
        } catch (Throwable e) {
            wrong.add("compile threw " + trace(e));
            return wrong;
        }
        compiled.incrementAndGet();
        List<Study> studies = model.studies().isEmpty() ? List.of() : model.studies();
        for (Study study : studies) {
            StudyResult result;
            try {
                result = StudyRunner.run(compiledModel, study, TINY);
            } catch (Throwable e) {
                wrong.add("study " + study.name() + " threw " + trace(e));
                continue;
            }
            studiesRun.incrementAndGet();
            for (AnalysisResult r : result.results()) {
                synchronized (outcomes) {
                    outcomes.merge(r.outcome() == null ? "<null>" : r.outcome(), 1, Integer::sum);
                }
                if (r.outcome() == null || r.outcome().isBlank() || r.message() == null || r.status() == null) {
                    wrong.add("analysis without a named outcome: " + r);
                } else if (r.outcome().equals("INTERNAL_ERROR")) {
                    wrong.add("internal error in study " + study.name() + ": " + r.message());
                }
            }
            if (write && scratch != null) {
                try {
                    ReportWriter.writeAll(result, scratch.resolve("results").resolve(study.name()));
                    written.incrementAndGet();
                } catch (IOException e) {
                    wrong.add("writing results failed: " + e);
                } catch (Throwable e) {
                    wrong.add("writing results threw " + trace(e));
                }
            }
        }
        return wrong;
    }

    /** Null when the problem's position lies inside the text (or just after its end). */
    static String positionFault(String text, int lines, Problem p) {
        if (p.line() < 1 || p.column() < 1) {
            return "position below 1";
        }
        if (p.line() > lines) {
            return "line " + p.line() + " beyond the " + lines + " lines of the text";
        }
        if (p.column() > text.length() + 1) {
            return "column beyond the text";
        }
        if (p.offset() > text.length() || p.offset() + p.length() > text.length() || p.length() < 0) {
            return "range " + p.offset() + "+" + p.length() + " beyond the text (" + text.length() + ")";
        }
        return null;
    }

    static int count(String s, char c) {
        int n = 0;
        for (int i = 0; i < s.length(); i++) {
            if (s.charAt(i) == c) {
                n++;
            }
        }
        return n;
    }

    static String trace(Throwable e) {
        StringWriter w = new StringWriter();
        e.printStackTrace(new PrintWriter(w));
        String s = w.toString();
        String[] lines = s.split("\n");
        StringBuilder brief = new StringBuilder();
        for (int i = 0; i < Math.min(lines.length, 12); i++) {
            brief.append(lines[i].strip()).append(" | ");
        }
        return brief.toString();
    }

    /** Keeps a failing text under {@code folder} for the crasher corpus. */
    static Path save(Path folder, String name, String text) {
        try {
            Files.createDirectories(folder);
            Path f = folder.resolve(name + ".phase");
            Files.write(f, text.getBytes(StandardCharsets.UTF_8));
            return f;
        } catch (IOException e) {
            return null;
        }
    }

    String tally() {
        return texts + " texts: " + withErrors + " with errors (" + problems + " problems), " + compiled
                + " compiled, " + refusedByCompiler + " refused by name before compiling, " + studiesRun
                + " studies run, " + written + " written; outcomes " + outcomes;
    }
}
