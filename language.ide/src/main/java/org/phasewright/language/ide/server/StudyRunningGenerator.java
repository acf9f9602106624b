package org.phasewright.language.ide.server;

import java.util.List;

import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.xtext.generator.GeneratorDelegate;
import org.eclipse.xtext.generator.IFileSystemAccess2;
import org.eclipse.xtext.generator.IGeneratorContext;
import org.eclipse.xtext.service.OperationCanceledManager;
import org.phasewright.language.generator.PhaseGenerator;
import org.phasewright.language.standalone.StudyPipelineException;
import org.phasewright.language.standalone.StudyRun;
import org.phasewright.runtime.study.Status;

import com.google.inject.Inject;

/**
 * Runs the model's studies through the language's generator and records how they went in {@link StudyOnSave}, so
 * the language server can tell the editor. A failing study must not break the build that also publishes the
 * file's diagnostics, so failures are recorded, not thrown.
 */
public class StudyRunningGenerator extends GeneratorDelegate {
    @Inject
    private StudyOnSave studies;
    @Inject
    private OperationCanceledManager cancellation;
    @Inject
    private PhaseGenerator generator;

    @Override
    public void generate(Resource input, IFileSystemAccess2 fsa, IGeneratorContext context) {
        long start = System.nanoTime();
        StudyOutcome outcome;
        try {
            outcome = outcomeOf(generator.runStudies(input, context.getCancelIndicator()), start);
        } catch (StudyPipelineException e) {
            outcome = new StudyOutcome(StudyOutcome.Status.FAILED, e.getMessage(), millisSince(start));
        } catch (RuntimeException | StackOverflowError e) {
            cancellation.propagateIfCancelException(e);
            String reason = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
            outcome = new StudyOutcome(StudyOutcome.Status.FAILED, reason, millisSince(start));
        }
        studies.record(input.getURI(), outcome);
    }

    /** Finished only when every analysis of every study completed; otherwise the first study's reason. */
    private static StudyOutcome outcomeOf(List<StudyRun> runs, long start) {
        for (StudyRun run : runs) {
            if (run.result().status() != Status.COMPLETED) {
                String reason = run.result().results().stream().filter(r -> r.status() != Status.COMPLETED)
                        .map(r -> r.message()).findFirst().orElse(run.result().status().name());
                return new StudyOutcome(StudyOutcome.Status.FAILED,
                        "study " + run.result().studyName() + ": " + reason, millisSince(start));
            }
        }
        return new StudyOutcome(StudyOutcome.Status.FINISHED, "studies finished", millisSince(start));
    }

    private static long millisSince(long start) {
        return (System.nanoTime() - start) / 1_000_000;
    }
}
