package org.phasewright.language.ui.highlight;

import org.eclipse.jface.text.DocumentEvent;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.IRegion;
import org.eclipse.jface.text.ITypedRegion;
import org.eclipse.jface.text.Region;
import org.eclipse.jface.text.presentation.IPresentationDamager;

/** Recolours the whole document on every change: opening a block comment can change the colour of every later line. */
public final class WholeDocumentDamager implements IPresentationDamager {
    private IDocument document;

    @Override
    public void setDocument(IDocument document) {
        this.document = document;
    }

    @Override
    public IRegion getDamageRegion(ITypedRegion partition, DocumentEvent event, boolean documentPartitioningChanged) {
        return new Region(0, document == null ? 0 : document.getLength());
    }
}
