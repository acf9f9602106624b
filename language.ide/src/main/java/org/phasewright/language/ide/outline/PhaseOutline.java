package org.phasewright.language.ide.outline;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.xtext.nodemodel.INode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.eclipse.xtext.resource.XtextResource;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.Analysis;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.Member;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.PhasePackage;
import org.phasewright.language.phase.RateDecl;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StudyDecl;
import org.phasewright.language.phase.SymmetryDecl;
import org.phasewright.language.phase.TimeDecl;
import org.phasewright.language.phase.UnitExpr;

/**
 * The outline of a `.phase` file: the model with its declarations in file order, studies with their analyses. A rate
 * is listed as `dq/dt` (with the model's time name) so it does not read like a second declaration of `q`.
 * Editor-neutral; the language server maps it to document symbols in {@link PhaseDocumentSymbolService}.
 */
public final class PhaseOutline {
    private static final PhasePackage PHASE = PhasePackage.eINSTANCE;

    public Optional<OutlineNode> of(XtextResource resource) {
        if (resource.getContents().isEmpty() || !(resource.getContents().get(0) instanceof PhaseModel model)) {
            return Optional.empty();
        }
        return Optional.ofNullable(of(model));
    }

    public OutlineNode of(PhaseModel model) {
        List<OutlineNode> children = new ArrayList<>();
        String time = PhaseModels.timeName(model);
        for (Member member : model.getMembers()) {
            OutlineNode node = member(member, time);
            if (node != null) {
                children.add(node);
            }
        }
        return node(model, name(model.getName()), OutlineKind.MODEL, model.getTitle(), PHASE.getPhaseModel_Name(),
                children);
    }

    private OutlineNode member(Member member, String time) {
        if (member instanceof TimeDecl decl) {
            return node(decl, decl.getName(), OutlineKind.TIME, unit(decl.getUnit()), PHASE.getSymbol_Name(), List.of());
        }
        if (member instanceof ParamDecl decl) {
            return node(decl, decl.getName(), OutlineKind.PARAM, "= " + text(decl.getValue()) + unit(decl.getUnit()),
                    PHASE.getSymbol_Name(), List.of());
        }
        if (member instanceof StateDecl decl) {
            return node(decl, decl.getName(), OutlineKind.STATE,
                    "initial " + text(decl.getInitial()) + unit(decl.getUnit()), PHASE.getSymbol_Name(), List.of());
        }
        if (member instanceof LetDecl decl) {
            return node(decl, decl.getName(), OutlineKind.LET, "= " + text(decl.getDefinition()) + unit(decl.getUnit()),
                    PHASE.getSymbol_Name(), List.of());
        }
        if (member instanceof RateDecl decl) {
            String target = NodeModelUtils.findNodesForFeature(decl, PHASE.getRateDecl_Target()).stream()
                    .map(NodeModelUtils::getTokenText).findFirst().orElse("?");
            return node(decl, "d" + target + "/d" + time, OutlineKind.RATE, "= " + text(decl.getLaw()),
                    PHASE.getRateDecl_Target(), List.of());
        }
        if (member instanceof SymmetryDecl decl) {
            String maps = String.join(", ", decl.getMaps().stream().map(PhaseOutline::text).toList());
            return node(decl, name(decl.getName()), OutlineKind.SYMMETRY,
                    maps + (decl.isReversesTime() ? " reverses time" : ""), PHASE.getSymmetryDecl_Name(), List.of());
        }
        if (member instanceof StudyDecl decl) {
            List<OutlineNode> analyses = new ArrayList<>();
            for (Analysis analysis : decl.getAnalyses()) {
                analyses.add(node(analysis, text(analysis), OutlineKind.ANALYSIS, null, null, List.of()));
            }
            return node(decl, name(decl.getName()), OutlineKind.STUDY, null, PHASE.getStudyDecl_Name(), analyses);
        }
        return null;
    }

    private static OutlineNode node(EObject object, String name, OutlineKind kind, String detail,
            EStructuralFeature nameFeature, List<OutlineNode> children) {
        INode whole = NodeModelUtils.getNode(object);
        if (whole == null || name == null) {
            return null;
        }
        INode nameNode = nameFeature == null ? whole
                : NodeModelUtils.findNodesForFeature(object, nameFeature).stream().findFirst().orElse(whole);
        return new OutlineNode(name, kind, detail == null || detail.isBlank() ? null : detail, whole.getOffset(),
                whole.getLength(), nameNode.getOffset(), nameNode.getLength(), children);
    }

    private static String name(String name) {
        return name == null || name.isEmpty() ? null : name;
    }

    private static String unit(UnitExpr unit) {
        return unit == null ? "" : " in " + text(unit).replace(" ", "");
    }

    private static String text(EObject element) {
        INode node = element == null ? null : NodeModelUtils.getNode(element);
        String text = node == null ? null : NodeModelUtils.getTokenText(node);
        return text == null ? "?" : text;
    }
}
