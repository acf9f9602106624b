package org.phasewright.language.ui.workspace;

import java.io.File;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IProjectDescription;
import org.eclipse.core.resources.IWorkspace;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.Path;

/**
 * Opens the projects that sit in the workspace folder on disk but are not yet in the workspace (the launcher copies
 * the bundled examples there), so a fresh workspace starts with them imported.
 */
public final class WorkspaceProjects {
    private WorkspaceProjects() {
    }

    /** Imports and opens every such project; returns their names. */
    public static List<String> importFromDisk() throws CoreException {
        IWorkspace workspace = ResourcesPlugin.getWorkspace();
        File root = workspace.getRoot().getLocation().toFile();
        List<String> imported = new ArrayList<>();
        File[] children = root.listFiles(File::isDirectory);
        if (children == null) {
            return imported;
        }
        for (File folder : children) {
            File dotProject = new File(folder, ".project");
            if (!dotProject.isFile()) {
                continue;
            }
            IProjectDescription description = workspace
                    .loadProjectDescription(Path.fromOSString(dotProject.getAbsolutePath()));
            IProject project = workspace.getRoot().getProject(description.getName());
            if (project.exists()) {
                continue;
            }
            project.create(description, null);
            project.open(null);
            imported.add(project.getName());
        }
        return imported;
    }
}
