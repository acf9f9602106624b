/*
 * Phasewright .phase language (Xtext).
 */
package org.phasewright.language.ide;

import org.eclipse.xtext.generator.GeneratorDelegate;
import org.eclipse.xtext.generator.IShouldGenerate;
import org.eclipse.xtext.ide.ExecutorServiceProvider;
import org.eclipse.xtext.ide.editor.contentassist.IdeContentProposalProvider;
import org.eclipse.xtext.ide.editor.contentassist.IdeCrossrefProposalProvider;
import org.eclipse.xtext.ide.editor.syntaxcoloring.ISemanticHighlightingCalculator;
import org.eclipse.xtext.ide.server.codeActions.ICodeActionService2;
import org.eclipse.xtext.ide.server.hover.IHoverService;
import org.eclipse.xtext.ide.server.rename.IRenameService2;
import org.eclipse.xtext.ide.server.symbol.HierarchicalDocumentSymbolService;
import org.eclipse.xtext.resource.XtextResource;
import org.phasewright.language.ide.contentassist.PhaseContentProposalProvider;
import org.phasewright.language.ide.contentassist.PhaseCrossrefProposalProvider;
import org.phasewright.language.ide.highlighting.PhaseHighlightingCalculator;
import org.phasewright.language.ide.hover.PhaseHoverService;
import org.phasewright.language.ide.outline.PhaseDocumentSymbolService;
import org.phasewright.language.ide.quickfix.PhaseCodeActionService;
import org.phasewright.language.ide.rename.PhaseRenameService;
import org.phasewright.language.ide.server.LargeStackExecutorServiceProvider;
import org.phasewright.language.ide.server.LineBreakResource;
import org.phasewright.language.ide.server.StudyOnSave;
import org.phasewright.language.ide.server.StudyRunningGenerator;

/**
 * Editor services of the language, shared by every editor: the plain entry points (PhaseCompletions, HoverText,
 * SemanticClassifier, PhaseOutline, PhaseQuickFixes, PhaseFormatting) and their language-server adapters bound
 * here.
 */
public class PhaseIdeModule extends AbstractPhaseIdeModule {

    public Class<? extends IdeContentProposalProvider> bindIdeContentProposalProvider() {
        return PhaseContentProposalProvider.class;
    }

    public Class<? extends IdeCrossrefProposalProvider> bindIdeCrossrefProposalProvider() {
        return PhaseCrossrefProposalProvider.class;
    }

    public Class<? extends IHoverService> bindIHoverService() {
        return PhaseHoverService.class;
    }

    public Class<? extends HierarchicalDocumentSymbolService> bindHierarchicalDocumentSymbolService() {
        return PhaseDocumentSymbolService.class;
    }

    public Class<? extends ICodeActionService2> bindICodeActionService2() {
        return PhaseCodeActionService.class;
    }

    /** Refuses new names that are not names, are keywords, or are taken. */
    @Override
    public Class<? extends IRenameService2> bindIRenameService2() {
        return PhaseRenameService.class;
    }

    public Class<? extends ISemanticHighlightingCalculator> bindISemanticHighlightingCalculator() {
        return PhaseHighlightingCalculator.class;
    }

    /** Studies run only after a save, never on every keystroke's build. */
    public Class<? extends IShouldGenerate> bindIShouldGenerate() {
        return StudyOnSave.class;
    }

    public Class<? extends GeneratorDelegate> bindGeneratorDelegate() {
        return StudyRunningGenerator.class;
    }

    /** A lone CR is a line break, as for {@code phasewright check}. */
    public Class<? extends XtextResource> bindXtextResource() {
        return LineBreakResource.class;
    }

    /** Content assist parses on these executors: large stacks, as the server's requests. */
    public Class<? extends ExecutorServiceProvider> bindExecutorServiceProvider() {
        return LargeStackExecutorServiceProvider.class;
    }
}
