package org.phasewright.language.ui.builder;

import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.StudyPipeline;
import org.phasewright.language.ui.results.ModelResults;

/**
 * One background job per model file runs its studies after a clean check: progress in the Progress view, cancel
 * honoured between and inside analyses. A newer save cancels the older run of the same file.
 */
public final class StudyJobs {
    /** Job family of the study runs, so tests and the self-check can wait for them. */
    public static final Object FAMILY = StudyJobs.class;
    private static final Map<IFile, Job> ACTIVE = new ConcurrentHashMap<>();

    private StudyJobs() {
    }

    static void scheduleIfClean(IFile file, CheckedModel checked) {
        Job previous = ACTIVE.remove(file);
        if (previous != null) {
            previous.cancel();
        }
        if (checked.hasErrors() || checked.ast() == null || file.getLocation() == null) {
            return;
        }
        Job job = new StudyJob(file, checked);
        ACTIVE.put(file, job);
        job.schedule();
    }

    private static final class StudyJob extends Job {
        private final IFile file;
        private final CheckedModel checked;

        StudyJob(IFile file, CheckedModel checked) {
            super("Running studies of " + file.getName());
            this.file = file;
            this.checked = checked;
            setUser(false);
        }

        @Override
        public boolean belongsTo(Object family) {
            return family == FAMILY;
        }

        @Override
        protected IStatus run(IProgressMonitor monitor) {
            monitor.beginTask(getName(), IProgressMonitor.UNKNOWN);
            Path model = file.getLocation().toPath();
            try {
                ModelResults results = StudyExecution.run(checked, model, monitor::isCanceled);
                if (monitor.isCanceled()) {
                    return Status.CANCEL_STATUS;
                }
                refreshResultsFolder();
                BuildEvents.fireStudiesFinished(file, results);
                return Status.OK_STATUS;
            } catch (StudyExecution.StudyFailure failure) {
                markFailure(failure.getMessage());
                BuildEvents.fireStudiesFinished(file, ModelResults.failed(file.getName(), failure.getMessage()));
                return Status.OK_STATUS;
            } finally {
                ACTIVE.remove(file, this);
                monitor.done();
            }
        }

        private void refreshResultsFolder() {
            String name = StudyPipeline.resultsFolderFor(file.getLocation().toPath()).getFileName().toString();
            IResource folder = file.getParent().findMember(name);
            try {
                if (folder != null) {
                    folder.refreshLocal(IResource.DEPTH_INFINITE, null);
                } else {
                    file.getParent().refreshLocal(IResource.DEPTH_ONE, null);
                }
            } catch (CoreException e) {
                // The files are on disk either way; the explorer catches up on the next refresh.
            }
        }

        private void markFailure(String message) {
            try {
                ProblemMarkers.addFileError(file, message);
            } catch (CoreException e) {
                // The file went away while the study ran.
            }
        }
    }
}
