package org.phasewright.language.ide.contentassist;

import java.util.Map;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.AbstractElement;
import org.eclipse.xtext.AbstractRule;
import org.eclipse.xtext.Assignment;
import org.eclipse.xtext.CrossReference;
import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.GrammarUtil;
import org.eclipse.xtext.Keyword;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistContext;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistEntry;
import org.eclipse.xtext.ide.editor.contentassist.IIdeContentProposalAcceptor;
import org.eclipse.xtext.ide.editor.contentassist.IdeContentProposalProvider;
import org.eclipse.xtext.resource.IEObjectDescription;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.PhasePackage;
import org.phasewright.language.phase.SimulateRequest;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StateMap;
import org.phasewright.runtime.model.MathFunction;

import com.google.common.base.Predicate;
import com.google.inject.Inject;

/**
 * Content assist for `.phase` files: declared names that fit the place (only states after `rate` and in symmetries,
 * only params where values must be known before a run), the built-in functions, unit names after `in`, the model's
 * time name after `simulate to`, and word keywords. Punctuation and placeholder words are not offered.
 */
public class PhaseContentProposalProvider extends IdeContentProposalProvider {
    private static final PhasePackage PHASE = PhasePackage.eINSTANCE;

    @Inject
    private UnitVocabulary units;

    @Override
    protected void _createProposals(Assignment assignment, ContentAssistContext context,
            IIdeContentProposalAcceptor acceptor) {
        AbstractElement terminal = assignment.getTerminal();
        if (terminal instanceof CrossReference) {
            createProposals(terminal, context, acceptor);
            return;
        }
        AbstractRule rule = GrammarUtil.containingRule(assignment);
        String feature = assignment.getFeature();
        if ("function".equals(feature)) {
            proposeFunctions(context, acceptor);
        } else if ("name".equals(feature) && rule != null && rule.getName().equals("UnitFactor")) {
            proposeUnits(context, acceptor);
        } else if ("timeName".equals(feature)) {
            PhaseModel model = modelOf(context);
            if (model != null) {
                accept(PhaseModels.timeName(model), "time", ContentAssistEntry.KIND_VARIABLE, context, acceptor);
            }
        }
        // Names of new declarations, numbers and descriptions cannot be guessed: no placeholder proposals.
    }

    @Override
    protected boolean filterKeyword(Keyword keyword, ContentAssistContext context) {
        return Character.isLetter(keyword.getValue().charAt(0));
    }

    @Override
    protected Predicate<IEObjectDescription> getCrossrefFilter(CrossReference reference, ContentAssistContext context) {
        Assignment assignment = GrammarUtil.containingAssignment(reference);
        String feature = assignment == null ? "" : assignment.getFeature();
        boolean statesOnly = feature.equals("target") || feature.equals("state") || insideSymmetryImage(context);
        boolean paramsOnly = !statesOnly && insideConstantPlace(context);
        return description -> description.getName().getSegmentCount() == 1
                && sameResource(description, context)
                && (!statesOnly || PHASE.getStateDecl().isSuperTypeOf(description.getEClass()))
                && (!paramsOnly || PHASE.getParamDecl().isSuperTypeOf(description.getEClass()));
    }

    private void proposeFunctions(ContentAssistContext context, IIdeContentProposalAcceptor acceptor) {
        for (MathFunction function : MathFunction.values()) {
            String signature = function.notationName() + (function.arity() == 1 ? "(x)" : "(a, b)");
            accept(function.notationName(), "function " + signature, ContentAssistEntry.KIND_FUNCTION, context,
                    acceptor);
        }
    }

    private void proposeUnits(ContentAssistContext context, IIdeContentProposalAcceptor acceptor) {
        for (Map.Entry<String, String> unit : units.proposals(modelOf(context))) {
            if (!unit.getKey().equals("1")) {
                accept(unit.getKey(), "unit: " + unit.getValue(), ContentAssistEntry.KIND_UNIT, context, acceptor);
            }
        }
    }

    private void accept(String proposal, String description, String kind, ContentAssistContext context,
            IIdeContentProposalAcceptor acceptor) {
        ContentAssistEntry entry = getProposalCreator().createProposal(proposal, context, kind, e -> e.setDescription(description));
        if (entry != null) {
            acceptor.accept(entry, getProposalPriorities().getDefaultPriority(entry));
        }
    }

    private static boolean sameResource(IEObjectDescription description, ContentAssistContext context) {
        return context.getResource() == null
                || description.getEObjectURI().trimFragment().equals(context.getResource().getURI());
    }

    /** The declaration or request whose expression is being written (skipping enclosing expressions). */
    private static EObject ownerOf(ContentAssistContext context) {
        EObject owner = context.getCurrentModel();
        while (owner instanceof Expression) {
            owner = owner.eContainer();
        }
        return owner;
    }

    private static boolean insideConstantPlace(ContentAssistContext context) {
        EObject owner = ownerOf(context);
        return owner instanceof ParamDecl || owner instanceof StateDecl || owner instanceof SimulateRequest;
    }

    private static boolean insideSymmetryImage(ContentAssistContext context) {
        return ownerOf(context) instanceof StateMap;
    }

    private static PhaseModel modelOf(ContentAssistContext context) {
        EObject root = context.getRootModel();
        if (root instanceof PhaseModel model) {
            return model;
        }
        return context.getCurrentModel() == null ? null
                : EcoreUtil2.getContainerOfType(context.getCurrentModel(), PhaseModel.class);
    }
}
