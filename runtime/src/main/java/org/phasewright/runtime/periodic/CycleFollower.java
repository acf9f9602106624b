package org.phasewright.runtime.periodic;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.continuation.BranchFollower;
import org.phasewright.runtime.continuation.ParameterVector;
import org.phasewright.runtime.continuation.RegulaFalsiBracket;
import org.phasewright.runtime.continuation.SquareSolve;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.linalg.Vectors;

/**
 * Follows the periodic orbits born at a Hopf point by single shooting with pseudo-arclength continuation in
 * X = (u0, T, λ): the equations φ(T; u0, λ) − u0 = 0 and the phase condition (u0 − ū)·f(ū) = 0 (ū the previous
 * orbit's start point, so each orbit is pinned where it crosses the plane through ū normal to the flow), plus the
 * arclength condition (Kuznetsov, Elements of Applied Bifurcation Theory, 3rd ed., §10.3; Seydel, Practical
 * Bifurcation and Stability Analysis, 3rd ed., ch. 7). The first orbit is predicted from the Hopf point along the
 * real critical eigenspace with period 2π/ω; later orbits are predicted along the secant of the last two.
 * Floquet multipliers are the eigenvalues of the monodromy matrix; a period doubling is a sign change of det(M + I)
 * (a multiplier crossing −1), placed by regula falsi on it along the step, correcting onto the family each time;
 * a fold of cycles is a sign change of the λ-component of the secant, placed by a golden-section search for the
 * extremum of λ. Not thread-safe.
 */
public final class CycleFollower {
    private static final int MAX_NEWTON = 8;

    private final VectorField field;
    private final ParameterVector parameters;
    private final PeriodMap map;
    private final int n, m;
    private final double lo, hi, hMax;
    private final CycleSettings settings;
    private final BooleanSupplier cancelled;
    private final long deadlineNanos;
    private final double[] p;
    private PeriodMap.Shot lastShot;

    public CycleFollower(VectorField field, ParameterVector parameters, int parameterCount, double from, double to,
            CycleSettings settings, double blowUpBound, long deadlineNanos, BooleanSupplier cancelled) {
        this.field = field;
        this.parameters = parameters;
        this.n = field.dimension();
        this.m = n + 2;
        this.lo = Math.min(from, to);
        this.hi = Math.max(from, to);
        this.settings = settings;
        this.cancelled = cancelled;
        this.deadlineNanos = deadlineNanos;
        this.hMax = settings.maxStepFraction() * Math.max(hi - lo, 1e-300);
        this.p = new double[parameterCount];
        IntegratorSettings shot = IntegratorSettings.DEFAULT
                .withTolerances(settings.relativeTolerance(), settings.relativeTolerance() / 100)
                .withMaxSteps(settings.maxStepsPerShot()).withBlowUpBound(blowUpBound)
                .withDeadline(deadlineNanos).withCancellation(cancelled);
        this.map = new PeriodMap(field, parameters, parameterCount, shot);
    }

    /**
     * @param hopfState equilibrium at the Hopf point
     * @param omega     imaginary part of the critical eigenvalues there
     */
    public CycleBranch follow(int number, double[] hopfState, double hopfParameter, double omega) {
        List<CyclePoint> points = new ArrayList<>();
        double[] d = criticalDirection(hopfState, hopfParameter, omega);
        if (d == null) {
            return new CycleBranch(number, hopfParameter, points, "no critical eigenvector at the Hopf point");
        }
        double period0 = 2 * Math.PI / omega;
        double[] x = new double[m];
        System.arraycopy(hopfState, 0, x, 0, n);
        x[n] = period0;
        x[n + 1] = hopfParameter;
        double[] t = new double[m];
        System.arraycopy(d, 0, t, 0, n);
        double h = hMax / 4;
        // first orbit: displaced from the equilibrium along the critical eigenspace
        double[] next = null;
        for (int attempt = 0; attempt < 6 && next == null; attempt++) {
            double[] predicted = add(x, h, t);
            next = correct(predicted, t, Arrays.copyOf(predicted, n), predicted[n + 1]);
            if (next == null) {
                h /= 2;
            }
        }
        if (next == null) {
            return new CycleBranch(number, hopfParameter, points, "no periodic orbit found near the Hopf point");
        }
        double[] direction = secant(x, next); // from the Hopf point, seen as an orbit of amplitude zero
        if (direction == null) {
            return new CycleBranch(number, hopfParameter, points, "no direction at the first orbit");
        }
        x = next;
        t = direction;
        PeriodMap.Shot shot = lastShot;
        points.add(point(x, shot, null));
        double pd = doublingTest(shot);
        double previousStep = 0; // no earlier orbit yet
        boolean secantOfOrbits = false;
        String end;
        while (true) {
            if (cancelled.getAsBoolean()) {
                end = "cancelled";
                break;
            }
            if (deadlineNanos != Long.MAX_VALUE && System.nanoTime() - deadlineNanos > 0) {
                end = "wall-time limit";
                break;
            }
            if (points.size() >= settings.maxPoints()) {
                end = "point limit";
                break;
            }
            double[] predicted = add(x, h, t);
            double[] y = correct(predicted, t, Arrays.copyOf(x, n), x[n + 1]);
            double[] ty = y == null ? null : secant(x, y);
            // the first direction comes from the Hopf point, not from two orbits: it may differ from the family's
            // direction by the slant of the phase plane, so only later directions are held to the turning limit
            if (ty == null || (secantOfOrbits && Vectors.dot(ty, t) < 0.9)) {
                h /= 2;
                if (h < 1e-8 * hMax) {
                    end = "step size too small";
                    break;
                }
                continue;
            }
            PeriodMap.Shot yShot = lastShot;
            double pdNext = doublingTest(yShot);
            if (Math.signum(pd) * Math.signum(pdNext) < 0) {
                locate(points, x, t, h, pd, pdNext, CycleBranch.Special.PERIOD_DOUBLING);
            }
            if (Math.signum(t[n + 1]) * Math.signum(ty[n + 1]) < 0) {
                locateFold(points, x, t, previousStep, h, ty[n + 1] < 0);
            }
            if (y[n + 1] < lo || y[n + 1] > hi) {
                end = "reached " + parameters.name() + " = " + BranchFollower.number(y[n + 1] > hi ? hi : lo);
                break;
            }
            points.add(point(y, yShot, null));
            if (y[n] > settings.periodLimit() * period0) {
                end = "period above " + BranchFollower.number(settings.periodLimit())
                        + " times the Hopf period (close to a homoclinic orbit?)";
                break;
            }
            previousStep = distance(x, y);
            secantOfOrbits = true;
            x = y;
            t = ty;
            pd = pdNext;
            h = Math.min(cap(x, t), h * 1.4);
        }
        return new CycleBranch(number, hopfParameter, points, end);
    }

    /** As for equilibria: a fraction of the width or of the orbit's size, with λ moving a few fractions at most. */
    private double cap(double[] x, double[] t) {
        double size = 0;
        for (int i = 0; i < n; i++) {
            size = Math.max(size, Math.abs(x[i]));
        }
        double width = hMax / settings.maxStepFraction();
        double cap = settings.maxStepFraction() * Math.max(width, size);
        double lambda = Math.abs(t[n + 1]);
        return lambda > 0 ? Math.min(cap, 2.5 * hMax / lambda) : cap;
    }

    /** Regula falsi (Illinois) on det(M + I) along the step, correcting onto the family at every trial. */
    private void locate(List<CyclePoint> points, double[] x, double[] t, double h, double f0, double f1,
            CycleBranch.Special kind) {
        RegulaFalsiBracket bracket = new RegulaFalsiBracket(0, f0, h, f1);
        double[] best = null;
        PeriodMap.Shot bestShot = null;
        for (int k = 0; k < 40 && bracket.width() > 1e-12 * (1 + h); k++) {
            double s = bracket.trial();
            double[] y = correct(add(x, s, t), t, Arrays.copyOf(x, n), x[n + 1]);
            if (y == null) {
                break;
            }
            best = y;
            bestShot = lastShot;
            double fs = doublingTest(lastShot);
            if (fs == 0) {
                break;
            }
            bracket.update(s, fs);
        }
        if (best != null && best[n + 1] >= lo && best[n + 1] <= hi) {
            points.add(point(best, bestShot, kind));
        }
    }

    /**
     * A fold of cycles is where λ is extremal along the family: golden-section search for that extremum on the
     * orbits corrected from x along t, between the previous point (−back) and the rejected-direction point (+h).
     */
    private void locateFold(List<CyclePoint> points, double[] x, double[] t, double back, double h, boolean maximum) {
        final double g = (Math.sqrt(5) - 1) / 2;
        double a = -back, b = h;
        double c = b - g * (b - a), d = a + g * (b - a);
        double fc = foldObjective(x, t, c, maximum), fd = foldObjective(x, t, d, maximum);
        for (int k = 0; k < 60 && b - a > 1e-10 * (1 + h); k++) {
            if (fc < fd) { // minimise the objective (−λ at a maximum)
                b = d;
                d = c;
                fd = fc;
                c = b - g * (b - a);
                fc = foldObjective(x, t, c, maximum);
            } else {
                a = c;
                c = d;
                fc = fd;
                d = a + g * (b - a);
                fd = foldObjective(x, t, d, maximum);
            }
        }
        double[] y = correct(add(x, (a + b) / 2, t), t, Arrays.copyOf(x, n), x[n + 1]);
        if (y != null && y[n + 1] >= lo && y[n + 1] <= hi) {
            points.add(point(y, lastShot, CycleBranch.Special.FOLD_OF_CYCLES));
        }
    }

    private double foldObjective(double[] x, double[] t, double s, boolean maximum) {
        double[] y = correct(add(x, s, t), t, Arrays.copyOf(x, n), x[n + 1]);
        if (y == null) {
            return Double.POSITIVE_INFINITY;
        }
        return maximum ? -y[n + 1] : y[n + 1];
    }

    private static double distance(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += (a[i] - b[i]) * (a[i] - b[i]);
        }
        return Math.sqrt(s);
    }

    /** Newton on the shooting equations with phase and arclength conditions; null if it fails. */
    private double[] correct(double[] predicted, double[] t, double[] uRef, double lambdaRef) {
        double[] fRef = new double[n];
        parameters.fill(lambdaRef, p);
        field.rates(0.0, uRef, p, fRef);
        double[] x = predicted.clone();
        for (int it = 0; it < MAX_NEWTON; it++) {
            PeriodMap.Shot shot = map.shoot(Arrays.copyOf(x, n), x[n], x[n + 1]);
            if (shot == null) {
                return null;
            }
            lastShot = shot;
            double[] a = new double[m * m];
            double[] r = new double[m];
            jacobianRows(x, shot, fRef, a);
            for (int i = 0; i < n; i++) {
                r[i] = -(shot.end()[i] - x[i]);
            }
            double phase = 0, arc = 0;
            for (int i = 0; i < n; i++) {
                phase += (x[i] - uRef[i]) * fRef[i];
            }
            for (int i = 0; i < m; i++) {
                arc += t[i] * (x[i] - predicted[i]);
            }
            r[n] = -phase;
            r[n + 1] = -arc;
            System.arraycopy(t, 0, a, (n + 1) * m, m);
            SquareSolve lu = new SquareSolve(a, m);
            if (lu.singular()) {
                return null;
            }
            lu.solve(r);
            double step = 0, size = 0;
            for (int i = 0; i < m; i++) {
                x[i] += r[i];
                step = Math.max(step, Math.abs(r[i]));
                size = Math.max(size, Math.abs(x[i]));
            }
            if (!Double.isFinite(step) || !(x[n] > 0)) {
                return null;
            }
            if (step <= 1e-8 * (1 + size)) {
                return x;
            }
        }
        return null;
    }

    /** Rows 0..n of the Jacobian: [M − I | f(φ(T)) | ∂φ/∂λ] and the phase row [f(ū) | 0 | 0]. */
    private void jacobianRows(double[] x, PeriodMap.Shot shot, double[] fRef, double[] a) {
        double[] fEnd = new double[n];
        parameters.fill(x[n + 1], p);
        field.rates(0.0, shot.end(), p, fEnd);
        double[] mono = shot.monodromy();
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a[i * m + j] = mono[i * n + j] - (i == j ? 1 : 0);
            }
            a[i * m + n] = fEnd[i];
            a[i * m + n + 1] = shot.parameterDerivative()[i];
        }
        for (int j = 0; j < n; j++) {
            a[n * m + j] = fRef[j];
        }
    }

    /**
     * The unit secant from x to y. It serves as the next direction: a tangent from the bordered system proved
     * unreliable on the period map (near a Hopf point M − I is nearly singular in two directions), while the secant
     * of two converged orbits always lies along the family.
     */
    private static double[] secant(double[] x, double[] y) {
        double[] d = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            d[i] = y[i] - x[i];
        }
        double norm = Math.sqrt(Vectors.dot(d, d));
        if (!(norm > 0) || !Double.isFinite(norm)) {
            return null;
        }
        for (int i = 0; i < d.length; i++) {
            d[i] /= norm;
        }
        return d;
    }

    /** det(M + I): changes sign when a real Floquet multiplier crosses −1. */
    private double doublingTest(PeriodMap.Shot shot) {
        double[] a = shot.monodromy().clone(); // the shot's own array is shared
        for (int i = 0; i < n; i++) {
            a[i * n + i] += 1;
        }
        return new SquareSolve(a, n).determinant();
    }

    private CyclePoint point(double[] x, PeriodMap.Shot shot, CycleBranch.Special special) {
        double[][] mono = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                mono[i][j] = shot.monodromy()[i * n + j];
            }
        }
        double[] re, im;
        try {
            EigenDecomposition e = new EigenDecomposition(new Array2DRowRealMatrix(mono, false));
            re = e.getRealEigenvalues();
            im = e.getImagEigenvalues();
        } catch (RuntimeException ex) {
            re = new double[n];
            im = new double[n];
            Arrays.fill(re, Double.NaN);
        }
        int trivial = 0; // the multiplier 1 of the direction along the orbit
        for (int k = 1; k < n; k++) {
            if (Math.hypot(re[k] - 1, im[k]) < Math.hypot(re[trivial] - 1, im[trivial])) {
                trivial = k;
            }
        }
        boolean stable = true;
        for (int k = 0; k < n; k++) {
            if (k != trivial && !(Math.hypot(re[k], im[k]) < 1)) {
                stable = false;
            }
        }
        return new CyclePoint(x[n + 1], x[n], Arrays.copyOf(x, n), shot.minimum(), shot.maximum(), re, im, stable,
                special);
    }

    /** A unit vector in the real eigenspace of the eigenvalue pair ±iω of the Jacobian at the Hopf point. */
    private double[] criticalDirection(double[] u, double lambda, double omega) {
        parameters.fill(lambda, p);
        double[] jac = new double[n * n];
        field.jacobian(0.0, u, p, jac);
        double[][] a = new double[n][n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(jac, i * n, a[i], 0, n);
        }
        try {
            EigenDecomposition e = new EigenDecomposition(new Array2DRowRealMatrix(a, false));
            double[] im = e.getImagEigenvalues();
            int best = 0;
            for (int k = 1; k < n; k++) {
                if (Math.abs(Math.abs(im[k]) - omega) < Math.abs(Math.abs(im[best]) - omega)) {
                    best = k;
                }
            }
            double[] v = e.getV().getColumn(best);
            double norm = Math.sqrt(Vectors.dot(v, v));
            for (int i = 0; i < n; i++) {
                v[i] /= norm;
            }
            return norm > 0 ? v : null;
        } catch (RuntimeException ex) {
            return null;
        }
    }

    private static double[] add(double[] x, double h, double[] t) {
        double[] out = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            out[i] = x[i] + h * t[i];
        }
        return out;
    }
}
