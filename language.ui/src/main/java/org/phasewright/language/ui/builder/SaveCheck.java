package org.phasewright.language.ui.builder;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.resources.WorkspaceJob;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;

/**
 * Checks a file right after the editor saved it. The workspace's auto-build waits 0.1–1 s after a change before it
 * builds; this brings markers and the study run forward, and the builder then skips the version already checked.
 */
public final class SaveCheck {
    private SaveCheck() {
    }

    public static void schedule(IFile file) {
        IProject project = file.getProject();
        try {
            if (!project.isOpen() || !project.hasNature(PhaseNature.ID)) {
                return; // outside a Phasewright project nothing runs on save, as with the builder
            }
        } catch (CoreException e) {
            return;
        }
        WorkspaceJob job = new WorkspaceJob("Checking " + file.getName()) {
            @Override
            public IStatus runInWorkspace(IProgressMonitor monitor) throws CoreException {
                if (file.exists()) {
                    PhaseBuilder.checkAndRun(file);
                }
                return Status.OK_STATUS;
            }
        };
        job.setRule(ResourcesPlugin.getWorkspace().getRuleFactory().markerRule(file));
        job.setSystem(true);
        job.schedule();
    }
}
