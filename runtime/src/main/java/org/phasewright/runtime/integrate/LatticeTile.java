package org.phasewright.runtime.integrate;

import static org.phasewright.runtime.integrate.DormandPrince54.A21;
import static org.phasewright.runtime.integrate.DormandPrince54.A31;
import static org.phasewright.runtime.integrate.DormandPrince54.A32;
import static org.phasewright.runtime.integrate.DormandPrince54.A41;
import static org.phasewright.runtime.integrate.DormandPrince54.A42;
import static org.phasewright.runtime.integrate.DormandPrince54.A43;
import static org.phasewright.runtime.integrate.DormandPrince54.A51;
import static org.phasewright.runtime.integrate.DormandPrince54.A52;
import static org.phasewright.runtime.integrate.DormandPrince54.A53;
import static org.phasewright.runtime.integrate.DormandPrince54.A54;
import static org.phasewright.runtime.integrate.DormandPrince54.A61;
import static org.phasewright.runtime.integrate.DormandPrince54.A62;
import static org.phasewright.runtime.integrate.DormandPrince54.A63;
import static org.phasewright.runtime.integrate.DormandPrince54.A64;
import static org.phasewright.runtime.integrate.DormandPrince54.A65;
import static org.phasewright.runtime.integrate.DormandPrince54.A71;
import static org.phasewright.runtime.integrate.DormandPrince54.A73;
import static org.phasewright.runtime.integrate.DormandPrince54.A74;
import static org.phasewright.runtime.integrate.DormandPrince54.A75;
import static org.phasewright.runtime.integrate.DormandPrince54.A76;
import static org.phasewright.runtime.integrate.DormandPrince54.C2;
import static org.phasewright.runtime.integrate.DormandPrince54.C3;
import static org.phasewright.runtime.integrate.DormandPrince54.C4;
import static org.phasewright.runtime.integrate.DormandPrince54.C5;
import static org.phasewright.runtime.integrate.DormandPrince54.E1;
import static org.phasewright.runtime.integrate.DormandPrince54.E3;
import static org.phasewright.runtime.integrate.DormandPrince54.E4;
import static org.phasewright.runtime.integrate.DormandPrince54.E5;
import static org.phasewright.runtime.integrate.DormandPrince54.E6;
import static org.phasewright.runtime.integrate.DormandPrince54.E7;

import org.phasewright.runtime.compile.LatticeRates;

/**
 * One worker's window for {@link TiledDormandPrince54}: all seven stages of a Dormand–Prince step on a tile of
 * cells plus a halo, in arrays small enough to stay in cache. With reaches L below and R above, stage s is known on
 * the tile widened by (7−s)·L below and (7−s)·R above, so the window holds the tile and 6·(L+R) more cells.
 * <p>
 * Every array is indexed by window position, so the stage combinations read and write the same index (loops the JIT
 * vectorises); the rates land in a scratch array shifted by L and are copied into place. Each combination is the
 * same expression, in the same order, as in {@link DormandPrince54}, so a stage value is bit for bit the one the
 * whole-state method computes.
 */
final class LatticeTile {
    private final LatticeRates lattice;
    private final int cells, components, below, above;
    private final double[][] y, k1, k2, k3, k4, k5, k6, k7, yStage, yLast, scratch;
    private final double[] terms;
    private static final int BLOCK = 64;
    private final double[] size, partialA = new double[BLOCK], partialB = new double[BLOCK];
    private double sumA, sumB;

    /**
     * Sums over the tile's cells, filled by {@link #step}; {@code largestIfNearBound} is max |y_new| when some value
     * might exceed the blow-up bound or not be finite, and 0 when all are known to be within half of it.
     */
    double errorSquares, largestIfNearBound, stiffNumerator, stiffDenominator;

    LatticeTile(LatticeRates lattice, int tileCells) {
        this.lattice = lattice;
        this.cells = lattice.cells();
        this.components = lattice.components();
        this.below = lattice.reachBelow();
        this.above = lattice.reachAbove();
        int width = tileCells + 6 * (below + above);
        y = new double[components][width];
        k1 = new double[components][width];
        k2 = new double[components][width];
        k3 = new double[components][width];
        k4 = new double[components][width];
        k5 = new double[components][width];
        k6 = new double[components][width];
        k7 = new double[components][width];
        yStage = new double[components][width];
        yLast = new double[components][width];
        scratch = new double[components][width];
        terms = new double[width];
        size = new double[width];
    }

    /** The whole-state arrays of one step attempt, shared by all tiles. */
    record Step(double t, double h, double tNew, double[] p, double[] y, double[] k1, double[] yNew, double[] k7,
            double atol, double rtol, double blowUpBound, boolean stiffness, DormandPrinceDense dense) {
    }

    /**
     * The step on cells [first, first + n): writes their new state and last stage into s.yNew and s.k7 (and the
     * continuous extension into s.dense when there is one), and sets the tile's error sum and largest |y|.
     */
    void step(Step s, int first, int n) {
        int halo = 6 * below, width = n + 6 * (below + above);
        long origin = (long) first - halo; // the cell at window position 0
        for (int f = 0; f < components; f++) {
            load(s.y(), f, origin, y[f], width);
            load(s.k1(), f, origin, k1[f], width);
        }
        double t = s.t(), h = s.h();
        int lo = 0, hi = width; // where the stage input is known
        for (int f = 0; f < components; f++) {
            stage(yStage[f], y[f], h, A21, k1[f], lo, hi);
        }
        rates(t + C2 * h, yStage, k2, s.p(), origin, lo, hi);
        lo += below;
        hi -= above;
        for (int f = 0; f < components; f++) {
            stage(yStage[f], y[f], h, A31, k1[f], A32, k2[f], lo, hi);
        }
        rates(t + C3 * h, yStage, k3, s.p(), origin, lo, hi);
        lo += below;
        hi -= above;
        for (int f = 0; f < components; f++) {
            stage(yStage[f], y[f], h, A41, k1[f], A42, k2[f], A43, k3[f], lo, hi);
        }
        rates(t + C4 * h, yStage, k4, s.p(), origin, lo, hi);
        lo += below;
        hi -= above;
        for (int f = 0; f < components; f++) {
            stage(yStage[f], y[f], h, A51, k1[f], A52, k2[f], A53, k3[f], A54, k4[f], lo, hi);
        }
        rates(t + C5 * h, yStage, k5, s.p(), origin, lo, hi);
        lo += below;
        hi -= above;
        // Five terms in two loops (fewer arrays per loop, which the JIT still vectorises); the partial sum keeps the
        // left-to-right order, so the value is unchanged.
        for (int f = 0; f < components; f++) {
            partial(terms, A61, k1[f], A62, k2[f], A63, k3[f], lo, hi);
            stage(yStage[f], y[f], h, terms, A64, k4[f], A65, k5[f], lo, hi);
        }
        double tNew = s.tNew();
        rates(tNew, yStage, k6, s.p(), origin, lo, hi);
        lo += below;
        hi -= above;
        for (int f = 0; f < components; f++) {
            partial(terms, A71, k1[f], A73, k3[f], A74, k4[f], lo, hi);
            stage(yLast[f], y[f], h, terms, A75, k5[f], A76, k6[f], lo, hi);
        }
        rates(tNew, yLast, k7, s.p(), origin, lo, hi);
        lo += below;
        hi -= above; // now [lo, hi) is the tile itself
        finish(s, first, lo, hi);
    }

    // Stage combinations, one small method each so the JIT compiles (and vectorises) them early; each is the
    // expression of DormandPrince54 with the coefficients as arguments, so values are the same bit for bit.

    private static void stage(double[] ys, double[] y, double h, double c1, double[] k1, int lo, int hi) {
        for (int q = lo; q < hi; q++) {
            ys[q] = y[q] + h * c1 * k1[q];
        }
    }

    private static void stage(double[] ys, double[] y, double h, double c1, double[] k1, double c2, double[] k2,
            int lo, int hi) {
        for (int q = lo; q < hi; q++) {
            ys[q] = y[q] + h * (c1 * k1[q] + c2 * k2[q]);
        }
    }

    private static void stage(double[] ys, double[] y, double h, double c1, double[] k1, double c2, double[] k2,
            double c3, double[] k3, int lo, int hi) {
        for (int q = lo; q < hi; q++) {
            ys[q] = y[q] + h * (c1 * k1[q] + c2 * k2[q] + c3 * k3[q]);
        }
    }

    private static void stage(double[] ys, double[] y, double h, double c1, double[] k1, double c2, double[] k2,
            double c3, double[] k3, double c4, double[] k4, int lo, int hi) {
        for (int q = lo; q < hi; q++) {
            ys[q] = y[q] + h * (c1 * k1[q] + c2 * k2[q] + c3 * k3[q] + c4 * k4[q]);
        }
    }

    /** The first three terms of a longer combination. */
    private static void partial(double[] sum, double c1, double[] k1, double c2, double[] k2, double c3,
            double[] k3, int lo, int hi) {
        for (int q = lo; q < hi; q++) {
            sum[q] = c1 * k1[q] + c2 * k2[q] + c3 * k3[q];
        }
    }

    /** y + h (partial + c4 k4 + c5 k5), the rest of a five-term combination. */
    private static void stage(double[] ys, double[] y, double h, double[] partial, double c4, double[] k4,
            double c5, double[] k5, int lo, int hi) {
        for (int q = lo; q < hi; q++) {
            ys[q] = y[q] + h * (partial[q] + c4 * k4[q] + c5 * k5[q]);
        }
    }

    /** New state, last stage and dense output out to the whole state; the tile's error and largest |y|. */
    private void finish(Step s, int first, int lo, int hi) {
        double h = s.h(), atol = s.atol(), rtol = s.rtol();
        double squares = 0, big = 0, num = 0, den = 0;
        for (int f = 0; f < components; f++) {
            double[] yf = y[f], yl = yLast[f], a = k1[f], c = k3[f], d = k4[f], e = k5[f], g = k6[f], z = k7[f];
            int flat = f * cells + first;
            System.arraycopy(yl, lo, s.yNew(), flat, hi - lo);
            System.arraycopy(z, lo, s.k7(), flat, hi - lo);
            for (int q = lo; q < hi; q++) {
                terms[q] = E1 * a[q] + E3 * c[q] + E4 * d[q] + E5 * e[q] + E6 * g[q];
            }
            double inverseBound = 1 / s.blowUpBound();
            for (int q = lo; q < hi; q++) {
                double yi = yl[q];
                double sk = atol + rtol * Math.max(Math.abs(yf[q]), Math.abs(yi));
                double w = h * (terms[q] + E7 * z[q]) / sk;
                terms[q] = w * w;
                double r = yi * inverseBound;
                size[q] = r * r;
            }
            blockSums(terms, size, lo, hi);
            squares += sumA;
            // Σ (y/bound)² <= 1/4 means every |y| is below the bound (and finite): the exact maximum, a slower
            // reduction, is only needed when some value might be out of bounds or not finite.
            if (!(sumB <= 0.25)) {
                big = Math.max(big, blockMaxAbs(yl, lo, hi));
            }
            if (s.stiffness()) {
                double[] ys = yStage[f];
                for (int q = lo; q < hi; q++) {
                    double dk = z[q] - g[q], dy = yl[q] - ys[q];
                    num += dk * dk;
                    den += dy * dy;
                }
            }
            DormandPrinceDense dense = s.dense();
            if (dense != null) {
                for (int q = lo; q < hi; q++) {
                    dense.set(flat + q - lo, yf[q], yl[q], h, a[q], c[q], d[q], e[q], g[q], z[q]);
                }
            }
        }
        errorSquares = squares;
        largestIfNearBound = big;
        stiffNumerator = num;
        stiffDenominator = den;
    }

    /**
     * The sums of a[lo..hi) and b[lo..hi) into sumA and sumB, each in BLOCK interleaved partial sums (a vectorisable
     * loop instead of one long chain of dependent additions), then the partials and the rest in order: the same
     * value on every run.
     */
    private void blockSums(double[] a, double[] b, int lo, int hi) {
        java.util.Arrays.fill(partialA, 0.0);
        java.util.Arrays.fill(partialB, 0.0);
        int q = lo;
        for (; q + BLOCK <= hi; q += BLOCK) {
            for (int j = 0; j < BLOCK; j++) {
                partialA[j] += a[q + j];
                partialB[j] += b[q + j];
            }
        }
        double sa = 0, sb = 0;
        for (int j = 0; j < BLOCK; j++) {
            sa += partialA[j];
            sb += partialB[j];
        }
        for (; q < hi; q++) {
            sa += a[q];
            sb += b[q];
        }
        sumA = sa;
        sumB = sb;
    }

    /** max |a[lo..hi)| the same way; NaN when some entry is NaN (Math.max keeps NaN). */
    private double blockMaxAbs(double[] a, int lo, int hi) {
        java.util.Arrays.fill(partialA, 0.0);
        int q = lo;
        for (; q + BLOCK <= hi; q += BLOCK) {
            for (int j = 0; j < BLOCK; j++) {
                partialA[j] = Math.max(partialA[j], Math.abs(a[q + j]));
            }
        }
        double max = 0;
        for (double v : partialA) {
            max = Math.max(max, v);
        }
        for (; q < hi; q++) {
            max = Math.max(max, Math.abs(a[q]));
        }
        return max;
    }

    /** Rates at window positions [lo + below, hi - above) from the stage values on [lo, hi), into k. */
    private void rates(double t, double[][] stage, double[][] k, double[] p, long origin, int lo, int hi) {
        int count = hi - lo - below - above;
        lattice.rates(t, stage, p, scratch, origin + below, lo, lo + count);
        for (int f = 0; f < components; f++) {
            System.arraycopy(scratch[f], lo, k[f], lo + below, count);
        }
    }

    /** Component f of the whole state at cells origin, origin + 1, ... (wrapping around) into window[0, width). */
    private void load(double[] whole, int f, long origin, double[] window, int width) {
        int base = f * cells;
        int j = 0;
        while (j < width) {
            int cell = (int) Math.floorMod(origin + j, (long) cells);
            int run = Math.min(width - j, cells - cell);
            System.arraycopy(whole, base + cell, window, j, run);
            j += run;
        }
    }
}
