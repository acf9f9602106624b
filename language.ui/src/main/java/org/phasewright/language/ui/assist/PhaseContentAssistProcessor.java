package org.phasewright.language.ui.assist;

import java.util.List;

import org.eclipse.jface.text.ITextViewer;
import org.eclipse.jface.text.contentassist.CompletionProposal;
import org.eclipse.jface.text.contentassist.ICompletionProposal;
import org.eclipse.jface.text.contentassist.IContentAssistProcessor;
import org.eclipse.jface.text.contentassist.IContextInformation;
import org.eclipse.jface.text.contentassist.IContextInformationValidator;
import org.phasewright.language.ide.contentassist.Completion;
import org.phasewright.language.ide.contentassist.PhaseCompletions;
import org.phasewright.language.ui.PhaseLanguage;

/**
 * Ctrl+Space in the editor: the editor-neutral {@link PhaseCompletions} (names that fit the place, functions, units,
 * keywords) as JFace proposals.
 */
public final class PhaseContentAssistProcessor implements IContentAssistProcessor {
    private final String path;

    public PhaseContentAssistProcessor(String path) {
        this.path = path;
    }

    /** The proposals at {@code offset} of {@code text}; plain Java, used by the tests too. */
    public static List<Completion> completions(String path, String text, int offset) {
        PhaseLanguage language = PhaseLanguage.get();
        return language.injector().getInstance(PhaseCompletions.class).at(language.parse(path, text), text, offset);
    }

    @Override
    public ICompletionProposal[] computeCompletionProposals(ITextViewer viewer, int offset) {
        return completions(path, viewer.getDocument().get(), offset).stream().map(PhaseContentAssistProcessor::proposal)
                .toArray(ICompletionProposal[]::new);
    }

    static ICompletionProposal proposal(Completion completion) {
        String shown = completion.detail() == null || completion.detail().isBlank() ? completion.label()
                : completion.label() + "  —  " + completion.detail();
        return new CompletionProposal(completion.text(), completion.replaceOffset(), completion.replaceLength(),
                completion.text().length(), null, shown, null, null);
    }

    @Override
    public IContextInformation[] computeContextInformation(ITextViewer viewer, int offset) {
        return null;
    }

    @Override
    public char[] getCompletionProposalAutoActivationCharacters() {
        return null;
    }

    @Override
    public char[] getContextInformationAutoActivationCharacters() {
        return null;
    }

    @Override
    public String getErrorMessage() {
        return null;
    }

    @Override
    public IContextInformationValidator getContextInformationValidator() {
        return null;
    }
}
