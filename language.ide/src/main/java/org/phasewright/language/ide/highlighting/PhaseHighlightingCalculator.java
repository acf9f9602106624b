package org.phasewright.language.ide.highlighting;

import org.eclipse.xtext.ide.editor.syntaxcoloring.IHighlightedPositionAcceptor;
import org.eclipse.xtext.ide.editor.syntaxcoloring.ISemanticHighlightingCalculator;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.util.CancelIndicator;

import com.google.inject.Inject;

/**
 * Feeds {@link SemanticClassifier} into Xtext's highlighting contract, for hosts that colour through it. Style ids
 * are the names of {@link SemanticKind}, plus {@link #DECLARATION} on declared names.
 */
public class PhaseHighlightingCalculator implements ISemanticHighlightingCalculator {
    public static final String DECLARATION = "DECLARATION";

    @Inject
    private SemanticClassifier classifier;

    @Override
    public void provideHighlightingFor(XtextResource resource, IHighlightedPositionAcceptor acceptor,
            CancelIndicator cancelIndicator) {
        for (SemanticRegion region : classifier.classify(resource)) {
            if (cancelIndicator.isCanceled()) {
                return;
            }
            if (region.declaration()) {
                acceptor.addPosition(region.offset(), region.length(), region.kind().name(), DECLARATION);
            } else {
                acceptor.addPosition(region.offset(), region.length(), region.kind().name());
            }
        }
    }
}
