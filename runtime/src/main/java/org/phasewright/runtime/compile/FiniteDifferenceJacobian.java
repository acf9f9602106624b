package org.phasewright.runtime.compile;

import org.phasewright.runtime.linalg.SparsePattern;

/**
 * Sparse Jacobian values by forward differences with column grouping (Curtis, Powell &amp; Reid, J. Inst. Maths
 * Applics 13, 1974): columns that share no row are perturbed together, so a banded or ring Jacobian costs a few
 * rate evaluations whatever its size. Groups come from a greedy colouring in column order. The field is only asked
 * for rates; thread-safe when the field is (work arrays are allocated per call).
 */
final class FiniteDifferenceJacobian implements SparseJacobian {
    private final VectorField field;
    private final SparsePattern pattern;
    private final SparsePattern.Transposed byColumn;
    private final int[] groupStart; // columns of group g: groupColumns[groupStart[g] .. groupStart[g + 1] - 1]
    private final int[] groupColumns;

    FiniteDifferenceJacobian(VectorField field, SparsePattern pattern) {
        this.field = field;
        this.pattern = pattern;
        this.byColumn = pattern.transpose();
        int n = pattern.dimension();
        int[] colour = new int[n];
        int[] seen = new int[n + 1]; // seen[c] == j + 1 when colour c is taken by a neighbour of column j
        int colours = 0;
        int[] cs = byColumn.start(), rows = byColumn.rows();
        for (int j = 0; j < n; j++) {
            for (int p = cs[j]; p < cs[j + 1]; p++) {
                int row = rows[p];
                for (int s = pattern.rowStart(row); s < pattern.rowEnd(row); s++) {
                    int other = pattern.column(s);
                    if (other < j) {
                        seen[colour[other]] = j + 1;
                    }
                }
            }
            int c = 0;
            while (seen[c] == j + 1) {
                c++;
            }
            colour[j] = c;
            colours = Math.max(colours, c + 1);
        }
        groupStart = new int[colours + 1];
        for (int j = 0; j < n; j++) {
            groupStart[colour[j] + 1]++;
        }
        for (int g = 0; g < colours; g++) {
            groupStart[g + 1] += groupStart[g];
        }
        int[] next = java.util.Arrays.copyOf(groupStart, colours);
        groupColumns = new int[n];
        for (int j = 0; j < n; j++) {
            groupColumns[next[colour[j]]++] = j;
        }
    }

    int groups() {
        return groupStart.length - 1;
    }

    @Override
    public SparsePattern pattern() {
        return pattern;
    }

    @Override
    public String method() {
        return "finite differences (" + groups() + " column groups)";
    }

    @Override
    public void values(double t, double[] u, double[] p, double[] values) {
        int n = pattern.dimension();
        double[] f0 = new double[n], f1 = new double[n], shifted = u.clone();
        double[] h = new double[n];
        field.rates(t, u, p, f0);
        int[] cs = byColumn.start(), rows = byColumn.rows(), slot = byColumn.slot();
        double root = Math.sqrt(Math.ulp(1.0));
        for (int g = 0; g + 1 < groupStart.length; g++) {
            for (int m = groupStart[g]; m < groupStart[g + 1]; m++) {
                int j = groupColumns[m];
                double step = root * Math.max(Math.abs(u[j]), 1.0);
                shifted[j] = u[j] + step;
                h[j] = shifted[j] - u[j]; // the step actually represented
            }
            field.rates(t, shifted, p, f1);
            for (int m = groupStart[g]; m < groupStart[g + 1]; m++) {
                int j = groupColumns[m];
                for (int q = cs[j]; q < cs[j + 1]; q++) {
                    values[slot[q]] = (f1[rows[q]] - f0[rows[q]]) / h[j];
                }
                shifted[j] = u[j];
            }
        }
    }
}
