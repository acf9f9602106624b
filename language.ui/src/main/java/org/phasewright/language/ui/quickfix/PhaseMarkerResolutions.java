package org.phasewright.language.ui.quickfix;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Comparator;
import java.util.List;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.jface.text.IDocument;
import org.eclipse.ui.IMarkerResolution;
import org.eclipse.ui.IMarkerResolution2;
import org.eclipse.ui.IMarkerResolutionGenerator2;
import org.phasewright.language.ide.quickfix.PhaseQuickFixes;
import org.phasewright.language.ide.quickfix.QuickFix;
import org.phasewright.language.ide.text.TextChange;
import org.phasewright.language.ui.PhaseLanguage;
import org.phasewright.language.ui.builder.ProblemMarkers;

/**
 * Quick fixes for Phasewright markers (Problems view and Ctrl+1 in the editor): the editor-neutral
 * {@link PhaseQuickFixes} (add a missing rate, change an unknown name to a close declared one, and more), applied
 * as text changes to the marker's file.
 */
public final class PhaseMarkerResolutions implements IMarkerResolutionGenerator2 {

    @Override
    public boolean hasResolutions(IMarker marker) {
        return marker.getAttribute(ProblemMarkers.CODE, null) != null
                && marker.getAttribute(IMarker.CHAR_START, -1) >= 0;
    }

    @Override
    public IMarkerResolution[] getResolutions(IMarker marker) {
        String code = marker.getAttribute(ProblemMarkers.CODE, null);
        int start = marker.getAttribute(IMarker.CHAR_START, -1);
        int end = marker.getAttribute(IMarker.CHAR_END, -1);
        if (code == null || !(marker.getResource() instanceof IFile file) || start < 0 || end < start) {
            return new IMarkerResolution[0];
        }
        String text = read(file);
        if (text == null) {
            return new IMarkerResolution[0];
        }
        return fixes(file.getFullPath().toString(), text, code, start, end - start,
                marker.getAttribute(IMarker.MESSAGE, null)).stream()
                .map(fix -> new Resolution(fix, text)).toArray(IMarkerResolution[]::new);
    }

    /** The fixes for a problem with {@code code} over {@code length} characters at {@code offset}; plain Java. */
    public static List<QuickFix> fixes(String path, String text, String code, int offset, int length) {
        return fixes(path, text, code, offset, length, null);
    }

    /** As above, with the problem's message (some fixes insert what it quotes). */
    public static List<QuickFix> fixes(String path, String text, String code, int offset, int length,
            String message) {
        PhaseLanguage language = PhaseLanguage.get();
        return new PhaseQuickFixes().fixesFor(language.parse(path, text), code, offset, length, message);
    }

    /** Applies the changes back to front so earlier offsets stay valid. */
    static void apply(IDocument document, List<TextChange> changes) throws org.eclipse.jface.text.BadLocationException {
        List<TextChange> ordered = changes.stream().sorted(Comparator.comparingInt(TextChange::offset).reversed())
                .toList();
        for (TextChange change : ordered) {
            document.replace(change.offset(), change.length(), change.text());
        }
    }

    private static String read(IFile file) {
        try (InputStream in = file.getContents(true)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException | CoreException e) {
            return null;
        }
    }

    /** A fix computed for one version of the file; it is applied only if the file still reads the same. */
    private record Resolution(QuickFix fix, String basedOn) implements IMarkerResolution2 {
        @Override
        public String getLabel() {
            return fix.title();
        }

        @Override
        public String getDescription() {
            return fix.title();
        }

        @Override
        public org.eclipse.swt.graphics.Image getImage() {
            return null;
        }

        @Override
        public void run(IMarker marker) {
            try {
                FileEdits.apply((IFile) marker.getResource(), document -> {
                    if (!document.get().equals(basedOn)) {
                        throw new org.eclipse.jface.text.BadLocationException("changed since the check");
                    }
                    apply(document, fix.changes());
                });
            } catch (CoreException e) {
                org.eclipse.jface.dialogs.ErrorDialog.openError(null, "Quick fix", "The fix could not be applied.",
                        e.getStatus());
            }
        }
    }
}
