package org.phasewright.language.generator;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.xtext.generator.AbstractGenerator;
import org.eclipse.xtext.generator.IFileSystemAccess2;
import org.eclipse.xtext.generator.IGeneratorContext;
import org.eclipse.xtext.util.CancelIndicator;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.standalone.StudyPipeline;
import org.phasewright.language.standalone.StudyPipelineException;
import org.phasewright.language.standalone.StudyRun;
import org.phasewright.runtime.study.RunSettings;

import com.google.inject.Singleton;

/**
 * On save (Xtext builders call this only for models without errors): runs the model's studies and writes the
 * results next to the model file, in {@code <file>.results/<study>/}. Results describe the model only.
 */
@Singleton
public class PhaseGenerator extends AbstractGenerator {
    /** A save must never hang the editor: long studies are cut off and reported as incomplete. */
    static final Duration ON_SAVE_TIME_LIMIT = Duration.ofSeconds(60);

    private static final org.apache.log4j.Logger LOG = org.apache.log4j.Logger.getLogger(PhaseGenerator.class);

    @Override
    public void doGenerate(Resource resource, IFileSystemAccess2 fsa, IGeneratorContext context) {
        try {
            runStudies(resource, context.getCancelIndicator());
        } catch (StudyPipelineException e) {
            LOG.warn(resource.getURI() + ": " + e.getMessage());
        }
    }

    /**
     * Runs the studies of a model saved as a file and writes their results; returns what ran (empty when the
     * resource is not a file or holds no model). Callers that report to a user (the language server) use this
     * directly to learn how the studies went.
     */
    public List<StudyRun> runStudies(Resource resource, CancelIndicator cancelIndicator)
            throws StudyPipelineException {
        URI uri = resource.getURI();
        if (!uri.isFile() || resource.getContents().isEmpty()
                || !(resource.getContents().get(0) instanceof PhaseModel model) || !resource.getErrors().isEmpty()) {
            return List.of();
        }
        // Callers outside a builder may pass no cancel indicator.
        CancelIndicator cancel = cancelIndicator == null ? CancelIndicator.NullImpl : cancelIndicator;
        Path file = Path.of(uri.toFileString());
        RunSettings settings = RunSettings.DEFAULT.withWallTimeLimit(ON_SAVE_TIME_LIMIT)
                .withCancellation(cancel::isCanceled);
        return StudyPipeline.run(model, StudyPipeline.resultsFolderFor(file), null, settings);
    }
}
