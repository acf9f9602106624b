package org.phasewright.language.ide.contentassist;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ExecutorService;

import org.eclipse.xtext.ide.editor.contentassist.ContentAssistContext;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistEntry;
import org.eclipse.xtext.ide.editor.contentassist.IdeContentProposalAcceptor;
import org.eclipse.xtext.ide.editor.contentassist.antlr.ContentAssistContextFactory;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.util.TextRegion;

import com.google.inject.Inject;
import com.google.inject.Provider;

/**
 * Content assist as a plain call, for editors that do not speak the language-server protocol (the Eclipse plugin):
 * give the parsed resource, its current text and the caret, get the proposals in priority order. The language
 * server reaches the same {@link PhaseContentProposalProvider} through Xtext's completion service.
 */
public class PhaseCompletions {
    @Inject
    private Provider<ContentAssistContextFactory> contextFactories;
    @Inject
    private ExecutorService executor;
    @Inject
    private PhaseContentProposalProvider proposals;
    @Inject
    private Provider<IdeContentProposalAcceptor> acceptors;

    /** {@code text} must be the text {@code resource} was parsed from. */
    public List<Completion> at(XtextResource resource, String text, int caret) {
        List<Completion> result = new ArrayList<>();
        if (caret < 0 || caret > text.length()) {
            return result;
        }
        ContentAssistContextFactory factory = contextFactories.get();
        factory.setPool(executor);
        ContentAssistContext[] contexts = factory.create(text, new TextRegion(caret, 0), caret, resource);
        IdeContentProposalAcceptor acceptor = acceptors.get();
        proposals.createProposals(Arrays.asList(contexts), acceptor);
        for (ContentAssistEntry entry : acceptor.getEntries()) {
            String prefix = entry.getPrefix() == null ? "" : entry.getPrefix();
            String label = entry.getLabel() == null ? entry.getProposal() : entry.getLabel();
            result.add(new Completion(label, entry.getProposal(), caret - prefix.length(), prefix.length(),
                    kind(entry), entry.getDescription()));
        }
        return result;
    }

    private static Completion.Kind kind(ContentAssistEntry entry) {
        if (entry.getKind() == null) {
            return Completion.Kind.OTHER;
        }
        return switch (entry.getKind()) {
            case ContentAssistEntry.KIND_KEYWORD -> Completion.Kind.KEYWORD;
            case ContentAssistEntry.KIND_VARIABLE -> Completion.Kind.STATE_OR_TIME;
            case ContentAssistEntry.KIND_VALUE -> Completion.Kind.PARAM;
            case ContentAssistEntry.KIND_PROPERTY -> Completion.Kind.LET;
            case ContentAssistEntry.KIND_FUNCTION -> Completion.Kind.FUNCTION;
            case ContentAssistEntry.KIND_UNIT -> Completion.Kind.UNIT;
            default -> Completion.Kind.OTHER;
        };
    }
}
