package org.phasewright.runtime.linalg;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * The rightmost eigenvalues of a large sparse real matrix J, enough to decide the stability of an equilibrium
 * without the n³ dense eigen-solver: Arnoldi with thick restarts on the Cayley transform
 * C = (J − σI)⁻¹(J + σI) = I + 2σ(J − σI)⁻¹, which maps eigenvalues λ of J to μ = (λ + σ)/(λ − σ). For any σ &gt; 0
 * the right half-plane goes outside the unit circle and the left half-plane inside it (Meerbergen, Spence &amp; Roose,
 * BIT 34, 1994), so the eigenvalues of C of largest modulus are the unstable eigenvalues of J and, after them, stable
 * ones near the imaginary axis (near in proportion to σ: the list is close to, not exactly, the order of real parts).
 * <p>
 * σ is tried at 1.5 times the Gershgorin bound of J (every λ maps to a finite μ and eigenvalues far out in the left
 * half-plane map near μ = 0), then at smaller fractions of it, which spread the eigenvalues near zero of spectra that
 * span many orders of magnitude (diffusion on fine grids) apart again. The restart keeps an orthonormal basis of the
 * wanted Ritz vectors as the start of the next Krylov decomposition (Stewart's Krylov–Schur restart, SIAM J. Matrix
 * Anal. Appl. 23, 2001, without reordering a Schur form). When the Krylov space becomes invariant, a new start vector
 * orthogonal to it continues the basis, so exactly repeated eigenvalues are not taken for single ones. One sparse LU
 * factorisation of J − σI serves every product with C.
 */
public final class RightmostEigenvalues {
    /** Eigenvalues sought (a complex pair may add one): enough to count a few unstable directions. */
    public static final int WANTED = 12;
    /** Krylov basis size; above {@link #LARGE} states a smaller one keeps the basis near 200 MB. */
    private static final int BASIS = 40, SMALL_BASIS = 26, LARGE = 500_000;
    private static final int MAX_RESTARTS = 100;
    /** Flops allowed per pole tried: about 4·n·BASIS² per restart for orthogonalisation, plus the sparse solves. */
    private static final double WORK = 2e9;
    /** Poles σ tried in turn, as multiples of the Gershgorin bound, until the wanted Ritz values converge. */
    private static final double[] POLES = {1.5, 0.03, 0.001};
    /** A Ritz pair of C has converged when its residual is below this times |μ|. */
    private static final double RESIDUAL = 1e-10;

    /**
     * The eigenvalues found, real parts largest first (a complex pair as +b then −b): those of largest |μ| under
     * the last pole tried, without gaps.
     *
     * @param converged    false when the wanted Ritz values did not all settle within the work limit; the
     *                     eigenvalues are then the leading ones that did
     * @param allUnstable  true when the eigenvalues found include every eigenvalue of real part ≥ −zeroTolerance:
     *                     some eigenvalue found has real part below −zeroTolerance, and all others of J map to
     *                     smaller |μ| still
     * @param scale        the Gershgorin bound of J (max row sum of |J_ij|), the size the eigenvalues are measured by
     */
    public record Result(double[] real, double[] imaginary, boolean converged, boolean allUnstable, double scale) {
    }

    private RightmostEigenvalues() {
    }

    /**
     * The rightmost eigenvalues of j; null when J − σI cannot be factored for any pole, J has entries that are not
     * finite, or {@code stop} says so (checked between restarts).
     *
     * @param zeroTolerance real parts within this of 0 count as zero (absolute)
     */
    public static Result of(SparseMatrix j, double zeroTolerance, BooleanSupplier stop) {
        return of(j, zeroTolerance, stop, null);
    }

    /**
     * What one call leaves for the next on a similar matrix (the points of a continuation branch): the pole that
     * converged, tried first, and the sum of the wanted Ritz vectors, the next start vector. Not thread-safe.
     */
    public static final class Memory {
        private double pole;
        private double[] start;
    }

    /** As {@link #of(SparseMatrix, double, BooleanSupplier)}, starting from what {@code memory} holds (may be null). */
    public static Result of(SparseMatrix j, double zeroTolerance, BooleanSupplier stop, Memory memory) {
        int n = j.dimension();
        if (!j.allFinite()) {
            return null;
        }
        double radius = j.weightedRowNorm(null); // the Gershgorin bound: max_i Σ_j |J_ij|
        if (radius == 0) { // the zero matrix: every eigenvalue is 0
            return new Result(new double[Math.min(n, WANTED)], new double[Math.min(n, WANTED)], true, false, 0);
        }
        Result best = null;
        double[] poles = POLES;
        if (memory != null && memory.pole > 0) { // the remembered pole first, then the others in their order
            poles = new double[POLES.length];
            poles[0] = memory.pole;
            int k = 1;
            for (double pole : POLES) {
                if (pole != memory.pole && k < poles.length) {
                    poles[k++] = pole;
                }
            }
        }
        double[] start = memory != null && memory.start != null && memory.start.length == n ? memory.start : null;
        for (double pole : poles) {
            double sigma = pole * radius;
            SparseMatrix shifted = shifted(j, sigma);
            SparseLu lu = new SparseLu(shifted.pattern());
            if (!lu.factor(shifted)) {
                continue; // σ is (numerically) an eigenvalue: try the next pole
            }
            Arnoldi arnoldi = new Arnoldi(n, lu, sigma, radius, zeroTolerance, stop, start);
            Result r = arnoldi.run();
            if (r == null) {
                return null; // stopped
            }
            if (r.converged()) {
                if (memory != null) {
                    memory.pole = pole;
                    memory.start = arnoldi.wantedSum;
                }
                return r;
            }
            if (best == null || r.real().length > best.real().length) {
                best = r;
            }
        }
        return best;
    }

    /** J − σI on J's pattern with the diagonal added. */
    private static SparseMatrix shifted(SparseMatrix j, double sigma) {
        SparsePattern w = j.pattern().withDiagonal();
        SparseMatrix m = new SparseMatrix(w);
        int[] slots = w.slotsOf(j.pattern());
        for (int k = 0; k < slots.length; k++) {
            m.values()[slots[k]] = j.values()[k];
        }
        for (int i = 0; i < w.dimension(); i++) {
            m.values()[w.find(i, i)] -= sigma;
        }
        return m;
    }

    /** One run for one pole: the Krylov basis, its projected matrix and the restart loop. */
    private static final class Arnoldi {
        private final int n, m, wanted;
        private final SparseLu lu;
        private final double sigma, radius, stableBelow;
        private final BooleanSupplier stop;
        private final double[][] v; // basis vectors v[0..m], v[m] the residual direction
        private final double[][] h; // (m + 1) × m projected matrix
        private final double[] w, solved, coefficients;
        private int starts; // start vectors used so far (a new one after each invariant subspace)

        private final double[] firstStart;
        /** After a converged run: the sum of the wanted Ritz vectors (real parts), a start for a similar matrix. */
        double[] wantedSum;

        Arnoldi(int n, SparseLu lu, double sigma, double radius, double zeroTolerance, BooleanSupplier stop,
                double[] firstStart) {
            this.firstStart = firstStart;
            this.n = n;
            this.lu = lu;
            this.sigma = sigma;
            this.radius = radius;
            this.stop = stop;
            // every λ with Re λ ≥ −tol has |μ| ≥ (σ − tol)/(σ + tol), since |λ − σ| ≥ |λ + σ| − 2·tol there
            double t = Math.min(zeroTolerance, 0.5 * sigma);
            this.stableBelow = (sigma - t) / (sigma + t);
            this.m = Math.min(n <= LARGE ? BASIS : SMALL_BASIS, n);
            this.wanted = Math.min(WANTED, Math.max(1, m - 2 - m / 4));
            v = new double[m + 1][];
            h = new double[m + 1][m];
            w = new double[n];
            solved = new double[n];
            coefficients = new double[m + 1];
        }

        /** Null when stopped. */
        Result run() {
            v[0] = startVector(0);
            if (firstStart != null) { // half the remembered directions, half the fixed start: nothing new is left out
                double[] remembered = normalised(firstStart);
                for (int i = 0; i < n; i++) {
                    v[0][i] += remembered[i];
                }
                normalise(v[0]);
            }
            int kept = 0;
            List<Ritz> last = List.of();
            int restarts = (int) Math.max(1, Math.min(MAX_RESTARTS, WORK / (4.0 * n * m * m)));
            for (int restart = 0; restart <= restarts; restart++) {
                if (stop.getAsBoolean()) {
                    return null;
                }
                int size = expand(kept);
                List<Ritz> ritz = ritzPairs(size);
                if (ritz == null) {
                    break;
                }
                last = ritz;
                int take = wantedCount(ritz);
                boolean done = size == n; // the whole space: every Ritz value is an eigenvalue
                if (!done) {
                    done = true;
                    for (int r = 0; r < take; r++) {
                        done &= ritz.get(r).converged;
                    }
                }
                if (done || restart == restarts) {
                    return result(ritz, take, done);
                }
                kept = restartWith(ritz, take, size);
                if (kept == 0) {
                    break;
                }
            }
            return result(last, wantedCount(last), false);
        }

        /**
         * Start vector number k: pseudo-random components in [0.5, 1.5) from a fixed seed, so every run is the same
         * and different k give independent directions.
         */
        private double[] startVector(int k) {
            java.util.SplittableRandom random = new java.util.SplittableRandom(0x5DEECE66DL + 7919L * k);
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = 0.5 + random.nextDouble();
            }
            normalise(x);
            return x;
        }

        /**
         * Extends the decomposition from {@code kept} columns to m (to n when n ≤ m). On an invariant subspace the
         * subdiagonal entry is 0 and a new start vector, orthogonal to the basis, continues it.
         */
        private int expand(int kept) {
            for (int col = kept; col < m; col++) {
                System.arraycopy(v[col], 0, w, 0, n);
                applyCayley(w);
                double norm = orthogonalise(w, col + 1);
                for (int r = 0; r <= col; r++) {
                    h[r][col] = coefficients[r];
                }
                double[] next = v[col + 1] == null ? new double[n] : v[col + 1];
                if (norm > 1e-12 * (1 + Math.abs(h[col][col]))) {
                    h[col + 1][col] = norm;
                    for (int i = 0; i < n; i++) {
                        next[i] = w[i] / norm;
                    }
                } else { // invariant: the Ritz values so far are exact; go on from a fresh direction
                    h[col + 1][col] = 0;
                    if (col + 1 == n) {
                        return n;
                    }
                    if (!freshDirection(next, col + 1)) {
                        return col + 1;
                    }
                }
                v[col + 1] = next;
            }
            return m;
        }

        /** A new start vector orthogonal to v[0..count) into x; false if none is left (rounding). */
        private boolean freshDirection(double[] x, int count) {
            for (int attempt = 0; attempt < 3; attempt++) {
                double[] fresh = startVector(++starts);
                System.arraycopy(fresh, 0, x, 0, n);
                double norm = orthogonalise(x, count);
                if (norm > 1e-6) {
                    for (int i = 0; i < n; i++) {
                        x[i] /= norm;
                    }
                    return true;
                }
            }
            return false;
        }

        /** x ← C x = x + 2σ (J − σI)⁻¹ x. */
        private void applyCayley(double[] x) {
            System.arraycopy(x, 0, solved, 0, n);
            lu.solve(solved);
            double twoSigma = 2 * sigma;
            for (int i = 0; i < n; i++) {
                x[i] += twoSigma * solved[i];
            }
        }

        /**
         * Removes from x its components along v[0..count) by Gram–Schmidt applied twice, each projection taken from
         * the x already reduced (the modified form); twice is enough for orthogonality to working precision (Giraud
         * et al., Numer. Math. 101, 2005, for the classical form). The coefficients go to {@link #coefficients}.
         * Returns |x| afterwards.
         */
        private double orthogonalise(double[] x, int count) {
            Arrays.fill(coefficients, 0.0);
            for (int pass = 0; pass < 2; pass++) {
                for (int r = 0; r < count; r++) {
                    double[] b = v[r];
                    double dot = Vectors.dot(b, x);
                    coefficients[r] += dot;
                    for (int i = 0; i < n; i++) {
                        x[i] -= dot * b[i];
                    }
                }
            }
            return Math.sqrt(Vectors.dot(x, x));
        }

        /** A Ritz value μ of C, the real basis of its vector in the projected space (one column, or two for a pair). */
        private record Ritz(double re, double im, double[] vectorRe, double[] vectorIm, boolean converged, int group) {
            double modulus() {
                return Math.hypot(re, im);
            }
        }

        /** Ritz pairs of the size × size projected matrix, largest |μ| first; null if its eigen-solver fails. */
        private List<Ritz> ritzPairs(int size) {
            double[][] a = new double[size][size];
            for (int r = 0; r < size; r++) {
                System.arraycopy(h[r], 0, a[r], 0, size);
            }
            EigenDecomposition d;
            try {
                d = new EigenDecomposition(new Array2DRowRealMatrix(a, false));
            } catch (RuntimeException e) {
                return null;
            }
            double[] re = d.getRealEigenvalues(), im = d.getImagEigenvalues();
            RealMatrix vectors = d.getV();
            double tail = h[size][size - 1];
            List<Ritz> out = new ArrayList<>();
            for (int k = 0; k < size; k++) {
                double[] x = vectors.getColumn(k), y = null;
                if (im[k] != 0) {
                    // a pair takes columns k, k + 1 (real and imaginary part of one eigenvector)
                    if (k + 1 >= size) {
                        return null;
                    }
                    y = vectors.getColumn(k + 1);
                }
                double lastSquared = x[size - 1] * x[size - 1] + (y == null ? 0 : y[size - 1] * y[size - 1]);
                double normSquared = Vectors.dot(x, x) + (y == null ? 0 : Vectors.dot(y, y));
                double residual = Math.abs(tail) * Math.sqrt(lastSquared / normSquared);
                boolean converged = residual <= RESIDUAL * Math.max(Math.hypot(re[k], im[k]), 1e-3);
                out.add(new Ritz(re[k], Math.abs(im[k]), x, y, converged, k));
                if (y != null) {
                    out.add(new Ritz(re[k], -Math.abs(im[k]), x, y, converged, k));
                    k++;
                }
            }
            // both members of a pair have the same modulus: keep them together, +b first, even when pairs tie
            out.sort(Comparator.comparingDouble(Ritz::modulus).reversed().thenComparingInt(Ritz::group)
                    .thenComparing(r -> -r.im));
            return out;
        }

        /** WANTED, plus one when the cut would split a complex pair. */
        private int wantedCount(List<Ritz> ritz) {
            int take = Math.min(wanted, ritz.size());
            if (take < ritz.size() && take > 0 && ritz.get(take - 1).im > 0 && ritz.get(take).im < 0) {
                take++;
            }
            return take;
        }

        /**
         * Keeps the span of the first {@code take} Ritz vectors: an orthonormal basis Q of their real parts, V ← V Q,
         * H ← QᵀHQ with the residual row h_{m+1,m} (last row of Q) below it, and the residual direction next.
         */
        private int restartWith(List<Ritz> ritz, int take, int size) {
            List<double[]> columns = new ArrayList<>();
            for (int r = 0; r < take; r++) {
                Ritz z = ritz.get(r);
                if (z.im < 0) {
                    continue; // the pair's basis came with its +b member
                }
                columns.add(z.vectorRe.clone());
                if (z.vectorIm != null) {
                    columns.add(z.vectorIm.clone());
                }
            }
            // modified Gram–Schmidt twice on the small vectors; drop any that vanish (a repeated vector)
            List<double[]> q = new ArrayList<>();
            for (double[] c : columns) {
                for (int pass = 0; pass < 2; pass++) {
                    for (double[] b : q) {
                        double d = Vectors.dot(b, c);
                        for (int i = 0; i < size; i++) {
                            c[i] -= d * b[i];
                        }
                    }
                }
                double norm = Math.sqrt(Vectors.dot(c, c));
                if (norm > 1e-10) {
                    for (int i = 0; i < size; i++) {
                        c[i] /= norm;
                    }
                    q.add(c);
                }
            }
            int k = q.size();
            if (k == 0 || k >= size) {
                return 0;
            }
            // V ← V Q (row by row of the n-long vectors, one temporary row of k values)
            double[] row = new double[k];
            for (int i = 0; i < n; i++) {
                for (int c = 0; c < k; c++) {
                    double s = 0;
                    double[] qc = q.get(c);
                    for (int r = 0; r < size; r++) {
                        s += v[r][i] * qc[r];
                    }
                    row[c] = s;
                }
                for (int c = 0; c < k; c++) {
                    v[c][i] = row[c];
                }
            }
            double tail = h[size][size - 1];
            double[] residualDirection = v[size];
            double[][] s = new double[k + 1][k];
            for (int a = 0; a < k; a++) {
                double[] hq = new double[size];
                for (int r = 0; r < size; r++) {
                    double t = 0;
                    for (int c = 0; c < size; c++) {
                        t += h[r][c] * q.get(a)[c];
                    }
                    hq[r] = t;
                }
                for (int b = 0; b < k; b++) {
                    s[b][a] = Vectors.dot(q.get(b), hq);
                }
                s[k][a] = tail * q.get(a)[size - 1];
            }
            for (double[] hr : h) {
                Arrays.fill(hr, 0.0);
            }
            for (int r = 0; r <= k; r++) {
                System.arraycopy(s[r], 0, h[r], 0, k);
            }
            // the residual direction becomes basis vector k (swap arrays so none is lost)
            double[] spare = v[k];
            v[k] = residualDirection;
            v[size] = spare;
            return k;
        }

        /**
         * The leading {@code take} Ritz values as eigenvalues of J, up to the first that has not converged (so the
         * list has no gaps); all unstable ones are among them once one lies clearly inside the unit circle.
         */
        private double[] normalised(double[] x) {
            double[] y = x.clone();
            normalise(y);
            return y;
        }

        private Result result(List<Ritz> ritz, int take, boolean converged) {
            if (converged) {
                rememberWanted(ritz, take);
            }
            List<double[]> found = new ArrayList<>();
            boolean allUnstable = false;
            Ritz lastAdded = null;
            for (int r = 0; r < Math.min(take, ritz.size()); r++) {
                Ritz z = ritz.get(r);
                if (!z.converged && !converged) {
                    break;
                }
                allUnstable |= z.modulus() < stableBelow;
                found.add(cayleyInverse(z.re, z.im));
                lastAdded = z;
            }
            if (lastAdded != null && lastAdded.im > 0) { // never half a pair
                found.remove(found.size() - 1);
            }
            found.sort(Comparator.<double[]>comparingDouble(l -> -l[0]).thenComparingDouble(l -> -l[1]));
            double[] re = new double[found.size()], im = new double[found.size()];
            for (int k = 0; k < found.size(); k++) {
                re[k] = found.get(k)[0];
                im[k] = found.get(k)[1];
            }
            return new Result(re, im, converged, allUnstable, radius);
        }

        /** wantedSum = V · Σ (real parts of the wanted Ritz vectors, each of unit length). */
        private void rememberWanted(List<Ritz> ritz, int take) {
            int size = ritz.isEmpty() ? 0 : ritz.get(0).vectorRe.length;
            double[] y = new double[size];
            for (int r = 0; r < Math.min(take, ritz.size()); r++) {
                double[] x = ritz.get(r).vectorRe;
                double norm = Math.sqrt(Vectors.dot(x, x));
                for (int i = 0; i < size && norm > 0; i++) {
                    y[i] += x[i] / norm;
                }
            }
            double[] sum = new double[n];
            for (int r = 0; r < size; r++) {
                double c = y[r];
                if (c != 0) {
                    for (int i = 0; i < n; i++) {
                        sum[i] += c * v[r][i];
                    }
                }
            }
            wantedSum = Vectors.dot(sum, sum) > 0 ? sum : null;
        }

        /** λ = σ (μ + 1)/(μ − 1) for μ = a + ib. */
        private double[] cayleyInverse(double a, double b) {
            double dr = a - 1, denominator = dr * dr + b * b;
            double nr = a + 1;
            // (nr + ib)(dr − ib) / |d|²
            double re = (nr * dr + b * b) / denominator;
            double im = (b * dr - nr * b) / denominator;
            return new double[] {sigma * re, sigma * im};
        }

        private void normalise(double[] x) {
            double s = Math.sqrt(Vectors.dot(x, x));
            for (int i = 0; i < x.length; i++) {
                x[i] /= s;
            }
        }

    }
}
