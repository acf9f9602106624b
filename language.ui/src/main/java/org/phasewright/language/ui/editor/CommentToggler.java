package org.phasewright.language.ui.editor;

import org.eclipse.jface.text.BadLocationException;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.IRegion;

/**
 * Toggles `//` line comments over whole lines: if every non-blank line in the range is commented, uncomment them all;
 * otherwise comment them all. Works on a plain {@link IDocument}, so it is tested without a workbench.
 */
public final class CommentToggler {
    static final String PREFIX = "//";

    private CommentToggler() {
    }

    public static void toggle(IDocument document, int offset, int length) throws BadLocationException {
        int firstLine = document.getLineOfOffset(offset);
        int end = length > 0 ? offset + length - 1 : offset;
        int lastLine = document.getLineOfOffset(Math.max(offset, end));
        boolean allCommented = true;
        for (int line = firstLine; line <= lastLine; line++) {
            String text = lineText(document, line);
            if (!text.isBlank() && !text.stripLeading().startsWith(PREFIX)) {
                allCommented = false;
            }
        }
        // Edit from the last line up so earlier offsets stay valid.
        for (int line = lastLine; line >= firstLine; line--) {
            IRegion region = document.getLineInformation(line);
            String text = lineText(document, line);
            if (text.isBlank()) {
                continue;
            }
            if (allCommented) {
                int at = region.getOffset() + text.indexOf(PREFIX);
                boolean spaced = text.startsWith(PREFIX + " ", text.indexOf(PREFIX));
                int remove = spaced ? PREFIX.length() + 1 : PREFIX.length();
                document.replace(at, remove, "");
            } else {
                document.replace(region.getOffset(), 0, PREFIX + " ");
            }
        }
    }

    private static String lineText(IDocument document, int line) throws BadLocationException {
        IRegion region = document.getLineInformation(line);
        return document.get(region.getOffset(), region.getLength());
    }
}
