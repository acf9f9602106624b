package org.phasewright.language.ide.formatting;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.xtext.formatting2.FormatterRequest;
import org.eclipse.xtext.formatting2.IFormatter2;
import org.eclipse.xtext.formatting2.regionaccess.ITextReplacement;
import org.eclipse.xtext.formatting2.regionaccess.TextRegionAccessBuilder;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.util.TextRegion;
import org.phasewright.language.ide.text.TextChange;

import com.google.inject.Inject;
import com.google.inject.Provider;

/**
 * The canonical layout (see {@code PhaseFormatter} in the language module) as a plain call: the text changes that
 * format a parsed file, or a part of it. The language server formats through Xtext's formatting service, which uses
 * the same formatter.
 */
public class PhaseFormatting {
    @Inject
    private Provider<IFormatter2> formatters;
    @Inject
    private Provider<FormatterRequest> requests;
    @Inject
    private Provider<TextRegionAccessBuilder> regionAccess;

    public List<TextChange> changes(XtextResource resource) {
        String text = resource.getParseResult().getRootNode().getText();
        return changes(resource, 0, text.length());
    }

    /** Changes for the declarations that overlap {@code length} characters at {@code offset}. */
    public List<TextChange> changes(XtextResource resource, int offset, int length) {
        FormatterRequest request = requests.get();
        request.setAllowIdentityEdits(false);
        request.setRegions(List.of(new TextRegion(offset, length)));
        request.setTextRegionAccess(regionAccess.get().forNodeModel(resource).create());
        List<TextChange> changes = new ArrayList<>();
        for (ITextReplacement replacement : formatters.get().format(request)) {
            changes.add(new TextChange(replacement.getOffset(), replacement.getLength(),
                    replacement.getReplacementText()));
        }
        return changes;
    }

    /** The whole file in canonical layout. */
    public String formatted(XtextResource resource) {
        String text = resource.getParseResult().getRootNode().getText();
        return TextChange.apply(text, changes(resource));
    }
}
