package org.phasewright.runtime.compile;

import java.util.Arrays;
import org.phasewright.runtime.linalg.SparsePattern;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.References;

/**
 * The Jacobian pattern read from each expanded rate, for laws that do not reduce to blocks (sums, bounded derived
 * elements that may fall outside their range): slower, but any model; null beyond the nonzero limit.
 */
final class ExpandedPattern {
    private ExpandedPattern() {
    }

    /** The pattern from each expanded rate, derived quantities followed through their (memoised) state sets. */
    static SparsePattern of(DynamicalModel model) {
        int n = model.dimension();
        int[][] derivedStates = new int[model.derived().size()][];
        int[] rowStart = new int[n + 1];
        int[] columns = new int[Math.max(16, 4 * n)];
        int nnz = 0;
        for (int i = 0; i < n; i++) {
            rowStart[i] = nnz;
            int[] row = states(model.rates().get(i), model, derivedStates);
            if (nnz + (long) row.length > SparseJacobianStructure.MAX_NONZEROS) {
                return null;
            }
            if (nnz + row.length > columns.length) {
                long grown = Math.max(2L * columns.length, nnz + row.length);
                columns = Arrays.copyOf(columns, (int) Math.min(SparseJacobianStructure.MAX_NONZEROS, grown));
            }
            System.arraycopy(row, 0, columns, nnz, row.length);
            nnz += row.length;
        }
        rowStart[n] = nnz;
        return new SparsePattern(n, rowStart, Arrays.copyOf(columns, nnz));
    }

    private static int[] states(Expr e, DynamicalModel model, int[][] derivedStates) {
        java.util.TreeSet<Integer> set = new java.util.TreeSet<>();
        References.forEach(e, v -> {
            if (v.kind() == VariableKind.STATE) {
                set.add(v.index());
            } else if (v.kind() == VariableKind.DERIVED) {
                int k = v.index();
                if (derivedStates[k] == null) {
                    derivedStates[k] = states(model.derived().get(k).definition(), model, derivedStates);
                }
                for (int s : derivedStates[k]) {
                    set.add(s);
                }
            }
        });
        return set.stream().mapToInt(Integer::intValue).toArray();
    }
}
