package org.phasewright.language.ide.server;

import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.xtext.ide.server.Document;
import org.eclipse.xtext.util.ITextRegion;
import org.phasewright.language.text.LineBreaks;

/**
 * An open document whose contents (what is parsed and what positions are counted in) have lone CRs read as LF
 * ({@link LineBreaks}), while the text as the client holds it is kept for applying incremental changes: an edit
 * that puts LF right after a lone CR makes one CRLF line break for the client, and so it does here.
 */
final class ClientDocument extends Document {
    private final String clientText;

    ClientDocument(Integer version, String clientText, boolean printSourceOnError) {
        super(version, LineBreaks.loneCrAsLf(clientText), printSourceOnError);
        this.clientText = clientText;
    }

    /** Positions are found in the normalised contents; they are the client's, and offsets are equal in both texts. */
    @Override
    public Document applyTextDocumentChanges(Iterable<? extends TextDocumentContentChangeEvent> changes) {
        ClientDocument current = this;
        Integer version = getVersion() == null ? null : getVersion() + 1;
        for (TextDocumentContentChangeEvent change : changes) {
            String text;
            if (change.getRange() == null) {
                text = change.getText();
            } else {
                ITextRegion region = current.getTextRegion(change.getRange());
                text = current.clientText.substring(0, region.getOffset()) + change.getText()
                        + current.clientText.substring(region.getEndOffset());
            }
            current = new ClientDocument(version, text, isPrintSourceOnError());
        }
        return current;
    }
}
