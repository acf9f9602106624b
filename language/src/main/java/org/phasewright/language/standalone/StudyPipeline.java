package org.phasewright.language.standalone;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.phasewright.language.lowering.LoweringException;
import org.phasewright.language.lowering.ModelLowering;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.EquilibriumSearch;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.report.ReportWriter;
import org.phasewright.runtime.study.RunSettings;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.StudyRunner;

/**
 * From a checked model to written results: lower, compile, run the studies, write each into
 * {@code resultsRoot/<study>/}. Shared by the command line, the on-save generator and the editors.
 */
public final class StudyPipeline {
    /** The study run when a model declares none: its equilibria, which need no further settings. */
    public static final String DEFAULT_STUDY = "equilibria";

    private StudyPipeline() {
    }

    /** Where results of {@code modelFile} go by default: {@code <folder>/<file name>.results}. */
    public static Path resultsFolderFor(Path modelFile) {
        String name = modelFile.getFileName().toString();
        String base = name.endsWith(".phase") ? name.substring(0, name.length() - ".phase".length()) : name;
        Path parent = modelFile.toAbsolutePath().getParent();
        return parent.resolve(base + ".results");
    }

    /**
     * Runs the named study, or every study when {@code studyName} is null. The model must have no validation
     * errors.
     */
    public static List<StudyRun> run(PhaseModel checkedModel, Path resultsRoot, String studyName,
            RunSettings settings) throws StudyPipelineException {
        DynamicalModel model;
        try {
            model = new ModelLowering().lower(checkedModel);
        } catch (LoweringException e) {
            throw new StudyPipelineException("the model has errors: " + e.getMessage());
        }
        List<Study> studies = select(model, studyName);
        CompiledModel compiled;
        try {
            compiled = ModelCompiler.compile(model);
        } catch (RuntimeException e) { // values that cannot be evaluated, e.g. a param defined as 1/0
            throw new StudyPipelineException("model '" + model.name() + "' cannot be prepared: " + e.getMessage());
        }
        List<StudyRun> runs = new ArrayList<>();
        for (Study study : studies) {
            StudyResult result = StudyRunner.run(compiled, study, settings);
            Path folder = resultsRoot.resolve(study.name());
            try {
                runs.add(new StudyRun(result, folder, ReportWriter.writeAll(result, folder)));
            } catch (IOException e) {
                throw new StudyPipelineException("cannot write results to " + folder + ": " + e.getMessage());
            }
        }
        return runs;
    }

    private static List<Study> select(DynamicalModel model, String studyName) throws StudyPipelineException {
        if (model.studies().isEmpty()) {
            return List.of(new Study(DEFAULT_STUDY, List.of(new EquilibriumSearch())));
        }
        if (studyName == null) {
            return model.studies();
        }
        for (Study study : model.studies()) {
            if (study.name().equals(studyName)) {
                return List.of(study);
            }
        }
        throw new StudyPipelineException("model '" + model.name() + "' has no study '" + studyName + "'; its studies: "
                + String.join(", ", model.studies().stream().map(Study::name).toList()));
    }
}
