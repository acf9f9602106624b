package org.phasewright.language.ui.editor;

import java.util.function.Consumer;

import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.IRegion;
import org.eclipse.jface.text.reconciler.DirtyRegion;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.jface.text.reconciler.IReconcilingStrategy;
import org.eclipse.jface.text.reconciler.IReconcilingStrategyExtension;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.ui.PhaseLanguage;

/** Re-parses the whole document in the reconciler's background thread after typing pauses. */
final class PhaseReconcilingStrategy implements IReconcilingStrategy, IReconcilingStrategyExtension {
    private final String path;
    private final Consumer<ModelSnapshot> onParsed;
    private IDocument document;

    PhaseReconcilingStrategy(String path, Consumer<ModelSnapshot> onParsed) {
        this.path = path;
        this.onParsed = onParsed;
    }

    @Override
    public void setDocument(IDocument document) {
        this.document = document;
    }

    @Override
    public void reconcile(DirtyRegion dirtyRegion, IRegion subRegion) {
        reconcileAll();
    }

    @Override
    public void reconcile(IRegion partition) {
        reconcileAll();
    }

    @Override
    public void setProgressMonitor(IProgressMonitor monitor) {
    }

    @Override
    public void initialReconcile() {
        reconcileAll();
    }

    private void reconcileAll() {
        if (document == null) {
            return;
        }
        String text = document.get();
        CheckedModel checked = PhaseLanguage.get().check(path, path, text);
        onParsed.accept(new ModelSnapshot(text, checked));
    }
}
