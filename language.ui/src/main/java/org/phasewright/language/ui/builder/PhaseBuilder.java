package org.phasewright.language.ui.builder;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IResourceDelta;
import org.eclipse.core.resources.IncrementalProjectBuilder;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.Status;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.ui.PhaseLanguage;

/**
 * Runs on every save (auto-build): parses and validates each changed `.phase` file, puts its problems on it as
 * markers, and when it has no errors schedules its studies in the background.
 */
public final class PhaseBuilder extends IncrementalProjectBuilder {
    public static final String ID = "org.phasewright.language.ui.builder";
    static final String EXTENSION = "phase";

    @Override
    protected IProject[] build(int kind, Map<String, String> args, IProgressMonitor monitor) throws CoreException {
        List<IFile> files = new ArrayList<>();
        IResourceDelta delta = kind == FULL_BUILD ? null : getDelta(getProject());
        if (delta == null) {
            getProject().accept(resource -> collect(resource, files));
        } else {
            delta.accept(child -> {
                if (child.getKind() == IResourceDelta.REMOVED) {
                    return false;
                }
                return collect(child.getResource(), files);
            });
        }
        for (IFile file : files) {
            if (monitor.isCanceled()) {
                break;
            }
            checkAndRun(file);
        }
        return null;
    }

    private static boolean collect(IResource resource, List<IFile> files) {
        if (resource.getType() == IResource.FOLDER && resource.getName().endsWith(".results")) {
            return false; // our own output
        }
        if (resource instanceof IFile file && EXTENSION.equals(file.getFileExtension())) {
            files.add(file);
        }
        return true;
    }

    /**
     * Checks one file, replaces its markers and schedules its studies, unless this version of the file was already
     * checked (the editor checks right after a save, before the auto-build gets to it).
     */
    static void checkAndRun(IFile file) throws CoreException {
        long stamp = file.getModificationStamp();
        if (!CheckedVersions.claim(file, stamp)) {
            return;
        }
        String text = read(file);
        String shown = file.getLocation() == null ? file.getFullPath().toString() : file.getLocation().toOSString();
        CheckedModel checked = PhaseLanguage.get().check(file.getFullPath().toString(), shown, text);
        ProblemMarkers.replace(file, checked.problems());
        BuildEvents.fireChecked(file, checked);
        StudyJobs.scheduleIfClean(file, checked);
    }

    private static String read(IFile file) throws CoreException {
        try (InputStream in = file.getContents(true)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new CoreException(Status.error("Cannot read " + file.getFullPath(), e));
        }
    }

    @Override
    protected void clean(IProgressMonitor monitor) throws CoreException {
        getProject().deleteMarkers(ProblemMarkers.TYPE, false, IResource.DEPTH_INFINITE);
        CheckedVersions.forgetAll();
    }
}
