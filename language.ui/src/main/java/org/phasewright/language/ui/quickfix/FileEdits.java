package org.phasewright.language.ui.quickfix;

import org.eclipse.core.filebuffers.FileBuffers;
import org.eclipse.core.filebuffers.ITextFileBuffer;
import org.eclipse.core.filebuffers.ITextFileBufferManager;
import org.eclipse.core.filebuffers.LocationKind;
import org.eclipse.core.resources.IFile;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.jface.text.BadLocationException;
import org.eclipse.jface.text.IDocument;

/**
 * Applies one text replacement to a file through the shared file buffer, so an open editor shows it at once. A file
 * that had no unsaved changes is saved again (which re-runs the checks); unsaved edits are left for the user to save.
 */
final class FileEdits {
    private FileEdits() {
    }

    interface DocumentEdit {
        void apply(IDocument document) throws BadLocationException;
    }

    static void apply(IFile file, DocumentEdit edit) throws CoreException {
        ITextFileBufferManager manager = FileBuffers.getTextFileBufferManager();
        manager.connect(file.getFullPath(), LocationKind.IFILE, null);
        try {
            ITextFileBuffer buffer = manager.getTextFileBuffer(file.getFullPath(), LocationKind.IFILE);
            boolean wasDirty = buffer.isDirty();
            edit.apply(buffer.getDocument());
            if (!wasDirty) {
                buffer.commit(null, true);
            }
        } catch (BadLocationException e) {
            throw new CoreException(org.eclipse.core.runtime.Status.error("The file changed; run the check again.", e));
        } finally {
            manager.disconnect(file.getFullPath(), LocationKind.IFILE, null);
        }
    }
}
