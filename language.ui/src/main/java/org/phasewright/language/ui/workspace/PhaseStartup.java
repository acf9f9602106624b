package org.phasewright.language.ui.workspace;

import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.Status;
import org.eclipse.ui.IStartup;
import org.phasewright.language.ui.selfcheck.SelfCheck;

/**
 * After the workbench is up: import projects found in the workspace folder, and, when the launcher asks for it with
 * {@code -Dphasewright.selfcheck=REPORT}, run the end-to-end self-check.
 */
public final class PhaseStartup implements IStartup {
    @Override
    public void earlyStartup() {
        try {
            WorkspaceProjects.importFromDisk();
        } catch (Exception e) {
            ILog.of(PhaseStartup.class).log(Status.error("Could not import the projects in the workspace folder", e));
        }
        String report = System.getProperty(SelfCheck.PROPERTY);
        if (report != null && !report.isBlank()) {
            new SelfCheck(java.nio.file.Path.of(report)).start();
        }
    }
}
