package org.phasewright.language.ast;

import org.eclipse.emf.ecore.EObject;
import org.phasewright.language.phase.IndexDecl;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.RateDecl;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StateMap;
import org.phasewright.language.phase.SumExpr;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.SymbolRef;
import org.phasewright.language.phase.TimeDecl;
import org.phasewright.language.phase.UnitExpr;

/** Indexed declarations: which symbols are families, and which index a place in the text binds. */
public final class Families {
    private Families() {
    }

    /** The index a state, param or let family is declared over; null for scalars, time and indices. */
    public static IndexDecl indexOf(Symbol symbol) {
        if (symbol instanceof StateDecl s) {
            return s.getIndex();
        }
        if (symbol instanceof ParamDecl p) {
            return p.getIndex();
        }
        if (symbol instanceof LetDecl l) {
            return l.getIndex();
        }
        return null;
    }

    public static boolean isFamily(Symbol symbol) {
        return indexOf(symbol) != null;
    }

    /** The declared unit of a symbol, or null (indices have none: their values are plain numbers). */
    public static UnitExpr unitOf(Symbol symbol) {
        if (symbol instanceof StateDecl s) {
            return s.getUnit();
        }
        if (symbol instanceof ParamDecl p) {
            return p.getUnit();
        }
        if (symbol instanceof LetDecl l) {
            return l.getUnit();
        }
        if (symbol instanceof TimeDecl t) {
            return t.getUnit();
        }
        return null;
    }

    /**
     * The place that binds {@code index} around {@code node}: the nearest enclosing sum over it, or the family
     * declaration, family rate or family symmetry map over it; null when nothing there binds it. Subscripts of
     * elements are inside their expression, so they see the same bindings.
     */
    public static EObject binder(EObject node, IndexDecl index) {
        for (EObject at = node; at != null; at = at.eContainer()) {
            IndexDecl bound = boundBy(at);
            if (bound != null && bound == index) {
                return at;
            }
        }
        return null;
    }

    /** The index {@code place} binds for its contents, or null. */
    public static IndexDecl boundBy(EObject place) {
        if (place instanceof SumExpr sum) {
            return sum.getIndex();
        }
        if (place instanceof RateDecl rate) {
            return rate.getIndex();
        }
        if (place instanceof StateMap map) {
            return map.getIndex();
        }
        if (place instanceof Symbol symbol) {
            return indexOf(symbol);
        }
        return null;
    }

    /** True when {@code ref} lies inside the subscript of an element (index arithmetic). */
    public static boolean inSubscript(EObject node) {
        for (EObject at = node; at != null && at.eContainer() != null; at = at.eContainer()) {
            if (at.eContainer() instanceof SymbolRef outer && outer.getSubscript() == at) {
                return true;
            }
        }
        return false;
    }
}
