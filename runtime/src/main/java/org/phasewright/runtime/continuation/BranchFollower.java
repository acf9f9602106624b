package org.phasewright.runtime.continuation;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.Deque;
import java.util.List;
import java.util.Locale;
import java.util.function.BooleanSupplier;

import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.equilibria.LinearStability;
import org.phasewright.runtime.linalg.RightmostEigenvalues;
import org.phasewright.runtime.linalg.SparseMatrix;

/**
 * Pseudo-arclength continuation of equilibria f(u; p(λ)) = 0 for λ between two values (Keller 1977; Kuznetsov,
 * Elements of Applied Bifurcation Theory, 3rd ed., §10.2): Euler predictor along the unit tangent, Newton corrector
 * in the hyperplane orthogonal to it, step length adapted to Newton's effort and to how fast the tangent turns, so
 * folds are passed without special treatment. Between consecutive points three test functions are watched:
 * <ul>
 * <li>fold: the λ-component of the tangent changes sign;</li>
 * <li>branch point: det [f_u f_λ; tᵀ] changes sign (it keeps its sign through a fold);</li>
 * <li>Hopf: a complex eigenvalue pair crosses the imaginary axis: the k-th largest real part among the pairs
 * changes sign, k fixed by how many pairs lie right of the axis (real pairs ±μ, the neutral saddles that the
 * bialternate product also flags, never count); when several pairs cross within one step, each is located.</li>
 * </ul>
 * Each is located by the Illinois variant of regula falsi on the arclength, correcting onto the curve at every
 * trial. At branch points the other branch is followed in both directions from the second tangent.
 * <p>
 * Large models (above the dense limit) work with the sparse f_u: bordered systems by a sparse LU with the border
 * last, the branch-point test by the sign of that determinant (located by halving), the second tangent at a branch
 * point by inverse iteration with the bordered matrix, and stability and the Hopf test from the rightmost
 * eigenvalues (from all of them at a state that is the same in every cell of a ring). Not thread-safe.
 */
public final class BranchFollower {
    private static final int LOCATE_ITERATIONS = 60;

    private final AugmentedSystem system;
    private final Corrector corrector;
    private final int n;
    private final double from, to, lo, hi;
    private final ContinuationSettings settings;
    private final long deadlineNanos;
    private final BooleanSupplier cancelled;
    private final double hMax, hMin;
    private final double[] jac; // dense f_u; null for a large model
    private final SparseMatrix sparseJac; // sparse f_u of a large model
    // the stability of the last point asked for (tests and the point record ask at the same point)
    private double[] stabilityAt;
    private LinearStability lastStability;
    private double lastScale;
    /** Neighbouring points have similar spectra: Arnoldi starts from the last point's pole and Ritz vectors. */
    private final RightmostEigenvalues.Memory eigenMemory = new RightmostEigenvalues.Memory();

    private final List<Branch> branches = new ArrayList<>();
    private final List<SpecialPoint> specials = new ArrayList<>();
    private final List<double[]> branchPointsSeen = new ArrayList<>();
    private final Deque<Seed> seeds = new ArrayDeque<>();
    private long corrections;
    /**
     * The parameter at the first point in [lo, hi] whose partial list of eigenvalues had none left of the axis (NaN:
     * none), and its branch.
     */
    private double hopfSightLostAt = Double.NaN;
    private int hopfSightLostOn;
    private ContinuationOutcome.Ending ending = ContinuationOutcome.Ending.COMPLETED;

    /** A place to start a branch: a point on it, the direction to go, and where it came from. */
    private record Seed(double[] x, double[] direction, String origin) {
    }

    /**
     * Test-function values at one point. {@code pairs} holds the real parts of the complex-conjugate pairs,
     * largest first, and {@code frequencies} their imaginary parts: a Hopf point is where the k-th largest of these
     * real parts crosses zero (an order statistic, continuous even when pairs overtake one another, unlike the real
     * part of the pair nearest the axis, which jumps where two pairs straddle it). {@code unstableReals} counts the
     * real eigenvalues right of the axis; {@code allUnstableListed} says whether the list holds every one right of
     * the axis (all eigenvalues, or a large model's rightmost ones when one of them is stable).
     */
    private record Tests(double fold, double branch, double[] pairs, double[] frequencies, int unstableReals,
            boolean allUnstableListed) {
        int unstablePairs() {
            int count = 0;
            for (double re : pairs) {
                count += re > 0 ? 1 : 0;
            }
            return count;
        }

        /** The real part of the pair of rank k (0: largest), NaN when there are not that many pairs. */
        double pair(int k) {
            return k >= 0 && k < pairs.length ? pairs[k] : Double.NaN;
        }
    }

    /**
     * @param parameterCount length of the full parameter vector
     * @param deadlineNanos  {@link System#nanoTime()} at which to stop, or {@link Long#MAX_VALUE}
     */
    public BranchFollower(VectorField field, ParameterVector parameters, int parameterCount, double from, double to,
            ContinuationSettings settings, long deadlineNanos, BooleanSupplier cancelled) {
        this.system = new AugmentedSystem(field, parameters, parameterCount);
        this.corrector = new Corrector(system);
        this.n = field.dimension();
        this.from = from;
        this.to = to;
        this.lo = Math.min(from, to);
        this.hi = Math.max(from, to);
        this.settings = settings;
        this.deadlineNanos = deadlineNanos;
        this.cancelled = cancelled;
        double width = Math.max(hi - lo, 1e-300);
        this.hMax = settings.maxStepFraction() * width;
        this.hMin = settings.minStepFraction() * Math.max(width, 1);
        this.jac = system.sparse() ? null : new double[n * n];
        this.sparseJac = system.sparse() ? field.sparseJacobian().newMatrix() : null;
    }

    /** Follows the branch through each of {@code equilibria} (states at λ = from), and the branches they meet. */
    public ContinuationOutcome follow(List<double[]> equilibria) {
        double[] towards = new double[n + 1];
        towards[n] = Math.signum(to - from) == 0 ? 1 : Math.signum(to - from);
        for (double[] u : equilibria) {
            double[] x = new double[n + 1];
            System.arraycopy(u, 0, x, 0, n);
            x[n] = from;
            seeds.add(new Seed(x, towards, "equilibrium at " + name() + " = " + number(from)));
        }
        while (!seeds.isEmpty() && ending == ContinuationOutcome.Ending.COMPLETED) {
            Seed seed = seeds.poll();
            if (covered(seed.x())) {
                continue;
            }
            if (branches.size() >= settings.maxBranches()) {
                ending = ContinuationOutcome.Ending.WORK_LIMIT;
                break;
            }
            trace(seed);
        }
        return new ContinuationOutcome(name(), from, to, ending, branches, specials, corrections, hopfSightLostAt,
                hopfSightLostOn);
    }

    private String name() {
        return system.parameters().name();
    }

    private void trace(Seed seed) {
        int number = branches.size() + 1; // the branch is added when it ends
        List<ContinuationPoint> points = new ArrayList<>();
        double[] x = seed.x().clone();
        double[] t = corrector.tangent(x, seed.direction());
        if (t == null) {
            points.add(point(x, null));
            branches.add(new Branch(number, seed.origin(), points, "no tangent at the start"));
            return;
        }
        points.add(point(x, null));
        Tests tests = tests(x, t);
        double h = hMax / 4;
        double[] first = x.clone();
        double[] predicted = new double[n + 1];
        double[] next = new double[n + 1];
        String end;
        while (true) {
            if (cancelled.getAsBoolean()) {
                ending = ContinuationOutcome.Ending.CANCELLED;
                end = "cancelled";
                break;
            }
            if (deadlineNanos != Long.MAX_VALUE && System.nanoTime() - deadlineNanos > 0) {
                ending = ContinuationOutcome.Ending.TIME_LIMIT;
                end = "wall-time limit";
                break;
            }
            if (points.size() >= settings.maxPointsPerBranch()) {
                ending = ContinuationOutcome.Ending.WORK_LIMIT;
                end = "point limit";
                break;
            }
            for (int i = 0; i <= n; i++) {
                predicted[i] = x[i] + h * t[i];
            }
            boolean ok = corrector.correct(predicted, t, next);
            corrections++;
            int effort = corrector.iterations;
            double[] tNext = ok ? corrector.tangent(next, t) : null;
            double turn = tNext == null ? -1 : Corrector.dot(t, tNext);
            if (tNext == null || (turn < settings.minTangentCosine() && h > 2 * hMin)) {
                h /= 2;
                if (h < hMin) {
                    end = "step size too small (the branch may end in a singularity)";
                    break;
                }
                continue;
            }
            Tests nextTests = tests(next, tNext);
            boolean outside = next[n] < lo || next[n] > hi;
            List<Located> located = new ArrayList<>();
            for (Change change : changes(tests, nextTests)) {
                Located l = locate(change, x, t, h, tests, nextTests, number);
                if (l != null) {
                    located.add(l);
                }
            }
            addInArclengthOrder(located, points);
            if (outside) {
                double[] boundary = boundary(x, next);
                if (boundary != null) {
                    points.add(point(boundary, null));
                }
                end = "reached " + name() + " = " + number(next[n] > hi ? hi : lo);
                break;
            }
            points.add(point(next, null));
            if (maxAbs(next, n) > settings.blowUpBound()) {
                end = "unbounded (|state| above " + number(settings.blowUpBound()) + ")";
                break;
            }
            if (points.size() > 5 && distance(next, first) < h / 2) {
                points.add(point(first, null));
                end = "closed loop";
                break;
            }
            System.arraycopy(next, 0, x, 0, n + 1);
            t = tNext;
            tests = nextTests;
            if (effort <= 3 && turn > 0.99) {
                h = Math.min(cap(x, t), 1.5 * h);
            } else if (effort > 5) {
                h *= 0.7;
            }
        }
        branches.add(new Branch(number, seed.origin(), points, end));
    }

    /**
     * The largest step at x: a fraction of the interval width or of the state's size, whichever is larger (a branch
     * at large state values is long in arclength), but never moving λ by more than a few such fractions of the
     * width in one step, so no special point is stepped over unseen.
     */
    private double cap(double[] x, double[] t) {
        double width = hMax / settings.maxStepFraction();
        double size = settings.maxStepFraction() * Math.max(width, maxAbs(x, n));
        double alongLambda = Math.abs(t[n]) > 0 ? 2.5 * hMax / Math.abs(t[n]) : Double.POSITIVE_INFINITY;
        return Math.min(size, alongLambda);
    }

    /** A test function that changes sign between two points; for Hopf, the rank of the crossing pair (else -1). */
    private record Change(SpecialPoint.Kind kind, int rank) {
    }

    /** A located special point, at this arclength from the step's start. */
    private record Located(double arclength, SpecialPoint special, ContinuationPoint point) {
    }

    private List<Change> changes(Tests a, Tests b) {
        List<Change> out = new ArrayList<>();
        boolean fold = Math.signum(a.fold()) * Math.signum(b.fold()) < 0;
        boolean branchPoint = Math.signum(a.branch()) * Math.signum(b.branch()) < 0;
        if (fold) {
            out.add(new Change(SpecialPoint.Kind.FOLD, -1));
        }
        if (branchPoint) {
            out.add(new Change(SpecialPoint.Kind.BRANCH_POINT, -1));
        }
        // A pair that crosses keeps its rank among the pairs; when the count of pairs in the right half-plane goes
        // from k to m, the pairs of ranks min(k, m) .. max(k, m) - 1 crossed, each at its own Hopf point. A pair can
        // also enter or leave the right half-plane by being born from (or splitting into) two real eigenvalues
        // there, off the axis: that changes the count of real eigenvalues right of the axis by two, and nothing is
        // claimed. A change by one is a real eigenvalue crossing zero (a fold or branch point in the same step).
        // A large model lists only its rightmost eigenvalues, and pairs come and go at the bottom of the list as
        // the spectrum moves: unless both lists hold every unstable eigenvalue, the count of pairs must also agree.
        int realsChange = Math.abs(a.unstableReals() - b.unstableReals());
        boolean realsAccounted = realsChange == 0 || (realsChange == 1 && (fold || branchPoint));
        boolean listsComparable = a.pairs().length == b.pairs().length
                || (a.allUnstableListed() && b.allUnstableListed());
        if (realsAccounted && listsComparable) {
            int before = a.unstablePairs(), after = b.unstablePairs();
            for (int rank = Math.min(before, after); rank < Math.max(before, after); rank++) {
                if (Math.signum(a.pair(rank)) * Math.signum(b.pair(rank)) < 0) {
                    out.add(new Change(SpecialPoint.Kind.HOPF, rank));
                }
            }
        }
        return out;
    }

    /**
     * Regula falsi (Illinois) for the zero of one test function on the arclength s in (0, h) from x along t: the
     * special point and its point on the branch, with its arclength (several in one step are recorded in arclength
     * order), or null when none was found.
     */
    private Located locate(Change change, double[] x, double[] t, double h, Tests at0, Tests atH, int branch) {
        SpecialPoint.Kind kind = change.kind();
        int rank = change.rank();
        double bestArclength = 0;
        RegulaFalsiBracket bracket = new RegulaFalsiBracket(0, value(kind, at0, rank), h, value(kind, atH, rank));
        double[] predicted = new double[n + 1];
        double[] best = null;
        double[] bestTangent = null;
        Tests bestTests = null;
        for (int k = 0; k < LOCATE_ITERATIONS; k++) {
            double s = bracket.trial();
            double[] y = new double[n + 1];
            boolean corrected = false;
            // exactly at a branch point the bordered matrix is singular (regula falsi hits it at once when the test
            // function is linear), so a failed correction is retried a hair to one side
            for (int attempt = 0; attempt < 3 && !corrected; attempt++) {
                double trial = s + attempt * 1e-9 * bracket.signedWidth();
                for (int i = 0; i <= n; i++) {
                    predicted[i] = x[i] + trial * t[i];
                }
                corrections++;
                corrected = corrector.correct(predicted, t, y);
                if (corrected) {
                    s = trial;
                }
            }
            if (!corrected) {
                break;
            }
            double[] ty = corrector.tangent(y, t);
            if (ty == null) {
                break;
            }
            // eigenvalues only when locating a Hopf point (folds and branch points need none)
            Tests ts = tests(y, ty, kind == SpecialPoint.Kind.HOPF);
            double fs = value(kind, ts, rank);
            if (Double.isNaN(fs)) { // no pair of that rank here (it left the list, or is not born yet): no Hopf point
                return null;
            }
            best = y;
            bestArclength = s;
            bestTangent = ty;
            bestTests = ts;
            if (fs == 0 || bracket.width() <= 1e-13 * (1 + maxAbs(y, n + 1))) {
                break;
            }
            bracket.update(s, fs);
            if (bracket.width() <= 1e-13 * (1 + maxAbs(y, n + 1))) {
                break;
            }
        }
        if (best == null || best[n] < lo || best[n] > hi) {
            return null;
        }
        // the k-th largest real part jumps where pairs are born or die; a sign change across such a jump is no
        // crossing of the axis, and regula falsi ends on the jump with the test far from zero
        if (kind == SpecialPoint.Kind.HOPF && !(Math.abs(value(kind, bestTests, rank)) <= 1e-5 * lastScale)) {
            return null;
        }
        double[] u = Arrays.copyOf(best, n);
        double frequency = Double.NaN, l1 = Double.NaN;
        if (kind == SpecialPoint.Kind.HOPF) {
            frequency = bestTests.frequencies()[rank]; // the crossing pair's (value() was finite, so it exists)
            l1 = FirstLyapunovCoefficient.at(system.field(), system.parameters().at(best[n]), u, frequency);
        }
        Located located = new Located(bestArclength, new SpecialPoint(kind, branch, best[n], u, frequency, l1),
                point(best, kind));
        if (kind == SpecialPoint.Kind.BRANCH_POINT) {
            switchBranches(best, bestTangent, branch);
        }
        return located;
    }

    /**
     * The special points located in one step, in arclength order, to the special points and the branch. A double
     * pair (two equal pairs, as modes k and -k of a symmetric ring) is located twice and kept once, without a first
     * Lyapunov coefficient: the one computed from an arbitrary eigenvector of its 4-dimensional centre space means
     * nothing.
     */
    private void addInArclengthOrder(List<Located> located, List<ContinuationPoint> points) {
        located.sort(Comparator.comparingDouble(Located::arclength));
        SpecialPoint previous = null;
        for (Located l : located) {
            if (previous != null && sameHopfPoint(previous, l.special())) {
                previous = new SpecialPoint(previous.kind(), previous.branch(), previous.parameter(), previous.state(),
                        previous.frequency(), Double.NaN);
                specials.set(specials.size() - 1, previous);
                continue;
            }
            previous = l.special();
            specials.add(previous);
            points.add(l.point());
        }
    }

    /** Two Hopf points of one step at the same point with the same frequency. */
    private boolean sameHopfPoint(SpecialPoint a, SpecialPoint b) {
        if (a.kind() != SpecialPoint.Kind.HOPF || b.kind() != SpecialPoint.Kind.HOPF
                || !(Math.abs(a.frequency() - b.frequency()) <= 1e-6 * Math.abs(a.frequency()))) {
            return false;
        }
        double[] x = Arrays.copyOf(a.state(), n + 1), y = Arrays.copyOf(b.state(), n + 1);
        x[n] = a.parameter();
        y[n] = b.parameter();
        return same(x, y);
    }

    /** Queues the other branch through a branch point, in both directions. */
    private void switchBranches(double[] x, double[] t, int branch) {
        for (double[] seen : branchPointsSeen) {
            if (same(seen, x)) {
                return;
            }
        }
        branchPointsSeen.add(x.clone());
        double[] t2 = corrector.secondTangent(x, t);
        if (t2 == null) {
            return;
        }
        double h = hMax / 10;
        String origin = "branch point at " + name() + " = " + number(x[n]) + " on branch " + branch;
        for (int sign = 1; sign >= -1; sign -= 2) {
            double[] direction = new double[n + 1];
            double[] predicted = new double[n + 1];
            for (int i = 0; i <= n; i++) {
                direction[i] = sign * t2[i];
                predicted[i] = x[i] + h * direction[i];
            }
            double[] y = new double[n + 1];
            corrections++;
            if (!corrector.correct(predicted, direction, y)) {
                continue;
            }
            // keep it only if it really left the first branch (not pulled back onto it)
            double[] d = new double[n + 1];
            for (int i = 0; i <= n; i++) {
                d[i] = y[i] - x[i];
            }
            double along = Corrector.dot(d, t);
            double off = Math.sqrt(Math.max(0, Corrector.dot(d, d) - along * along));
            if (off > 0.3 * Corrector.norm(d) && y[n] >= lo && y[n] <= hi) {
                seeds.add(new Seed(y, direction, origin));
            }
        }
    }

    /** The point where the branch meets λ = lo or hi, between an inside point and an outside one. */
    private double[] boundary(double[] inside, double[] outside) {
        double bound = outside[n] > hi ? hi : lo;
        double theta = (bound - inside[n]) / (outside[n] - inside[n]);
        double[] predicted = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            predicted[i] = inside[i] + theta * (outside[i] - inside[i]);
        }
        predicted[n] = bound;
        double[] direction = new double[n + 1];
        direction[n] = 1; // fixes λ at the bound
        double[] y = new double[n + 1];
        corrections++;
        return corrector.correct(predicted, direction, y) ? y : null;
    }

    private static double value(SpecialPoint.Kind kind, Tests tests, int hopfRank) {
        return switch (kind) {
            case FOLD -> tests.fold();
            case BRANCH_POINT -> tests.branch();
            case HOPF -> tests.pair(hopfRank);
        };
    }

    private Tests tests(double[] x, double[] t) {
        return tests(x, t, true);
    }

    /** Without {@code eigenvalues} the pairs are left empty (the fold and branch-point tests need none). */
    private Tests tests(double[] x, double[] t, boolean eigenvalues) {
        if (!eigenvalues) {
            return new Tests(t[n], corrector.branchTest(x, t), new double[0], new double[0], 0, false);
        }
        LinearStability s = stability(x);
        double[] re = s.real(), im = s.imaginary();
        double tolerance = settings.eigenTolerance() * lastScale;
        // one entry per pair (its +b member); real parts come sorted, largest first
        List<double[]> pairs = new ArrayList<>();
        int unstableReals = 0;
        double lowest = Double.POSITIVE_INFINITY;
        for (int k = 0; k < re.length; k++) {
            if (im[k] > tolerance) {
                pairs.add(new double[] {re[k], im[k]});
            } else if (Math.abs(im[k]) <= tolerance && re[k] > tolerance) { // zero as Classification has it
                unstableReals++;
            }
            lowest = Math.min(lowest, re[k]);
        }
        pairs.sort(Comparator.comparingDouble((double[] p) -> -p[0]));
        double[] real = new double[pairs.size()], frequency = new double[pairs.size()];
        for (int k = 0; k < real.length; k++) {
            real[k] = pairs.get(k)[0];
            frequency[k] = pairs.get(k)[1];
        }
        boolean finite = !Double.isNaN(lowest);
        if (finite && re.length > 0 && re.length < n && !(lowest < -tolerance) && Double.isNaN(hopfSightLostAt)
                && x[n] >= lo && x[n] <= hi) {
            hopfSightLostAt = x[n]; // pairs crossing further down the spectrum are out of the Hopf test's sight
            hopfSightLostOn = branches.size() + 1; // the branch being traced
        }
        return new Tests(t[n], corrector.branchTest(x, t), real, frequency, unstableReals,
                finite && (re.length == n || lowest < -tolerance));
    }

    /**
     * Eigenvalues and type at x: all of them from the dense f_u, or for a large model the rightmost from the sparse
     * one (see {@link LinearStability#ofSparse}). Sets {@link #lastScale}, the size zero is measured against (the
     * Frobenius norm, or the largest absolute row sum).
     */
    private LinearStability stability(double[] x) {
        if (stabilityAt != null && Arrays.equals(stabilityAt, x)) {
            return lastStability;
        }
        double scale = 0;
        if (jac != null) {
            system.stateJacobian(x, jac);
            lastStability = LinearStability.of(jac, n, settings.eigenTolerance());
            for (double a : jac) {
                scale += a * a;
            }
            scale = Math.sqrt(scale);
        } else {
            system.sparseStateJacobian(x, sparseJac);
            lastStability = LinearStability.ofSparse(sparseJac, settings.eigenTolerance(), this::stopped,
                    eigenMemory, true);
            scale = sparseJac.weightedRowNorm(null);
        }
        lastScale = scale;
        stabilityAt = x.clone();
        return lastStability;
    }

    private boolean stopped() {
        return cancelled.getAsBoolean() || (deadlineNanos != Long.MAX_VALUE && System.nanoTime() - deadlineNanos > 0);
    }

    private ContinuationPoint point(double[] x, SpecialPoint.Kind special) {
        LinearStability s = stability(x);
        double[] re = s.real(), im = s.imaginary();
        int keep = re.length;
        if (jac == null && keep == n && n > RightmostEigenvalues.WANTED) { // a ring's whole spectrum: as listed
            int halves = 0; // +b members minus -b members kept: no pair is cut in half
            for (keep = 0; keep < re.length && (keep < RightmostEigenvalues.WANTED || halves != 0); keep++) {
                halves += im[keep] > 0 ? 1 : im[keep] < 0 ? -1 : 0;
            }
        }
        return new ContinuationPoint(x[n], Arrays.copyOf(x, n), Arrays.copyOf(re, keep), Arrays.copyOf(im, keep),
                s.classification(), special);
    }

    /** True when x lies on a branch already followed (a start reached by an earlier branch). */
    private boolean covered(double[] x) {
        for (Branch b : branches) {
            for (ContinuationPoint p : b.points()) {
                double[] y = Arrays.copyOf(p.state(), n + 1);
                y[n] = p.parameter();
                if (same(x, y)) {
                    return true;
                }
            }
        }
        return false;
    }

    private boolean same(double[] a, double[] b) {
        double scale = 1 + Math.max(maxAbs(a, n + 1), maxAbs(b, n + 1));
        for (int i = 0; i <= n; i++) {
            if (Math.abs(a[i] - b[i]) > 1e-6 * scale) {
                return false;
            }
        }
        return true;
    }

    private static double distance(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += (a[i] - b[i]) * (a[i] - b[i]);
        }
        return Math.sqrt(s);
    }

    private static double maxAbs(double[] a, int count) {
        double m = 0;
        for (int i = 0; i < count; i++) {
            m = Math.max(m, Math.abs(a[i]));
        }
        return m;
    }

    /** x to six significant digits without trailing zeros, as continuation messages write parameter values. */
    public static String number(double x) {
        return String.format(Locale.ROOT, "%.6g", x).replaceAll("\\.?0+(e|$)", "$1");
    }

    /** Special points in the order of the branches and then of the parameter (for reports). */
    static Comparator<SpecialPoint> order() {
        return Comparator.comparingInt(SpecialPoint::branch).thenComparingDouble(SpecialPoint::parameter);
    }
}
