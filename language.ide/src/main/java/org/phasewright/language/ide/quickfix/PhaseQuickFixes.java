package org.phasewright.language.ide.quickfix;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.nodemodel.ILeafNode;
import org.eclipse.xtext.nodemodel.INode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.eclipse.xtext.resource.XtextResource;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.linking.PhaseLinkingDiagnosticMessageProvider;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.Member;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.PhasePackage;
import org.phasewright.language.phase.RateDecl;
import org.phasewright.language.phase.SimulateRequest;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StateMap;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.validation.IssueCodes;
import org.phasewright.language.ide.text.TextChange;

/**
 * Repairs for the problems the checker reports, as plain text changes. The problem is identified by its issue code
 * and the text range it marks; nothing else is needed, so Eclipse markers and language-server diagnostics both work.
 * <ul>
 * <li>a state without a rate: add `rate NAME = 0` after the last rate (or after the state);</li>
 * <li>an unknown name: change it to a declared name within a small edit distance, or declare it;</li>
 * <li>the wrong time name in a simulation: change it to the model's;</li>
 * <li>a param never used: remove its declaration;</li>
 * <li>an undeclared symmetry the checker found: insert the declaration its message quotes.</li>
 * </ul>
 */
public final class PhaseQuickFixes {
    /** Names further than this from the unknown one are not worth proposing (1 for names of up to 3 letters). */
    private static final int MAX_DISTANCE = 2;
    private static final int MAX_PROPOSALS = 3;

    public List<QuickFix> fixesFor(XtextResource resource, String issueCode, int offset, int length) {
        return fixesFor(resource, issueCode, offset, length, null);
    }

    /** As above; {@code message} is the problem's text, which carries what some fixes insert. */
    public List<QuickFix> fixesFor(XtextResource resource, String issueCode, int offset, int length,
            String message) {
        List<QuickFix> fixes = new ArrayList<>();
        PhaseModel model = modelOf(resource);
        if (issueCode == null || model == null || offset < 0) {
            return fixes;
        }
        String text = resource.getParseResult().getRootNode().getText();
        if (offset + length > text.length()) {
            return fixes;
        }
        String marked = text.substring(offset, offset + length);
        if (issueCode.equals(IssueCodes.MISSING_RATE)) {
            addMissingRate(model, text, marked, offset, fixes);
        } else if (issueCode.equals(PhaseLinkingDiagnosticMessageProvider.UNKNOWN_NAME)) {
            addCloseNames(resource, model, text, marked, offset, length, fixes);
        } else if (issueCode.equals(IssueCodes.WRONG_TIME_NAME)) {
            String time = PhaseModels.timeName(model);
            fixes.add(new QuickFix("Change to '" + time + "'", List.of(new TextChange(offset, length, time))));
        } else if (issueCode.equals(IssueCodes.UNUSED_PARAM)) {
            addRemoveParam(model, text, marked, fixes);
        } else if (issueCode.equals(IssueCodes.SYMMETRY_DISCOVERED) && message != null) {
            addSymmetryDeclaration(model, text, message, fixes);
        }
        return fixes;
    }

    /** The checker quotes the declaration in backticks: "Undeclared symmetry: declare it with `symmetry s1: ...`". */
    private static void addSymmetryDeclaration(PhaseModel model, String text, String message, List<QuickFix> fixes) {
        int open = message.indexOf("`symmetry ");
        int close = open < 0 ? -1 : message.indexOf('`', open + 1);
        if (close < 0) {
            return;
        }
        String declaration = message.substring(open + 1, close);
        List<? extends Member> after = PhaseModels.symmetries(model).isEmpty() ? PhaseModels.rates(model)
                : PhaseModels.symmetries(model);
        int at = after.isEmpty() ? headerEnd(model)
                : NodeModelUtils.getNode(after.get(after.size() - 1)).getEndOffset();
        fixes.add(new QuickFix("Declare '" + declaration + "'",
                List.of(TextChange.insert(endOfLine(text, at), "\n" + declaration))));
    }

    private static void addMissingRate(PhaseModel model, String text, String stateName, int offset,
            List<QuickFix> fixes) {
        List<RateDecl> rates = PhaseModels.rates(model);
        EObject anchor = rates.isEmpty() ? declarationAt(model, offset) : rates.get(rates.size() - 1);
        if (anchor == null) {
            return;
        }
        // a family's rate names its index, as its declaration does: `rate x[i] = 0`
        String target = PhaseModels.states(model).stream()
                .filter(st -> stateName.equals(st.getName()) && st.getIndex() != null && !st.getIndex().eIsProxy())
                .map(st -> stateName + "[" + st.getIndex().getName() + "]").findFirst().orElse(stateName);
        String line = "rate " + target + " = 0";
        fixes.add(new QuickFix("Add '" + line + "'",
                List.of(TextChange.insert(endOfLine(text, NodeModelUtils.getNode(anchor).getEndOffset()), "\n" + line))));
    }

    private static void addCloseNames(XtextResource resource, PhaseModel model, String text, String unknown, int offset,
            int length, List<QuickFix> fixes) {
        Place place = placeOf(resource, offset);
        record Candidate(String name, int distance) {
        }
        List<Candidate> candidates = new ArrayList<>();
        int limit = unknown.length() <= 3 ? 1 : MAX_DISTANCE;
        for (Symbol symbol : PhaseModels.membersOf(model, Symbol.class)) {
            if (symbol.getName() == null || !place.accepts(symbol) || symbol.getName().equals(unknown)) {
                continue;
            }
            int distance = symbol.getName().equalsIgnoreCase(unknown) ? 0
                    : EditDistance.between(unknown, symbol.getName());
            if (distance <= limit) {
                candidates.add(new Candidate(symbol.getName(), distance));
            }
        }
        candidates.stream().distinct()
                .sorted(Comparator.comparingInt(Candidate::distance).thenComparing(Candidate::name))
                .limit(MAX_PROPOSALS)
                .forEach(c -> fixes.add(new QuickFix("Change to '" + c.name() + "'",
                        List.of(new TextChange(offset, length, c.name())))));
        addDeclaration(model, text, unknown, place, fixes);
    }

    /** Declares the unknown name as what its place needs: a state for a rate or symmetry, otherwise a param. */
    private static void addDeclaration(PhaseModel model, String text, String name, Place place,
            List<QuickFix> fixes) {
        if (!name.matches("[A-Za-z_][A-Za-z0-9_]*")) {
            return;
        }
        boolean state = place == Place.STATES;
        List<? extends Member> sameKind = state ? PhaseModels.states(model) : PhaseModels.params(model);
        String line = (state ? "state " : "param ") + name + " = 0";
        int at;
        if (!sameKind.isEmpty()) {
            at = endOfLine(text, NodeModelUtils.getNode(sameKind.get(sameKind.size() - 1)).getEndOffset());
        } else {
            at = endOfLine(text, headerEnd(model));
        }
        fixes.add(new QuickFix("Declare '" + line + "'", List.of(TextChange.insert(at, "\n" + line))));
    }

    private static void addRemoveParam(PhaseModel model, String text, String name, List<QuickFix> fixes) {
        for (ParamDecl param : PhaseModels.params(model)) {
            if (name.equals(param.getName())) {
                INode node = NodeModelUtils.getNode(param);
                int start = node.getOffset();
                int end = node.getEndOffset();
                int lineStart = text.lastIndexOf('\n', start - 1) + 1;
                int newline = text.indexOf('\n', end);
                int lineEnd = newline < 0 ? text.length() : newline + 1;
                boolean aloneOnLine = text.substring(lineStart, start).isBlank()
                        && text.substring(end, lineEnd).isBlank();
                TextChange removal = aloneOnLine
                        ? new TextChange(lineStart, lineEnd - lineStart, "")
                        : new TextChange(start, end - start, "");
                fixes.add(new QuickFix("Remove param '" + name + "'", List.of(removal)));
                return;
            }
        }
    }

    /** Which declarations may stand where the unknown name is written. */
    private enum Place {
        STATES, PARAMS, ANY;

        boolean accepts(Symbol symbol) {
            return switch (this) {
                case STATES -> symbol instanceof StateDecl;
                case PARAMS -> symbol instanceof ParamDecl;
                case ANY -> true;
            };
        }
    }

    private static Place placeOf(XtextResource resource, int offset) {
        ILeafNode leaf = NodeModelUtils.findLeafNodeAtOffset(resource.getParseResult().getRootNode(), offset);
        EObject owner = leaf == null ? null : NodeModelUtils.findActualSemanticObjectFor(leaf);
        if (owner instanceof RateDecl || owner instanceof StateMap) {
            return Place.STATES;
        }
        EObject container = owner;
        while (container instanceof Expression) {
            container = container.eContainer();
        }
        if (container instanceof StateMap) {
            return Place.STATES;
        }
        if (container instanceof ParamDecl || container instanceof StateDecl || container instanceof SimulateRequest) {
            return Place.PARAMS;
        }
        return Place.ANY;
    }

    private static EObject declarationAt(PhaseModel model, int offset) {
        for (Member member : model.getMembers()) {
            INode node = NodeModelUtils.getNode(member);
            if (node != null && node.getOffset() <= offset && offset < node.getEndOffset()) {
                return member;
            }
        }
        return null;
    }

    /** The end of the `model NAME "title"` header. */
    private static int headerEnd(PhaseModel model) {
        PhasePackage phase = PhasePackage.eINSTANCE;
        List<INode> title = NodeModelUtils.findNodesForFeature(model, phase.getPhaseModel_Title());
        List<INode> name = NodeModelUtils.findNodesForFeature(model, phase.getPhaseModel_Name());
        INode last = !title.isEmpty() ? title.get(0) : !name.isEmpty() ? name.get(0) : NodeModelUtils.getNode(model);
        return last.getEndOffset();
    }

    /** The offset of the line break ending the line that contains {@code offset}, or the end of the text. */
    private static int endOfLine(String text, int offset) {
        int newline = text.indexOf('\n', offset);
        int end = newline < 0 ? text.length() : newline;
        return end > 0 && text.charAt(end - 1) == '\r' ? end - 1 : end;
    }

    private static PhaseModel modelOf(XtextResource resource) {
        if (resource == null || resource.getParseResult() == null || resource.getContents().isEmpty()) {
            return null;
        }
        return resource.getContents().get(0) instanceof PhaseModel model ? model : null;
    }
}
