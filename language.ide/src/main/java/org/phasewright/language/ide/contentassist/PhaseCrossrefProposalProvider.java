package org.phasewright.language.ide.contentassist;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.xtext.CrossReference;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistContext;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistEntry;
import org.eclipse.xtext.ide.editor.contentassist.IdeCrossrefProposalProvider;
import org.eclipse.xtext.resource.IEObjectDescription;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.Symbol;

/** Name proposals that say what the name is: "state — loop flow", "param — scaled heating". */
public class PhaseCrossrefProposalProvider extends IdeCrossrefProposalProvider {

    @Override
    protected ContentAssistEntry createProposal(IEObjectDescription candidate, CrossReference crossRef,
            ContentAssistContext context) {
        ContentAssistEntry entry = super.createProposal(candidate, crossRef, context);
        if (entry == null) {
            return null;
        }
        EObject object = candidate.getEObjectOrProxy();
        if (object.eIsProxy() && context.getResource() != null) {
            object = EcoreUtil.resolve(object, context.getResource());
        }
        if (object instanceof Symbol symbol && !symbol.eIsProxy()) {
            String description = descriptionOf(symbol);
            entry.setDescription(PhaseModels.kindWord(symbol) + (description == null ? "" : " — " + description));
            entry.setKind(kindOf(symbol));
        }
        return entry;
    }

    private static String descriptionOf(Symbol symbol) {
        if (symbol instanceof StateDecl state) {
            return state.getDescription();
        }
        if (symbol instanceof ParamDecl param) {
            return param.getDescription();
        }
        return symbol instanceof LetDecl let ? let.getDescription() : null;
    }

    static String kindOf(Symbol symbol) {
        if (symbol instanceof ParamDecl) {
            return ContentAssistEntry.KIND_VALUE;
        }
        if (symbol instanceof LetDecl) {
            return ContentAssistEntry.KIND_PROPERTY;
        }
        return ContentAssistEntry.KIND_VARIABLE;
    }
}
