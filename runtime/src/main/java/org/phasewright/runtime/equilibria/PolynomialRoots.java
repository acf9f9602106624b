package org.phasewright.runtime.equilibria;

import java.util.List;
import java.util.Optional;
import java.util.function.BooleanSupplier;

import org.phasewright.runtime.model.DynamicalModel;

/**
 * Entry point for equilibria of polynomial rate laws: recognises them and runs total-degree homotopy continuation,
 * whose real roots then seed Newton's method (which polishes and classifies them like any other start).
 */
public final class PolynomialRoots {
    /** Largest Bézout number (paths) tracked; beyond it the search relies on Newton's method alone. */
    public static final int MAX_PATHS = 4096; // twelve quadratic rate laws: measured 1.2 s (n = 10) to 10 s (n = 12)

    /**
     * @param paths  paths followed (the Bézout number when complete)
     * @param finite paths ending at finite roots
     * @param real   finite roots with zero imaginary part
     */
    public record Summary(int bezoutNumber, int paths, int finite, int real, List<double[]> realRoots,
            boolean complete) {
        public String message() {
            return "homotopy: " + paths + (complete ? "" : " of " + bezoutNumber) + " paths, " + finite
                    + " finite, " + real + " real";
        }
    }

    private PolynomialRoots() {
    }

    /** Empty when a rate is not a polynomial in the states or the Bézout number is above {@link #MAX_PATHS}. */
    public static Optional<Summary> find(DynamicalModel model, double[] parameters, long deadlineNanos,
            BooleanSupplier cancelled) {
        Optional<Polynomial[]> system = Polynomial.of(model, parameters);
        if (system.isEmpty() || model.dimension() == 0) {
            return Optional.empty();
        }
        long bezout = TotalDegreeHomotopy.bezout(system.get());
        if (bezout > MAX_PATHS) {
            return Optional.empty();
        }
        TotalDegreeHomotopy.Result r = new TotalDegreeHomotopy(system.get()).solve(deadlineNanos, cancelled);
        return Optional.of(new Summary((int) bezout, r.paths(), r.finite(), r.real(), r.realRoots(), r.complete()));
    }
}
