package org.phasewright.language.ide.hover;

import java.util.Optional;

import org.eclipse.lsp4j.Hover;
import org.eclipse.lsp4j.HoverParams;
import org.eclipse.lsp4j.MarkupContent;
import org.eclipse.lsp4j.MarkupKind;
import org.eclipse.lsp4j.Range;
import org.eclipse.xtext.ide.server.Document;
import org.eclipse.xtext.ide.server.hover.IHoverService;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.util.CancelIndicator;

import com.google.inject.Inject;

/** Language-server hover: {@link HoverText} as Markdown over the hovered token. */
public class PhaseHoverService implements IHoverService {

    @Inject
    private HoverText hoverText;

    @Override
    public Hover hover(Document document, XtextResource resource, HoverParams params, CancelIndicator cancelIndicator) {
        int offset = document.getOffSet(params.getPosition());
        Optional<HoverResult> result = hoverText.at(resource, offset);
        if (result.isEmpty()) {
            return IHoverService.EMPTY_HOVER;
        }
        HoverResult hover = result.get();
        Range range = new Range(document.getPosition(hover.offset()),
                document.getPosition(hover.offset() + hover.length()));
        return new Hover(new MarkupContent(MarkupKind.MARKDOWN, hover.facts().markdown()), range);
    }
}
