package org.phasewright.runtime.equilibria;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.linalg.SparseMatrix;

/**
 * Finds the equilibria f(x) = 0 reachable by Newton's method from a set of starts, removes duplicates, and
 * classifies each by the eigenvalues of the exact Jacobian. Only meaningful for autonomous models (evaluated at t = 0).
 * Fields that work sparse ({@link VectorField#large()}) take sparse Newton steps; above
 * {@link SparseJacobian#DENSE_LIMIT} states their equilibria are classified from the sparse Jacobian (see
 * {@link LinearStability#ofSparse}), below it the dense Jacobian is assembled from the sparse one.
 * Results are sorted by coordinates and named E1, E2, ...; the same model and starts give the same answer.
 */
public final class EquilibriumFinder {
    /** Starts re-run with deflation after the plain pass. */
    static final int DEFLATION_RESTARTS = 20;

    private final VectorField field;
    private final double[] parameters;
    private final EquilibriumSettings settings;

    public EquilibriumFinder(VectorField field, double[] parameters, EquilibriumSettings settings) {
        this.field = field;
        this.parameters = parameters.clone();
        this.settings = settings;
    }

    /**
     * @param deadlineNanos {@link System#nanoTime()} at which to stop, or {@link Long#MAX_VALUE}
     */
    public EquilibriumSearchOutcome find(StartPoints starts, long deadlineNanos, BooleanSupplier cancelled) {
        int n = field.dimension();
        double[] scales = starts.scales();
        NewtonSolver newton = new NewtonSolver(field, parameters, scales, settings);
        // Each dense iteration costs an n×n factorisation (~n³ operations): cap the total near 5e9 operations so a
        // large system gets fewer iterations instead of running for hours. A sparse iteration costs about as much
        // as a few rate evaluations, so the settings alone limit it.
        long budget = newton.sparse() ? settings.maxTotalIterations()
                : Math.min(settings.maxTotalIterations(), Math.max(20L, (long) (5e9 / Math.pow(n + 1, 3))));
        List<double[]> roots = new ArrayList<>();
        List<Double> residuals = new ArrayList<>();
        long iterations = 0;
        int tried = 0, converged = 0;
        EquilibriumSearchOutcome.Ending ending = EquilibriumSearchOutcome.Ending.COMPLETED;
        for (double[] start : starts.points()) {
            if (cancelled.getAsBoolean()) {
                ending = EquilibriumSearchOutcome.Ending.CANCELLED;
                break;
            }
            if (deadlineNanos != Long.MAX_VALUE && System.nanoTime() - deadlineNanos > 0) {
                ending = EquilibriumSearchOutcome.Ending.TIME_LIMIT;
                break;
            }
            if (iterations >= budget) {
                ending = EquilibriumSearchOutcome.Ending.WORK_LIMIT;
                break;
            }
            tried++;
            boolean ok = newton.solve(start, (int) Math.min(settings.maxNewtonIterations(), budget - iterations));
            iterations += newton.iterations;
            if (ok) {
                converged++;
                if (roots.stream().noneMatch(r -> same(r, newton.x, scales))) {
                    roots.add(newton.x.clone());
                    residuals.add(newton.residual);
                }
            }
        }
        // Deflation pass: restart from the first starts with every root found so far deflated, so Newton is pushed
        // to roots the plain pass missed (the found roots cannot attract it any more).
        if (ending == EquilibriumSearchOutcome.Ending.COMPLETED && !roots.isEmpty()) {
            List<double[]> known = new ArrayList<>(roots);
            newton.deflate(known);
            int restarts = Math.min(DEFLATION_RESTARTS, starts.points().size());
            for (int k = 0; k < restarts && iterations < budget; k++) {
                if (cancelled.getAsBoolean()
                        || (deadlineNanos != Long.MAX_VALUE && System.nanoTime() - deadlineNanos > 0)) {
                    break;
                }
                tried++;
                boolean ok = newton.solve(starts.points().get(k),
                        (int) Math.min(settings.maxNewtonIterations(), budget - iterations));
                iterations += newton.iterations;
                if (ok && roots.stream().noneMatch(r -> same(r, newton.x, scales))) {
                    converged++;
                    roots.add(newton.x.clone());
                    residuals.add(newton.residual);
                    known.add(newton.x.clone());
                }
            }
            newton.deflate(List.of());
        }
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < roots.size(); i++) {
            order.add(i);
        }
        order.sort(Comparator.comparing(i -> roots.get(i), EquilibriumFinder::lexicographic));
        List<Equilibrium> equilibria = new ArrayList<>();
        double[] jac = n > SparseJacobian.DENSE_LIMIT ? null : new double[n * n];
        SparseJacobian sparse = jac == null ? field.sparseJacobian() : null;
        for (int k = 0; k < order.size(); k++) {
            double[] x = roots.get(order.get(k));
            LinearStability stability;
            if (sparse != null) { // n² entries and an n³ eigen-solver are out of reach: the sparse spectrum instead
                SparseMatrix m = sparse.newMatrix();
                sparse.values(0.0, x, parameters, m.values());
                stability = LinearStability.ofSparse(m, settings.eigenTolerance(), () -> cancelled.getAsBoolean()
                        || (deadlineNanos != Long.MAX_VALUE && System.nanoTime() - deadlineNanos > 0));
            } else if (jac == null) {
                stability = LinearStability.notClassified(n);
            } else {
                denseJacobian(x, jac);
                stability = LinearStability.of(jac, n, settings.eigenTolerance());
            }
            equilibria.add(new Equilibrium("E" + (k + 1), x, stability.real(), stability.imaginary(),
                    stability.classification(), residuals.get(order.get(k))));
        }
        return new EquilibriumSearchOutcome(ending, equilibria, tried, converged, iterations);
    }

    /** The dense Jacobian at x; from the sparse one when the field works sparse (it may have no dense form). */
    private void denseJacobian(double[] x, double[] jac) {
        SparseJacobian sparse = field.large() ? field.sparseJacobian() : null;
        if (sparse == null) {
            field.jacobian(0.0, x, parameters, jac);
            return;
        }
        SparseMatrix m = sparse.newMatrix();
        sparse.values(0.0, x, parameters, m.values());
        int n = field.dimension();
        java.util.Arrays.fill(jac, 0.0);
        for (int i = 0; i < n; i++) {
            for (int k = m.pattern().rowStart(i); k < m.pattern().rowEnd(i); k++) {
                jac[i * n + m.pattern().column(k)] = m.values()[k];
            }
        }
    }

    private boolean same(double[] a, double[] b, double[] scales) {
        for (int i = 0; i < a.length; i++) {
            double s = Math.abs(a[i]) + Math.abs(b[i]) + scales[i];
            if (Math.abs(a[i] - b[i]) > settings.duplicateTolerance() * s) {
                return false;
            }
        }
        return true;
    }

    private static int lexicographic(double[] a, double[] b) {
        for (int i = 0; i < a.length; i++) {
            int c = Double.compare(a[i] + 0.0, b[i] + 0.0); // + 0.0 turns -0.0 into 0.0
            if (c != 0) {
                return c;
            }
        }
        return 0;
    }
}
