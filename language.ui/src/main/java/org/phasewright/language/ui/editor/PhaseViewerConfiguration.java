package org.phasewright.language.ui.editor;

import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.ITextHover;
import org.eclipse.jface.text.contentassist.ContentAssistant;
import org.eclipse.jface.text.contentassist.IContentAssistant;
import org.eclipse.jface.text.presentation.IPresentationReconciler;
import org.eclipse.jface.text.presentation.PresentationReconciler;
import org.eclipse.jface.text.quickassist.IQuickAssistAssistant;
import org.eclipse.jface.text.quickassist.QuickAssistAssistant;
import org.eclipse.jface.text.reconciler.IReconciler;
import org.eclipse.jface.text.reconciler.MonoReconciler;
import org.eclipse.jface.text.rules.DefaultDamagerRepairer;
import org.eclipse.jface.text.source.ISourceViewer;
import org.eclipse.ui.editors.text.EditorsUI;
import org.eclipse.ui.editors.text.TextSourceViewerConfiguration;
import org.phasewright.language.ui.assist.PhaseContentAssistProcessor;
import org.phasewright.language.ui.highlight.PhaseTokenScanner;
import org.phasewright.language.ui.highlight.WholeDocumentDamager;
import org.phasewright.language.ui.hover.PhaseTextHover;
import org.phasewright.language.ui.quickfix.MarkerQuickAssistProcessor;

/** Wires the editor's colouring, background parsing, completion, hover, quick fixes and comment prefix. */
final class PhaseViewerConfiguration extends TextSourceViewerConfiguration {
    private final PhaseEditor editor;
    private final PhaseTokenScanner scanner = new PhaseTokenScanner(PhaseColours.attributes());

    PhaseViewerConfiguration(PhaseEditor editor) {
        super(EditorsUI.getPreferenceStore());
        this.editor = editor;
    }

    PhaseTokenScanner scanner() {
        return scanner;
    }

    @Override
    public IPresentationReconciler getPresentationReconciler(ISourceViewer sourceViewer) {
        PresentationReconciler reconciler = new PresentationReconciler();
        DefaultDamagerRepairer repairer = new DefaultDamagerRepairer(scanner);
        reconciler.setDamager(new WholeDocumentDamager(), IDocument.DEFAULT_CONTENT_TYPE);
        reconciler.setRepairer(repairer, IDocument.DEFAULT_CONTENT_TYPE);
        return reconciler;
    }

    @Override
    public IReconciler getReconciler(ISourceViewer sourceViewer) {
        MonoReconciler reconciler = new MonoReconciler(
                new PhaseReconcilingStrategy(editor.modelPath(), editor::modelParsed), false);
        reconciler.setDelay(250);
        return reconciler;
    }

    @Override
    public IContentAssistant getContentAssistant(ISourceViewer sourceViewer) {
        ContentAssistant assistant = new ContentAssistant();
        assistant.setContentAssistProcessor(new PhaseContentAssistProcessor(editor.modelPath()),
                IDocument.DEFAULT_CONTENT_TYPE);
        assistant.enableAutoInsert(true);
        assistant.setInformationControlCreator(getInformationControlCreator(sourceViewer));
        return assistant;
    }

    @Override
    public ITextHover getTextHover(ISourceViewer sourceViewer, String contentType) {
        return new PhaseTextHover(editor.modelPath());
    }

    @Override
    public IQuickAssistAssistant getQuickAssistAssistant(ISourceViewer sourceViewer) {
        QuickAssistAssistant assistant = new QuickAssistAssistant();
        assistant.setQuickAssistProcessor(new MarkerQuickAssistProcessor());
        assistant.setInformationControlCreator(getInformationControlCreator(sourceViewer));
        return assistant;
    }

    @Override
    public String[] getDefaultPrefixes(ISourceViewer sourceViewer, String contentType) {
        return new String[] { CommentToggler.PREFIX, "" };
    }
}
