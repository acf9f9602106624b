package org.phasewright.language.ui.wizard;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.dialogs.WizardNewFileCreationPage;
import org.eclipse.ui.ide.IDE;
import org.eclipse.ui.wizards.newresource.BasicNewResourceWizard;
import org.phasewright.language.ui.builder.PhaseNature;

/** File > New > Phasewright Model: a new `.phase` file from a small, runnable template, opened in the editor. */
public final class NewModelWizard extends BasicNewResourceWizard {
    public static final String ID = "org.phasewright.language.ui.newModelWizard";
    private WizardNewFileCreationPage page;

    @Override
    public void init(IWorkbench workbench, IStructuredSelection selection) {
        super.init(workbench, selection);
        setWindowTitle("New Phasewright Model");
    }

    @Override
    public void addPages() {
        page = new WizardNewFileCreationPage("model", getSelection()) {
            @Override
            protected java.io.InputStream getInitialContents() {
                String name = getFileName().replaceFirst("\\.phase$", "").replaceAll("[^A-Za-z0-9_]", "_");
                return new ByteArrayInputStream(ModelTemplate.text(name).getBytes(StandardCharsets.UTF_8));
            }
        };
        page.setTitle("Phasewright model");
        page.setDescription("Create a .phase model from a template: one oscillator, one study.");
        page.setFileExtension("phase");
        page.setFileName("model.phase");
        addPage(page);
    }

    @Override
    public boolean performFinish() {
        IFile file = page.createNewFile();
        if (file == null) {
            return false;
        }
        try {
            PhaseNature.addTo(file.getProject());
            IDE.openEditor(getWorkbench().getActiveWorkbenchWindow().getActivePage(), file);
        } catch (CoreException e) {
            page.setErrorMessage(e.getMessage());
            return false;
        }
        selectAndReveal(file);
        return true;
    }
}
