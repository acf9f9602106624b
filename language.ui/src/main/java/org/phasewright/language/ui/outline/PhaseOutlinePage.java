package org.phasewright.language.ui.outline;

import java.util.List;
import java.util.Optional;

import org.eclipse.jface.viewers.ITreeContentProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.LabelProvider;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.ui.texteditor.ITextEditor;
import org.eclipse.ui.views.contentoutline.ContentOutlinePage;
import org.phasewright.language.ide.outline.OutlineNode;
import org.phasewright.language.ide.outline.PhaseOutline;
import org.phasewright.language.phase.PhaseModel;

/**
 * The Outline view's page for a `.phase` editor, showing the editor-neutral {@link PhaseOutline}; selecting an entry
 * selects its name in the editor.
 */
public final class PhaseOutlinePage extends ContentOutlinePage {
    private final ITextEditor editor;
    private List<OutlineNode> roots = List.of();

    public PhaseOutlinePage(ITextEditor editor) {
        this.editor = editor;
    }

    /** The entries for a parsed model (its declarations in file order). */
    public static List<OutlineNode> entriesOf(PhaseModel model) {
        return Optional.ofNullable(model).map(m -> new PhaseOutline().of(m)).map(OutlineNode::children)
                .orElse(List.of());
    }

    @Override
    public void createControl(Composite parent) {
        super.createControl(parent);
        TreeViewer viewer = getTreeViewer();
        viewer.setContentProvider(new NodeContentProvider());
        viewer.setLabelProvider(new LabelProvider() {
            @Override
            public String getText(Object element) {
                OutlineNode node = (OutlineNode) element;
                return node.detail() == null || node.detail().isBlank() ? node.name()
                        : node.name() + "  " + node.detail();
            }
        });
        viewer.setAutoExpandLevel(2);
        viewer.setInput(roots);
        viewer.addSelectionChangedListener(event -> {
            Object first = ((IStructuredSelection) event.getSelection()).getFirstElement();
            if (first instanceof OutlineNode node) {
                editor.selectAndReveal(node.nameOffset(), node.nameLength());
            }
        });
    }

    /** Called in the UI thread with the latest parse. */
    public void update(List<OutlineNode> newRoots) {
        roots = newRoots;
        TreeViewer viewer = getTreeViewer();
        if (viewer != null && !viewer.getControl().isDisposed()) {
            Object[] expanded = viewer.getExpandedElements();
            viewer.setInput(roots);
            viewer.setExpandedElements(expanded);
        }
    }

    /** Top-level entries shown, or -1 before the page has a control. */
    public int shownEntries() {
        TreeViewer viewer = getTreeViewer();
        return viewer == null || viewer.getControl().isDisposed() ? -1 : viewer.getTree().getItemCount();
    }

    private static final class NodeContentProvider implements ITreeContentProvider {
        @Override
        public Object[] getElements(Object input) {
            return ((List<?>) input).toArray();
        }

        @Override
        public Object[] getChildren(Object parent) {
            return ((OutlineNode) parent).children().toArray();
        }

        @Override
        public Object getParent(Object element) {
            return null;
        }

        @Override
        public boolean hasChildren(Object element) {
            return !((OutlineNode) element).children().isEmpty();
        }
    }
}
