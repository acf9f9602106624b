package org.phasewright.language.ide.highlighting;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.xtext.AbstractRule;
import org.eclipse.xtext.Assignment;
import org.eclipse.xtext.CrossReference;
import org.eclipse.xtext.GrammarUtil;
import org.eclipse.xtext.Keyword;
import org.eclipse.xtext.RuleCall;
import org.eclipse.xtext.nodemodel.ILeafNode;
import org.eclipse.xtext.nodemodel.INode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.eclipse.xtext.resource.XtextResource;
import org.phasewright.language.phase.FunctionCall;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.SimulateRequest;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StudyDecl;
import org.phasewright.language.phase.SymmetryDecl;
import org.phasewright.language.phase.TimeDecl;
import org.phasewright.language.phase.UnitFactor;
import org.phasewright.runtime.model.MathFunction;

/**
 * Classifies every token of a parsed `.phase` file, lexical (keywords, numbers, comments) and semantic (which kind of
 * declaration a name refers to). Editor-neutral: the Eclipse plugin colours with it directly and the language server
 * turns it into semantic tokens. Unknown names and unknown functions stay unclassified, so they do not look valid.
 */
public final class SemanticClassifier {

    /** All classified tokens of the resource, in document order. */
    public List<SemanticRegion> classify(XtextResource resource) {
        List<SemanticRegion> regions = new ArrayList<>();
        if (resource == null || resource.getParseResult() == null || resource.getParseResult().getRootNode() == null) {
            return regions;
        }
        for (ILeafNode leaf : resource.getParseResult().getRootNode().getLeafNodes()) {
            if (leaf.getLength() == 0) {
                continue;
            }
            SemanticRegion region = classify(leaf);
            if (region != null) {
                regions.add(region);
            }
        }
        return regions;
    }

    private SemanticRegion classify(ILeafNode leaf) {
        EObject grammarElement = leaf.getGrammarElement();
        if (leaf.isHidden()) {
            return grammarElement instanceof AbstractRule rule && rule.getName().endsWith("COMMENT")
                    ? region(leaf, SemanticKind.COMMENT, false)
                    : null;
        }
        if (grammarElement instanceof Keyword keyword) {
            return region(leaf, keywordKind(keyword.getValue()), false);
        }
        if (grammarElement instanceof CrossReference reference) {
            return classifyReference(leaf, reference);
        }
        if (!(grammarElement instanceof RuleCall call)) {
            return null;
        }
        String terminal = call.getRule().getName();
        switch (terminal) {
            case "STRING":
                return region(leaf, SemanticKind.STRING, false);
            case "INT", "DECIMAL": {
                Assignment assignment = GrammarUtil.containingAssignment(call);
                boolean dimensionless = assignment != null && "one".equals(assignment.getFeature());
                return region(leaf, dimensionless ? SemanticKind.UNIT : SemanticKind.NUMBER, false);
            }
            case "ID":
                return classifyName(leaf, call);
            default:
                return null;
        }
    }

    private static SemanticKind keywordKind(String value) {
        if (value.equals("pi")) {
            return SemanticKind.CONSTANT;
        }
        return Character.isLetter(value.charAt(0)) ? SemanticKind.KEYWORD : SemanticKind.OPERATOR;
    }

    /** A use of a declared name: coloured as what it refers to; unresolved names stay plain. */
    private SemanticRegion classifyReference(ILeafNode leaf, CrossReference reference) {
        EObject target = referenceTarget(leaf, reference);
        SemanticKind kind = target == null ? null : kindOf(target);
        return kind == null ? null : region(leaf, kind, false);
    }

    /** The resolved declaration a cross-reference leaf points to, or null. */
    public static EObject referenceTarget(ILeafNode leaf, CrossReference reference) {
        EObject owner = NodeModelUtils.findActualSemanticObjectFor(leaf);
        Assignment assignment = GrammarUtil.containingAssignment(reference);
        if (owner == null || assignment == null) {
            return null;
        }
        EStructuralFeature feature = owner.eClass().getEStructuralFeature(assignment.getFeature());
        Object target = feature == null ? null : owner.eGet(feature, true);
        return target instanceof EObject resolved && !resolved.eIsProxy() ? resolved : null;
    }

    private SemanticRegion classifyName(ILeafNode leaf, RuleCall call) {
        EObject owner = NodeModelUtils.findActualSemanticObjectFor(leaf);
        Assignment assignment = GrammarUtil.containingAssignment(call);
        if (owner == null || assignment == null) {
            return null;
        }
        if (owner instanceof UnitFactor) {
            return region(leaf, SemanticKind.UNIT, false);
        }
        switch (assignment.getFeature()) {
            case "name": {
                SemanticKind kind = kindOf(owner);
                return kind == null ? null : region(leaf, kind, true);
            }
            case "function":
                return owner instanceof FunctionCall fc && MathFunction.byNotationName(fc.getFunction()).isPresent()
                        ? region(leaf, SemanticKind.FUNCTION, false)
                        : null;
            case "timeName":
                return owner instanceof SimulateRequest ? region(leaf, SemanticKind.TIME, false) : null;
            default:
                return null;
        }
    }

    /** The kind of a declaration, or null for anything that is not one. */
    public static SemanticKind kindOf(EObject declaration) {
        if (declaration instanceof StateDecl) {
            return SemanticKind.STATE;
        }
        if (declaration instanceof ParamDecl) {
            return SemanticKind.PARAM;
        }
        if (declaration instanceof LetDecl) {
            return SemanticKind.LET;
        }
        if (declaration instanceof TimeDecl) {
            return SemanticKind.TIME;
        }
        if (declaration instanceof PhaseModel) {
            return SemanticKind.MODEL;
        }
        if (declaration instanceof SymmetryDecl) {
            return SemanticKind.SYMMETRY;
        }
        if (declaration instanceof StudyDecl) {
            return SemanticKind.STUDY;
        }
        return null;
    }

    private static SemanticRegion region(INode node, SemanticKind kind, boolean declaration) {
        return new SemanticRegion(node.getOffset(), node.getLength(), kind, declaration);
    }
}
