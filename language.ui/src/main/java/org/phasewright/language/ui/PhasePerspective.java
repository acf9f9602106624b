package org.phasewright.language.ui;

import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;
import org.phasewright.language.ui.results.ResultsView;

/** The Phasewright layout: models on the left, editor and outline in the middle, problems and results below. */
public final class PhasePerspective implements IPerspectiveFactory {
    public static final String ID = "org.phasewright.language.ui.perspective";

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String editor = layout.getEditorArea();
        layout.addView(IPageLayout.ID_PROJECT_EXPLORER, IPageLayout.LEFT, 0.18f, editor);
        layout.addView(IPageLayout.ID_OUTLINE, IPageLayout.RIGHT, 0.78f, editor);
        var bottom = layout.createFolder("results", IPageLayout.BOTTOM, 0.55f, editor);
        bottom.addView(ResultsView.ID);
        bottom.addView(IPageLayout.ID_PROBLEM_VIEW);
        bottom.addPlaceholder(IPageLayout.ID_PROGRESS_VIEW);
        layout.addNewWizardShortcut(org.phasewright.language.ui.wizard.NewModelWizard.ID);
        layout.addShowViewShortcut(ResultsView.ID);
    }
}
