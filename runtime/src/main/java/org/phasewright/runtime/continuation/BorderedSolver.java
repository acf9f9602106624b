package org.phasewright.runtime.continuation;

import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.linalg.SparseLu;
import org.phasewright.runtime.linalg.SparseMatrix;
import org.phasewright.runtime.linalg.SparseOrdering;
import org.phasewright.runtime.linalg.SparsePattern;

/**
 * The bordered matrix [H_x(x); rᵀ] = [f_u f_λ; rᵀ] of the continuation, (n+1)×(n+1): factored at a point, then
 * solved with and tested. Small models take a dense LU; large ones a sparse LU whose dense last row and column are
 * eliminated last, so they add O(n) entries instead of filling the factors.
 */
interface BorderedSolver {
    /** Factors [H_x(x); lastRowᵀ]; false when it is (numerically) singular. */
    boolean factor(double[] x, double[] lastRow);

    /** Solves in place after a successful {@link #factor}. */
    void solve(double[] b);

    /**
     * A value with the sign of det [H_x; rᵀ] after {@link #factor} (0 when it failed): the determinant itself for a
     * dense matrix, ±1 for a sparse one (whose determinant over- or underflows).
     */
    double determinantTest();

    static BorderedSolver of(AugmentedSystem system) {
        return system.sparse() ? new Sparse(system) : new Dense(system);
    }

    /** Dense LU of the whole bordered matrix. */
    final class Dense implements BorderedSolver {
        private final AugmentedSystem system;
        private final int n;
        private final double[] hx;
        private SquareSolve lu;

        Dense(AugmentedSystem system) {
            this.system = system;
            this.n = system.dimension();
            this.hx = new double[n * (n + 1)];
        }

        @Override
        public boolean factor(double[] x, double[] lastRow) {
            system.jacobian(x, hx);
            lu = new SquareSolve(SquareSolve.bordered(hx, n, lastRow), n + 1);
            return !lu.singular();
        }

        @Override
        public void solve(double[] b) {
            lu.solve(b);
        }

        @Override
        public double determinantTest() {
            return lu == null || lu.singular() ? 0 : lu.determinant();
        }
    }

    /** Sparse LU: f_u's pattern, the column f_λ and the row rᵀ, in reverse Cuthill–McKee order with the border last. */
    final class Sparse implements BorderedSolver {
        private final AugmentedSystem system;
        private final int n;
        private final SparseMatrix jacobian, bordered;
        private final int[] jacobianSlots; // slot in the bordered pattern of each slot of f_u
        private final double[] column;
        private final SparseLu lu;
        private boolean factored;
        /**
         * The last row is multiplied by this (the size of f_u over the size of r): a unit tangent row next to large
         * or tiny f_u entries would win pivots and fill the factors. A positive factor keeps the determinant's sign.
         */
        private double rowScale = 1;

        Sparse(AugmentedSystem system) {
            this.system = system;
            this.n = system.dimension();
            SparseJacobian sparse = system.field().sparseJacobian();
            if (sparse == null) {
                throw new IllegalArgumentException("a large model without a sparse Jacobian");
            }
            jacobian = sparse.newMatrix();
            SparsePattern f = jacobian.pattern();
            int[] start = new int[n + 2];
            int[] columns = new int[f.nonZeros() + 2 * n + 1];
            jacobianSlots = new int[f.nonZeros()];
            int next = 0;
            for (int i = 0; i < n; i++) {
                start[i] = next;
                for (int k = f.rowStart(i); k < f.rowEnd(i); k++) {
                    jacobianSlots[k] = next;
                    columns[next++] = f.column(k);
                }
                columns[next++] = n; // f_λ
            }
            start[n] = next;
            for (int j = 0; j <= n; j++) {
                columns[next++] = j; // rᵀ
            }
            start[n + 1] = next;
            bordered = new SparseMatrix(new SparsePattern(n + 1, start, columns));
            int[] order = new int[n + 1];
            System.arraycopy(SparseOrdering.reverseCuthillMcKee(f), 0, order, 0, n);
            order[n] = n;
            lu = new SparseLu(bordered.pattern(), order);
            column = new double[n];
        }

        @Override
        public boolean factor(double[] x, double[] lastRow) {
            system.sparseStateJacobian(x, jacobian);
            system.parameterColumn(x, column);
            double[] values = bordered.values();
            SparsePattern p = bordered.pattern();
            double[] fu = jacobian.values();
            for (int k = 0; k < fu.length; k++) {
                values[jacobianSlots[k]] = fu[k];
            }
            for (int i = 0; i < n; i++) {
                values[p.rowEnd(i) - 1] = column[i];
            }
            double big = 0, row = 0;
            for (int k = 0; k < fu.length; k++) {
                big = Math.max(big, Math.abs(fu[k]));
            }
            for (double r : lastRow) {
                row = Math.max(row, Math.abs(r));
            }
            rowScale = big > 0 && row > 0 ? big / row : 1;
            for (int j = 0; j <= n; j++) {
                values[p.rowStart(n) + j] = rowScale * lastRow[j];
            }
            factored = lu.factor(bordered);
            return factored;
        }

        @Override
        public void solve(double[] b) {
            b[n] *= rowScale; // the last equation was scaled with its row
            lu.solve(b);
        }

        @Override
        public double determinantTest() {
            return factored ? lu.determinantSign() : 0;
        }
    }
}
