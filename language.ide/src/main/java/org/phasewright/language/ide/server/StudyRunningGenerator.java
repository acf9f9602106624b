package org.phasewright.language.ide.server;

import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.xtext.generator.GeneratorDelegate;
import org.eclipse.xtext.generator.IFileSystemAccess2;
import org.eclipse.xtext.generator.IGeneratorContext;
import org.eclipse.xtext.service.OperationCanceledManager;

import com.google.inject.Inject;

/**
 * Runs the language's generator (which runs the model's studies and writes their results) and records how it went
 * in {@link StudyOnSave}, so the language server can tell the editor. A failing study must not break the build that
 * also publishes the file's diagnostics, so failures are recorded, not thrown.
 */
public class StudyRunningGenerator extends GeneratorDelegate {
    @Inject
    private StudyOnSave studies;
    @Inject
    private OperationCanceledManager cancellation;

    @Override
    public void generate(Resource input, IFileSystemAccess2 fsa, IGeneratorContext context) {
        long start = System.nanoTime();
        try {
            super.generate(input, fsa, context);
            studies.record(input.getURI(), new StudyOutcome(StudyOutcome.Status.FINISHED, "studies finished", millisSince(start)));
        } catch (RuntimeException | StackOverflowError e) {
            cancellation.propagateIfCancelException(e);
            String reason = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
            studies.record(input.getURI(), new StudyOutcome(StudyOutcome.Status.FAILED, reason, millisSince(start)));
        }
    }

    private static long millisSince(long start) {
        return (System.nanoTime() - start) / 1_000_000;
    }
}
