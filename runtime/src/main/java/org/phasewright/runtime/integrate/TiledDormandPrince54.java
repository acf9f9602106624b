package org.phasewright.runtime.integrate;

import static org.phasewright.runtime.integrate.DormandPrince54.STIFF_BOUNDARY;

import org.phasewright.runtime.compile.LatticeRates;
import org.phasewright.runtime.compile.VectorField;

/**
 * {@link DormandPrince54} for lattice models, tile by tile: each step runs all seven stages on one cache-sized tile
 * of cells at a time (with a halo recomputed on both sides, see {@link LatticeTile}) instead of sweeping the whole
 * state once per stage, and tiles are shared out among worker threads. Memory traffic per step drops from some
 * thirty whole-state sweeps to four.
 * <p>
 * Same tableau, error norm, step-size controller, stiffness test and continuous extension as DormandPrince54, and
 * the same stage values bit for bit for the same step; only the error and stiffness sums are added tile by tile (a
 * different rounding order), so step sizes and results agree with the whole-state method to rounding. Sums are
 * formed in tile order whatever the number of workers, so results do not depend on it (they do on the tile size).
 * Settings with per-component tolerances go to the whole-state method.
 */
public final class TiledDormandPrince54 implements Integrator {
    /**
     * Cell values per tile (cells times components): a worker's thirteen window arrays then take about 55 KB, about a
     * first-level data cache, so the stages of a tile read and write mostly there. On the ring benchmark (10^5
     * cells, a 48 KB first-level cache) 512 values took 0.034 s, 2,048 values 0.043 s; on a machine with a 32 KB
     * first-level cache, 256 to 4,096 cells ran equally fast.
     */
    static final int TILE_VALUES = 512;

    private final VectorField field;
    private final LatticeRates lattice;
    private final double[] p;
    private final int n, tileCells, tiles, workers;
    private final LatticeTile[] windows;
    private final double[] tileError, tileLargest, tileNumerator, tileDenominator;
    private double[] y, yNew, k1, k7;
    // the observers' view of the last accepted step, and the attempt's coefficients prepared aside (made when an
    // observer first asks for steps)
    private DormandPrinceDense dense, pendingDense;
    private DormandPrince54 wholeState; // made when settings first need it
    /** The attempt the crew works on; written before each pass, which publishes it. */
    private LatticeTile.Step current;

    /**
     * @param lattice the same rates as {@code field} on windows of cells
     * @param workers threads that share the tiles of a step (1: the calling thread only)
     */
    public TiledDormandPrince54(VectorField field, LatticeRates lattice, double[] parameters, int workers) {
        this(field, lattice, parameters, workers, Math.max(256, TILE_VALUES / lattice.components()));
    }

    TiledDormandPrince54(VectorField field, LatticeRates lattice, double[] parameters, int workers, int tileCells) {
        this.field = field;
        this.lattice = lattice;
        this.p = parameters.clone();
        this.n = field.dimension();
        if ((long) lattice.cells() * lattice.components() != n) {
            throw new IllegalArgumentException("lattice of " + lattice.components() + " x " + lattice.cells()
                    + " cells for a model of " + n + " states");
        }
        this.tileCells = Math.min(tileCells, lattice.cells());
        this.tiles = (lattice.cells() + this.tileCells - 1) / this.tileCells;
        this.workers = Math.max(1, Math.min(workers, tiles));
        windows = new LatticeTile[this.workers];
        for (int w = 0; w < this.workers; w++) {
            windows[w] = new LatticeTile(lattice, this.tileCells);
        }
        tileError = new double[tiles];
        tileLargest = new double[tiles];
        tileNumerator = new double[tiles];
        tileDenominator = new double[tiles];
        y = new double[n];
        yNew = new double[n];
        k1 = new double[n];
        k7 = new double[n];
    }

    @Override
    public IntegrationOutcome integrate(double t0, double[] u0, double tEnd, IntegratorSettings s,
            StepObserver observer) {
        if (s.componentRelativeTolerances() != null || s.componentAbsoluteTolerances() != null) {
            if (wholeState == null) {
                wholeState = new DormandPrince54(field, p);
            }
            return wholeState.integrate(t0, u0, tEnd, s, observer);
        }
        if (observer != null && dense == null) {
            dense = new DormandPrinceDense(n);
            pendingDense = new DormandPrinceDense(n);
        }
        if (workers == 1) {
            return integrate(t0, u0, tEnd, s, observer, null);
        }
        try (TileCrew crew = new TileCrew(workers, w -> run(w, current))) {
            return integrate(t0, u0, tEnd, s, observer, crew);
        }
    }

    private IntegrationOutcome integrate(double t0, double[] u0, double tEnd, IntegratorSettings s,
            StepObserver observer, TileCrew crew) {
        AdaptiveStepDriver b = new AdaptiveStepDriver(s, observer, dense);
        IntegrationOutcome early = b.begin(t0, u0, tEnd, y, field, p, k1);
        if (early != null) {
            return early;
        }
        double[] rtol = s.relativeTolerances(n);
        double[] atol = s.absoluteTolerances(n);
        double h = b.firstExplicitStep(s, field, p, t0, y, k1, yNew, k7, rtol, atol, 5);
        return b.run(new Attempts(b, rtol, atol, observer != null, crew), DormandPrince54.control(), t0, h, tEnd);
    }

    /** The tiled stages, sums and state of one integration. */
    private final class Attempts extends AdaptiveStepDriver.PairAttempts {
        private final TileCrew crew;
        private boolean stiffness;
        private double largest, stiffNumerator, stiffDenominator;

        Attempts(AdaptiveStepDriver b, double[] rtol, double[] atol, boolean denseOutput, TileCrew crew) {
            super(b, rtol, atol, denseOutput); // the same tolerance for every state (others go to the whole state)
            this.crew = crew;
        }

        @Override
        public double[] state() {
            return y;
        }

        @Override
        public double attempt(double t, double h, double tNew) {
            stiffness = b.stiffnessTestDueNext();
            attemptAll(new LatticeTile.Step(t, h, tNew, p, y, k1, yNew, k7, atol[0], rtol[0], b.blowUpBound(),
                    stiffness, denseOutput ? pendingDense : null), crew);
            b.evaluations += 6;
            double err = 0, big = 0, num = 0, den = 0;
            for (int k = 0; k < tiles; k++) { // in tile order, whatever the workers
                err += tileError[k];
                big = Math.max(big, tileLargest[k]);
                num += tileNumerator[k];
                den += tileDenominator[k];
            }
            largest = big;
            stiffNumerator = num;
            stiffDenominator = den;
            return big <= Double.MAX_VALUE ? Math.sqrt(err / n) : Double.NaN;
        }

        @Override
        public void accept(double t, double h, double tNew) {
            if (stiffness) {
                b.testStiffness(h, tNew, stiffNumerator, stiffDenominator, STIFF_BOUNDARY);
            }
            if (denseOutput) {
                dense.swapCoefficients(pendingDense);
            }
            double[] swap = y;
            y = yNew;
            yNew = swap;
            swap = k1; // first same as last
            k1 = k7;
            k7 = swap;
        }

        @Override
        public double largest() {
            return largest; // max |y_new| when some value was near the blow-up bound, else 0 (all well within it)
        }
    }

    /** All tiles of one step attempt; worker w takes the w-th of equal runs of tiles. */
    private void attemptAll(LatticeTile.Step step, TileCrew crew) {
        if (crew == null) {
            run(0, step);
        } else {
            current = step;
            crew.run();
        }
    }

    private void run(int worker, LatticeTile.Step step) {
        LatticeTile window = windows[worker];
        int cells = lattice.cells();
        for (int k = worker * tiles / workers, end = (worker + 1) * tiles / workers; k < end; k++) {
            int first = k * tileCells;
            window.step(step, first, Math.min(tileCells, cells - first));
            tileError[k] = window.errorSquares;
            tileLargest[k] = window.largestIfNearBound;
            tileNumerator[k] = window.stiffNumerator;
            tileDenominator[k] = window.stiffDenominator;
        }
    }
}
