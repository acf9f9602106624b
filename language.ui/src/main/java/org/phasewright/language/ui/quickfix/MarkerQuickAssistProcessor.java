package org.phasewright.language.ui.quickfix;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

import org.eclipse.core.resources.IMarker;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.Position;
import org.eclipse.jface.text.contentassist.ICompletionProposal;
import org.eclipse.jface.text.contentassist.IContextInformation;
import org.eclipse.jface.text.quickassist.IQuickAssistInvocationContext;
import org.eclipse.jface.text.quickassist.IQuickAssistProcessor;
import org.eclipse.jface.text.source.Annotation;
import org.eclipse.jface.text.source.IAnnotationModel;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.Point;
import org.eclipse.ui.IMarkerResolution;
import org.eclipse.ui.ide.IDE;
import org.eclipse.ui.texteditor.MarkerAnnotation;

/** Ctrl+1 in the editor: offers the marker resolutions of the problems under the caret. */
public final class MarkerQuickAssistProcessor implements IQuickAssistProcessor {

    @Override
    public ICompletionProposal[] computeQuickAssistProposals(IQuickAssistInvocationContext context) {
        IAnnotationModel model = context.getSourceViewer().getAnnotationModel();
        List<ICompletionProposal> proposals = new ArrayList<>();
        if (model == null) {
            return new ICompletionProposal[0];
        }
        int offset = context.getOffset();
        for (Iterator<Annotation> it = model.getAnnotationIterator(); it.hasNext();) {
            Annotation annotation = it.next();
            Position position = model.getPosition(annotation);
            if (annotation instanceof MarkerAnnotation markerAnnotation && position != null
                    && position.getOffset() <= offset && offset <= position.getOffset() + position.getLength()) {
                IMarker marker = markerAnnotation.getMarker();
                for (IMarkerResolution resolution : IDE.getMarkerHelpRegistry().getResolutions(marker)) {
                    proposals.add(new ResolutionProposal(resolution, marker));
                }
            }
        }
        return proposals.toArray(new ICompletionProposal[0]);
    }

    @Override
    public String getErrorMessage() {
        return null;
    }

    @Override
    public boolean canFix(Annotation annotation) {
        return annotation instanceof MarkerAnnotation;
    }

    @Override
    public boolean canAssist(IQuickAssistInvocationContext invocationContext) {
        return false;
    }

    private record ResolutionProposal(IMarkerResolution resolution, IMarker marker) implements ICompletionProposal {
        @Override
        public void apply(IDocument document) {
            resolution.run(marker);
        }

        @Override
        public Point getSelection(IDocument document) {
            return null;
        }

        @Override
        public String getAdditionalProposalInfo() {
            return resolution instanceof org.eclipse.ui.IMarkerResolution2 r2 ? r2.getDescription() : null;
        }

        @Override
        public String getDisplayString() {
            return resolution.getLabel();
        }

        @Override
        public Image getImage() {
            return null;
        }

        @Override
        public IContextInformation getContextInformation() {
            return null;
        }
    }
}
