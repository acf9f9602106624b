package org.phasewright.runtime.symbolic;

import org.phasewright.runtime.model.Expr;

/** The one error for an indexed form met where only scalar expressions belong (a bug, not a user mistake). */
public final class IndexedForms {
    private IndexedForms() {
    }

    public static IllegalArgumentException unexpanded(String where, Expr e) {
        return new IllegalArgumentException(where + " needs scalar expressions; expand indexed forms first "
                + "(IndexExpansion): " + e);
    }
}
