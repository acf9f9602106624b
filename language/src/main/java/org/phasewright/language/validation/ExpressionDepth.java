package org.phasewright.language.validation;

import java.util.ArrayList;
import java.util.Collections;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.eclipse.emf.common.util.TreeIterator;
import org.eclipse.emf.ecore.EObject;
import org.phasewright.language.phase.Expression;

/**
 * Guards every recursive walk over expressions (validation, unit inference, lowering, differentiation, code
 * generation) against stack overflow: an expression nested deeper than {@link #MAX_DEPTH} levels is an error at its
 * start, and the other checks do not run on such a model. Depth counts every operator, call, negation and
 * parenthesised group between the outermost expression and a leaf, so a sum of 300 terms is 300 levels deep
 * (sums associate to the left). A model at the limit is checked, compiled and run on an ordinary thread stack in
 * the tests ({@code CrasherCorpusTest}); see docs/reliability.md.
 */
public final class ExpressionDepth {
    /** Generous for hand-written and generated models; {@code let} splits a longer sum. */
    public static final int MAX_DEPTH = 400;
    public static final String TOO_DEEP = "org.phasewright.language.expressionTooDeep";

    private ExpressionDepth() {
    }

    /** The outermost expressions that hold a part nested deeper than {@link #MAX_DEPTH}; never recursive. */
    public static List<Expression> tooDeep(EObject root) {
        Set<Expression> found = Collections.newSetFromMap(new IdentityHashMap<>());
        Map<EObject, Integer> depth = new IdentityHashMap<>();
        TreeIterator<EObject> all = root.eAllContents();
        while (all.hasNext()) {
            EObject next = all.next();
            if (!(next instanceof Expression e)) {
                continue;
            }
            Integer above = depth.get(e.eContainer());
            int d = above == null ? 1 : above + 1;
            if (d > MAX_DEPTH) {
                // Only nodes exactly one level too deep get here (their subtrees are pruned); the walk up is
                // MAX_DEPTH steps.
                EObject outermost = e;
                while (outermost.eContainer() instanceof Expression parent) {
                    outermost = parent;
                }
                found.add((Expression) outermost);
                all.prune();
                continue;
            }
            depth.put(e, d);
        }
        return new ArrayList<>(found);
    }

    static String message(Expression e) {
        return "This expression is nested more than " + MAX_DEPTH
                + " levels deep (parentheses, operators, calls); split it into several `let` declarations.";
    }
}
