package org.phasewright.language.ui.editor;

import java.util.Map;

import org.eclipse.core.resources.IFile;
import org.eclipse.jface.text.source.DefaultCharacterPairMatcher;
import org.eclipse.jface.text.source.ISourceViewer;
import org.eclipse.jface.text.source.IVerticalRuler;
import org.eclipse.jface.text.source.projection.ProjectionSupport;
import org.eclipse.jface.text.source.projection.ProjectionViewer;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IFileEditorInput;
import org.eclipse.ui.editors.text.TextEditor;
import org.eclipse.ui.texteditor.ContentAssistAction;
import org.eclipse.ui.texteditor.ITextEditorActionDefinitionIds;
import org.eclipse.ui.texteditor.SourceViewerDecorationSupport;
import org.eclipse.ui.views.contentoutline.IContentOutlinePage;
import org.phasewright.language.ui.highlight.DeclaredKinds;
import org.phasewright.language.ui.highlight.TokenClass;
import org.phasewright.language.ui.outline.PhaseOutlinePage;

/**
 * The `.phase` editor: a platform text editor with lexer-based and semantic colouring, folding of study blocks,
 * bracket matching, completion, hover, outline and Ctrl+/ comments. Problems come from the builder's markers on save.
 */
public final class PhaseEditor extends TextEditor {
    public static final String ID = "org.phasewright.language.ui.editor";
    static final String CONTEXT_ID = "org.phasewright.language.ui.editorContext";
    private static final String MATCHING_BRACKETS = "org.phasewright.language.ui.matchingBrackets";
    private static final String MATCHING_BRACKETS_COLOR = "org.phasewright.language.ui.matchingBracketsColor";

    private final PhaseViewerConfiguration configuration;
    private PhaseOutlinePage outlinePage;
    private StudyFolding folding;
    private Map<String, TokenClass> shownKinds = Map.of();
    private volatile ModelSnapshot lastSnapshot;

    public PhaseEditor() {
        configuration = new PhaseViewerConfiguration(this);
        setSourceViewerConfiguration(configuration);
    }

    @Override
    protected void initializeKeyBindingScopes() {
        setKeyBindingScopes(new String[] { CONTEXT_ID });
    }

    @Override
    protected ISourceViewer createSourceViewer(Composite parent, IVerticalRuler ruler, int styles) {
        ProjectionViewer viewer = new ProjectionViewer(parent, ruler, getOverviewRuler(), isOverviewRulerVisible(),
                styles);
        getSourceViewerDecorationSupport(viewer);
        return viewer;
    }

    @Override
    public void createPartControl(Composite parent) {
        super.createPartControl(parent);
        ProjectionViewer viewer = (ProjectionViewer) getSourceViewer();
        ProjectionSupport support = new ProjectionSupport(viewer, getAnnotationAccess(), getSharedColors());
        support.install();
        viewer.doOperation(ProjectionViewer.TOGGLE);
        folding = new StudyFolding(viewer);
        ModelSnapshot snapshot = lastSnapshot;
        if (snapshot != null) {
            applySnapshot(snapshot);
        }
    }

    @Override
    protected void configureSourceViewerDecorationSupport(SourceViewerDecorationSupport support) {
        support.setCharacterPairMatcher(new DefaultCharacterPairMatcher(new char[] { '(', ')', '{', '}' }));
        support.setMatchingCharacterPainterPreferenceKeys(MATCHING_BRACKETS, MATCHING_BRACKETS_COLOR);
        getPreferenceStore().setDefault(MATCHING_BRACKETS, true);
        getPreferenceStore().setDefault(MATCHING_BRACKETS_COLOR, "128,128,128");
        super.configureSourceViewerDecorationSupport(support);
    }

    @Override
    protected void createActions() {
        super.createActions();
        ContentAssistAction assist = new ContentAssistAction(new PhaseEditorMessages(), "ContentAssistProposal.",
                this);
        assist.setActionDefinitionId(ITextEditorActionDefinitionIds.CONTENT_ASSIST_PROPOSALS);
        setAction("ContentAssistProposal", assist);
        ToggleCommentAction toggle = new ToggleCommentAction(this);
        setAction("ToggleComment", toggle);
        markAsStateDependentAction("ToggleComment", true);
    }

    @Override
    protected void editorSaved() {
        super.editorSaved();
        if (getEditorInput() instanceof IFileEditorInput input) {
            org.phasewright.language.ui.builder.SaveCheck.schedule(input.getFile());
        }
    }

    @Override
    public <T> T getAdapter(Class<T> adapter) {
        if (IContentOutlinePage.class.equals(adapter)) {
            if (outlinePage == null) {
                outlinePage = new PhaseOutlinePage(this);
                ModelSnapshot snapshot = lastSnapshot;
                if (snapshot != null) {
                    outlinePage.update(PhaseOutlinePage.entriesOf(snapshot.checked().ast()));
                }
            }
            return adapter.cast(outlinePage);
        }
        return super.getAdapter(adapter);
    }

    /** The model file's path on disk (or the input's name when it is not a workspace file). */
    String modelPath() {
        if (getEditorInput() instanceof IFileEditorInput input) {
            IFile file = input.getFile();
            return file.getLocation() == null ? file.getFullPath().toString() : file.getLocation().toOSString();
        }
        return getEditorInput() == null ? "untitled.phase" : getEditorInput().getName();
    }

    /** The latest background parse, for tests and the self-check. */
    public ModelSnapshot lastSnapshot() {
        return lastSnapshot;
    }

    /** Called from the reconciler thread after each background parse. */
    void modelParsed(ModelSnapshot snapshot) {
        lastSnapshot = snapshot;
        Display display = getSite() == null ? null : getSite().getShell().getDisplay();
        if (display != null && !display.isDisposed()) {
            display.asyncExec(() -> {
                if (getSourceViewer() != null && getSourceViewer().getTextWidget() != null
                        && !getSourceViewer().getTextWidget().isDisposed()) {
                    applySnapshot(snapshot);
                }
            });
        }
    }

    private void applySnapshot(ModelSnapshot snapshot) {
        if (snapshot.checked().ast() == null) {
            return; // keep the last good colouring and outline while the text cannot be parsed at all
        }
        Map<String, TokenClass> kinds = DeclaredKinds.of(snapshot.checked().ast());
        if (!kinds.equals(shownKinds)) {
            shownKinds = kinds;
            configuration.scanner().setDeclaredKinds(kinds);
            getSourceViewer().invalidateTextPresentation();
        }
        if (outlinePage != null) {
            outlinePage.update(PhaseOutlinePage.entriesOf(snapshot.checked().ast()));
        }
        if (folding != null) {
            folding.update(snapshot.checked().ast());
        }
    }

    @Override
    public void dispose() {
        if (outlinePage != null) {
            outlinePage.dispose();
        }
        super.dispose();
    }
}
