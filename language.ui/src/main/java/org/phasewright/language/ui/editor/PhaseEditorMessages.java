package org.phasewright.language.ui.editor;

import java.util.ListResourceBundle;

/** Labels the platform's ContentAssistAction reads from a resource bundle. */
public final class PhaseEditorMessages extends ListResourceBundle {
    @Override
    protected Object[][] getContents() {
        return new Object[][] { { "ContentAssistProposal.label", "Content Assist" },
                { "ContentAssistProposal.tooltip", "Content Assist" },
                { "ContentAssistProposal.description", "Content Assist" } };
    }
}
