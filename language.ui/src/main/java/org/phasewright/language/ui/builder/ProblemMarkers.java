package org.phasewright.language.ui.builder;

import java.util.List;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.runtime.CoreException;
import org.phasewright.language.standalone.Problem;

/** Replaces a file's Phasewright problem markers with the checker's latest findings, at their exact ranges. */
public final class ProblemMarkers {
    public static final String TYPE = "org.phasewright.language.ui.problem";
    /** Marker attribute holding the validator's issue code, read by the quick fixes. */
    public static final String CODE = "org.phasewright.issueCode";

    private ProblemMarkers() {
    }

    public static void replace(IFile file, List<Problem> problems) throws CoreException {
        file.deleteMarkers(TYPE, false, IResource.DEPTH_ZERO);
        for (Problem problem : problems) {
            IMarker marker = file.createMarker(TYPE);
            marker.setAttribute(IMarker.MESSAGE, problem.message());
            marker.setAttribute(IMarker.SEVERITY, severity(problem.severity()));
            marker.setAttribute(IMarker.LINE_NUMBER, problem.line());
            marker.setAttribute(IMarker.LOCATION, "line " + problem.line() + ", column " + problem.column());
            if (problem.offset() >= 0) {
                marker.setAttribute(IMarker.CHAR_START, problem.offset());
                marker.setAttribute(IMarker.CHAR_END, problem.offset() + Math.max(1, problem.length()));
            }
            if (problem.code() != null) {
                marker.setAttribute(CODE, problem.code());
            }
        }
    }

    /** One error marker for a failure outside the text (for example a study that blew up). */
    public static void addFileError(IFile file, String message) throws CoreException {
        IMarker marker = file.createMarker(TYPE);
        marker.setAttribute(IMarker.MESSAGE, message);
        marker.setAttribute(IMarker.SEVERITY, IMarker.SEVERITY_ERROR);
        marker.setAttribute(IMarker.LINE_NUMBER, 1);
    }

    private static int severity(Problem.Severity severity) {
        return switch (severity) {
            case ERROR -> IMarker.SEVERITY_ERROR;
            case WARNING -> IMarker.SEVERITY_WARNING;
            default -> IMarker.SEVERITY_INFO;
        };
    }
}
