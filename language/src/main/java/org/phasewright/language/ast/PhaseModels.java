package org.phasewright.language.ast;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.EcoreUtil2;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.Member;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.RateDecl;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StudyDecl;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.SymbolRef;
import org.phasewright.language.phase.SymmetryDecl;
import org.phasewright.language.phase.TimeDecl;

/** Typed, declaration-ordered views of a parsed model, shared by validation and lowering. */
public final class PhaseModels {
    private PhaseModels() {
    }

    public static List<StateDecl> states(PhaseModel model) {
        return membersOf(model, StateDecl.class);
    }

    public static List<ParamDecl> params(PhaseModel model) {
        return membersOf(model, ParamDecl.class);
    }

    public static List<LetDecl> lets(PhaseModel model) {
        return membersOf(model, LetDecl.class);
    }

    public static List<RateDecl> rates(PhaseModel model) {
        return membersOf(model, RateDecl.class);
    }

    public static List<SymmetryDecl> symmetries(PhaseModel model) {
        return membersOf(model, SymmetryDecl.class);
    }

    public static List<StudyDecl> studies(PhaseModel model) {
        return membersOf(model, StudyDecl.class);
    }

    public static List<TimeDecl> timeDecls(PhaseModel model) {
        return membersOf(model, TimeDecl.class);
    }

    /** The name of the time variable: the declared one, or "t". */
    public static String timeName(PhaseModel model) {
        List<TimeDecl> times = timeDecls(model);
        return times.isEmpty() || times.get(0).getName() == null ? "t" : times.get(0).getName();
    }

    public static <T extends Member> List<T> membersOf(PhaseModel model, Class<T> type) {
        List<T> result = new ArrayList<>();
        for (Member member : model.getMembers()) {
            if (type.isInstance(member)) {
                result.add(type.cast(member));
            }
        }
        return result;
    }

    /** The resolved symbols an expression (or any subtree) refers to, in order of first appearance. */
    public static Set<Symbol> referencedSymbols(EObject root) {
        Set<Symbol> symbols = new LinkedHashSet<>();
        if (root == null) {
            return symbols;
        }
        List<SymbolRef> refs = EcoreUtil2.getAllContentsOfType(root, SymbolRef.class);
        if (root instanceof SymbolRef self) {
            refs = new ArrayList<>(refs);
            refs.add(0, self);
        }
        for (SymbolRef ref : refs) {
            Symbol symbol = ref.getSymbol();
            if (symbol != null && !symbol.eIsProxy()) {
                symbols.add(symbol);
            }
        }
        return symbols;
    }

    /** The kind of a symbol in the words used by messages: "state", "param", "let", "index" or "time". */
    public static String kindWord(Symbol symbol) {
        if (symbol instanceof org.phasewright.language.phase.IndexDecl) {
            return "index";
        }
        if (symbol instanceof StateDecl) {
            return "state";
        }
        if (symbol instanceof ParamDecl) {
            return "param";
        }
        if (symbol instanceof LetDecl) {
            return "let";
        }
        return "time";
    }

    /** The kind with its article, for "'x' is ...": "a state", "an index". */
    public static String aKind(Symbol symbol) {
        String kind = kindWord(symbol);
        return (kind.equals("index") ? "an " : "a ") + kind;
    }

    public static boolean isExpressionRoot(Expression expression) {
        return !(expression.eContainer() instanceof Expression);
    }
}
