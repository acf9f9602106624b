package org.phasewright.language.ui.hover;

import java.util.Iterator;
import java.util.Optional;

import org.eclipse.jface.text.IRegion;
import org.eclipse.jface.text.ITextHover;
import org.eclipse.jface.text.ITextViewer;
import org.eclipse.jface.text.Position;
import org.eclipse.jface.text.Region;
import org.eclipse.jface.text.source.Annotation;
import org.eclipse.jface.text.source.IAnnotationModel;
import org.eclipse.jface.text.source.ISourceViewer;
import org.eclipse.ui.texteditor.MarkerAnnotation;
import org.phasewright.language.ide.hover.HoverText;
import org.phasewright.language.ui.PhaseLanguage;

/**
 * Editor hover: problem messages at the spot first, then what the hovered name is (kind, description, value, range,
 * unit and dimension) from the editor-neutral {@link HoverText}.
 */
public final class PhaseTextHover implements ITextHover {
    private final String path;

    public PhaseTextHover(String path) {
        this.path = path;
    }

    /** The hover text for the name at {@code offset} of {@code text}; plain Java, used by the tests too. */
    public static Optional<String> symbolText(String path, String text, int offset) {
        PhaseLanguage language = PhaseLanguage.get();
        return language.injector().getInstance(HoverText.class).at(language.parse(path, text), offset)
                .map(hover -> hover.facts().plainText());
    }

    @Override
    public String getHoverInfo(ITextViewer viewer, IRegion region) {
        StringBuilder text = new StringBuilder();
        if (viewer instanceof ISourceViewer source && source.getAnnotationModel() != null) {
            IAnnotationModel model = source.getAnnotationModel();
            for (Iterator<Annotation> it = model.getAnnotationIterator(); it.hasNext();) {
                Annotation annotation = it.next();
                Position position = model.getPosition(annotation);
                if (annotation instanceof MarkerAnnotation && position != null
                        && position.overlapsWith(region.getOffset(), Math.max(1, region.getLength()))) {
                    text.append(annotation.getText()).append("\n\n");
                }
            }
        }
        symbolText(path, viewer.getDocument().get(), region.getOffset()).ifPresent(text::append);
        return text.isEmpty() ? null : text.toString().strip();
    }

    @Override
    public IRegion getHoverRegion(ITextViewer viewer, int offset) {
        return new Region(offset, 0);
    }
}
