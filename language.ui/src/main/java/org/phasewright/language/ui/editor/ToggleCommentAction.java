package org.phasewright.language.ui.editor;

import org.eclipse.jface.action.Action;
import org.eclipse.jface.text.BadLocationException;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.ITextSelection;
import org.eclipse.ui.texteditor.ITextEditor;

/** Editor action behind the "Toggle Comment" command (Ctrl+/). */
final class ToggleCommentAction extends Action {
    static final String COMMAND_ID = "org.phasewright.language.ui.toggleComment";
    private final ITextEditor editor;

    ToggleCommentAction(ITextEditor editor) {
        super("Toggle Comment");
        this.editor = editor;
        setActionDefinitionId(COMMAND_ID);
    }

    @Override
    public void run() {
        IDocument document = editor.getDocumentProvider().getDocument(editor.getEditorInput());
        ITextSelection selection = (ITextSelection) editor.getSelectionProvider().getSelection();
        try {
            CommentToggler.toggle(document, selection.getOffset(), selection.getLength());
        } catch (BadLocationException e) {
            // The selection went stale while the command ran; nothing to toggle.
        }
    }
}
