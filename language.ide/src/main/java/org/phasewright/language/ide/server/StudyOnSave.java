package org.phasewright.language.ide.server;

import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.xtext.generator.IShouldGenerate;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.util.CancelIndicator;

import com.google.inject.Inject;
import com.google.inject.Singleton;

/**
 * Decides when the language server may run a model's studies (the language's generator): only in the build that
 * follows a save, only for the text that was saved, and only when the model has no errors. Builds run on every
 * keystroke and for the whole workspace at start-up; running simulations there would waste the machine and write
 * results for text nobody saved.
 */
@Singleton
public class StudyOnSave implements IShouldGenerate {
    private final Map<URI, String> savedText = new ConcurrentHashMap<>();
    private final Map<URI, StudyOutcome> outcomes = new ConcurrentHashMap<>();

    @Inject
    private IShouldGenerate.OnlyWithoutErrors withoutErrors;

    /** Asks for one run of {@code uri}'s studies when it is next built with exactly {@code text}. */
    public void requestRun(URI uri, String text) {
        outcomes.remove(uri);
        savedText.put(uri, text);
    }

    @Override
    public boolean shouldGenerate(Resource resource, CancelIndicator cancelIndicator) {
        String saved = savedText.remove(resource.getURI());
        if (saved == null || !(resource instanceof XtextResource xtext) || xtext.getParseResult() == null
                || !saved.equals(xtext.getParseResult().getRootNode().getText())) {
            return false;
        }
        if (!withoutErrors.shouldGenerate(resource, cancelIndicator)) {
            record(resource.getURI(), new StudyOutcome(StudyOutcome.Status.NOT_RUN, "the model has errors", 0));
            return false;
        }
        return true;
    }

    void record(URI uri, StudyOutcome run) {
        outcomes.put(uri, run);
    }

    /**
     * Ends the request for {@code uri} (whether or not a build picked it up) and returns how the run went, or empty
     * when it never started.
     */
    public Optional<StudyOutcome> finish(URI uri) {
        savedText.remove(uri);
        return Optional.ofNullable(outcomes.remove(uri));
    }
}
