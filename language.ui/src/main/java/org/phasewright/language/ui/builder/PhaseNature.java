package org.phasewright.language.ui.builder;

import org.eclipse.core.resources.ICommand;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IProjectDescription;
import org.eclipse.core.resources.IProjectNature;
import org.eclipse.core.runtime.CoreException;

/** Marks a project whose `.phase` files are checked and run on save; configuring it installs {@link PhaseBuilder}. */
public final class PhaseNature implements IProjectNature {
    public static final String ID = "org.phasewright.language.ui.nature";
    private IProject project;

    @Override
    public void configure() throws CoreException {
        IProjectDescription description = project.getDescription();
        for (ICommand command : description.getBuildSpec()) {
            if (PhaseBuilder.ID.equals(command.getBuilderName())) {
                return;
            }
        }
        ICommand[] old = description.getBuildSpec();
        ICommand[] spec = java.util.Arrays.copyOf(old, old.length + 1);
        ICommand command = description.newCommand();
        command.setBuilderName(PhaseBuilder.ID);
        spec[old.length] = command;
        description.setBuildSpec(spec);
        project.setDescription(description, null);
    }

    @Override
    public void deconfigure() throws CoreException {
        IProjectDescription description = project.getDescription();
        description.setBuildSpec(java.util.Arrays.stream(description.getBuildSpec())
                .filter(c -> !PhaseBuilder.ID.equals(c.getBuilderName())).toArray(ICommand[]::new));
        project.setDescription(description, null);
    }

    @Override
    public IProject getProject() {
        return project;
    }

    @Override
    public void setProject(IProject project) {
        this.project = project;
    }

    /** Adds the nature (and so the builder) to {@code project} unless it is there already. */
    public static void addTo(IProject project) throws CoreException {
        if (project.hasNature(ID)) {
            return;
        }
        IProjectDescription description = project.getDescription();
        String[] natures = java.util.Arrays.copyOf(description.getNatureIds(), description.getNatureIds().length + 1);
        natures[natures.length - 1] = ID;
        description.setNatureIds(natures);
        project.setDescription(description, null);
    }
}
