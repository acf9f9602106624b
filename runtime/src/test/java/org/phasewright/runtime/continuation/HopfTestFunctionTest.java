package org.phasewright.runtime.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.add;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.param;
import static org.phasewright.runtime.TestModels.parameter;
import static org.phasewright.runtime.TestModels.state;
import static org.phasewright.runtime.TestModels.stateVar;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.StateVariable;
import org.phasewright.runtime.model.Variable;

/**
 * The Hopf test on linear models u' = A(λ) u built from 2×2 blocks whose eigenvalues are known in closed form
 * (common practice: a block [[a, b], [c, d]] has eigenvalues (a+d)/2 ± sqrt(((a-d)/2)² + bc)).
 */
class HopfTestFunctionTest {

    /** A block [[a0 + a1 λ, b], [c0 + c1 λ, d0 + d1 λ]]. */
    record Block(double a0, double a1, double b, double c0, double c1, double d0, double d1) {
    }

    static DynamicalModel model(Block... blocks) {
        List<StateVariable> states = new ArrayList<>();
        List<Expr> rates = new ArrayList<>();
        Variable l = param(0, "lambda");
        for (int k = 0; k < blocks.length; k++) {
            states.add(stateVar("x" + k, 0));
            states.add(stateVar("y" + k, 0));
        }
        for (int k = 0; k < blocks.length; k++) {
            Block b = blocks[k];
            Variable x = state(2 * k, "x" + k), y = state(2 * k + 1, "y" + k);
            Expr a = add(c(b.a0()), mul(c(b.a1()), l)), cc = add(c(b.c0()), mul(c(b.c1()), l));
            Expr d = add(c(b.d0()), mul(c(b.d1()), l));
            rates.add(add(mul(a, x), mul(c(b.b()), y)));
            rates.add(add(mul(cc, x), mul(d, y)));
        }
        return TestModels.model("linear", states, List.of(parameter("lambda", c(0))), List.of(), rates);
    }

    static ContinuationOutcome follow(DynamicalModel m, double from, double to) {
        CompiledModel cm = ModelCompiler.compile(m);
        return new BranchFollower(cm.field(), new ParameterVector(m, cm.parameters(), 0), 1, from, to,
                ContinuationSettings.DEFAULT, Long.MAX_VALUE, () -> false)
                .follow(List.of(new double[cm.field().dimension()]));
    }

    static List<SpecialPoint> hopf(DynamicalModel m, double from, double to) {
        return hopf(follow(m, from, to));
    }

    static List<SpecialPoint> hopf(ContinuationOutcome o) {
        return o.specialPoints().stream().filter(s -> s.kind() == SpecialPoint.Kind.HOPF).toList();
    }

    /** The branch u = 0 of a linear model runs straight from {@code from} to {@code to}: λ along it is monotone. */
    static void assertPointsInOrder(ContinuationOutcome o, double from, double to) {
        assertEquals(1, o.branches().size());
        List<ContinuationPoint> points = o.branches().get(0).points();
        for (int i = 1; i < points.size(); i++) {
            double step = points.get(i).parameter() - points.get(i - 1).parameter();
            assertTrue(step * Math.signum(to - from) >= 0, "point " + i + " goes back");
        }
    }

    static void assertHopfPoint(double parameter, double frequency, SpecialPoint s, double tolerance) {
        assertEquals(parameter, s.parameter(), tolerance);
        assertEquals(frequency, s.frequency(), tolerance);
    }

    /** The positions of the Hopf points among the points of the first branch. */
    static List<Integer> hopfPositions(ContinuationOutcome o) {
        List<ContinuationPoint> points = o.branches().get(0).points();
        List<Integer> at = new ArrayList<>();
        for (int i = 0; i < points.size(); i++) {
            if (points.get(i).special() == SpecialPoint.Kind.HOPF) {
                at.add(i);
            }
        }
        return at;
    }

    /** Complex pairs among a point's listed eigenvalues. */
    static long pairsListed(ContinuationPoint p) {
        return java.util.Arrays.stream(p.eigenvaluesImag()).filter(im -> im > 1e-9).count();
    }

    /** {@code first}, then {@code count} stable foci -1 - 0.01k ± (1 + dk) i, k = 0, 1, ... */
    static Block[] withStableFoci(int count, double d, Block... first) {
        List<Block> blocks = new ArrayList<>(List.of(first));
        for (int k = 0; k < count; k++) {
            double re = -1 - 0.01 * k, im = 1 + d * k;
            blocks.add(new Block(re, 0, 1, -im * im, 0, re, 0));
        }
        return blocks.toArray(Block[]::new);
    }

    static final Block STABLE_FOCUS = new Block(-1, 0, 1, -1, 0, -1, 0); // -1 ± i
    static final Block UNSTABLE_FOCUS = new Block(0.3, 0, 1, -4, 0, 0.3, 0); // 0.3 ± 2i
    /** 0.45 ± sqrt(λ): two real eigenvalues right of the axis for λ > 0, a pair right of it for λ < 0. */
    static final Block REALS_TO_PAIR = new Block(0.45, 0, 1, 0, 1, 0.45, 0);

    @Test
    void aPairBornOffTheAxisIsNoHopfPoint() {
        // at λ = 0 two unstable real eigenvalues meet and leave as a pair with real part 0.45: nothing crosses the
        // imaginary axis, with or without other pairs present, in either direction
        assertEquals(0, hopf(model(REALS_TO_PAIR, STABLE_FOCUS), 0.04, -0.04).size());
        assertEquals(0, hopf(model(REALS_TO_PAIR, STABLE_FOCUS, UNSTABLE_FOCUS), 0.04, -0.04).size());
        assertEquals(0, hopf(model(REALS_TO_PAIR, STABLE_FOCUS), -0.04, 0.04).size());
    }

    @Test
    void pairsCrossingTheAxisAreEachLocatedWithTheirFrequencies() {
        // re = λ with frequency 1, and re = λ - 0.2 with frequency 3: Hopf points at λ = 0 and λ = 0.2
        Block first = new Block(0, 1, 1, -1, 0, 0, 1), second = new Block(-0.2, 1, 1, -9, 0, -0.2, 1);
        List<SpecialPoint> points = hopf(model(first, second, STABLE_FOCUS), -0.5, 0.5);
        assertEquals(2, points.size());
        assertHopfPoint(0.0, 1.0, points.get(0), 1e-9);
        assertHopfPoint(0.2, 3.0, points.get(1), 1e-9);
    }

    @Test
    void twoPairsCrossingWithinOneStepAreBothLocatedInOrder() {
        // re = λ with frequency 1 and re = λ - 0.0001 with frequency 3: both cross inside one continuation step
        // (the steps are some hundredths of the interval), each at its own Hopf point, found in the order met
        Block first = new Block(0, 1, 1, -1, 0, 0, 1), second = new Block(-0.0001, 1, 1, -9, 0, -0.0001, 1);
        DynamicalModel m = model(first, second, STABLE_FOCUS);
        ContinuationOutcome up = follow(m, -0.5, 0.5);
        assertTwoHopfPointsInOneStep(up, 1e-9);
        assertPointsInOrder(up, -0.5, 0.5);
        ContinuationOutcome down = follow(m, 0.5, -0.5);
        assertPointsInOrder(down, 0.5, -0.5);
        assertEquals(2, hopf(down).size());
        assertHopfPoint(0.0001, 3.0, hopf(down).get(0), 1e-9);
        assertHopfPoint(0.0, 1.0, hopf(down).get(1), 1e-9);
    }

    /** Hopf points at λ = 0 (frequency 1) and 1e-4 (frequency 3), neighbours on the branch: found in one step. */
    static void assertTwoHopfPointsInOneStep(ContinuationOutcome o, double tolerance) {
        List<SpecialPoint> points = hopf(o);
        assertEquals(2, points.size());
        assertHopfPoint(0.0, 1.0, points.get(0), tolerance);
        assertHopfPoint(0.0001, 3.0, points.get(1), tolerance);
        List<Integer> at = hopfPositions(o);
        assertEquals(at.get(0) + 1, at.get(1));
    }

    @Test
    void twoPairsCrossingWithinOneStepAreBothLocatedInALargeModel() {
        // the same two crossing pairs among 101 stable foci -1 - 0.01k ± (1 + 0.05k) i: 206 states, so the test
        // reads the rightmost eigenvalues of the sparse Jacobian instead of the full spectrum
        DynamicalModel m = model(withStableFoci(101, 0.05, new Block(0, 1, 1, -1, 0, 0, 1),
                new Block(-0.0001, 1, 1, -9, 0, -0.0001, 1)));
        assertTwoHopfPointsInOneStep(follow(m, -0.5, 0.5), 1e-8);
    }

    @Test
    void aHopfPointIsFoundWhileEigenvaluesEnterTheBottomOfALargeModelsList() {
        // re = λ with frequency 1 crosses at λ = 0 while two real eigenvalues -1.045 - 20λ and -1.046 - 20λ fall
        // through the bottom of the list of rightmost eigenvalues, so the two ends of that step list different
        // numbers of pairs (a stable pair enters the list as the reals leave it). Stable foci -1 - 0.01k ± i; the
        // Hopf point is the one of the crossing pair alone (block eigenvalues in closed form, as above).
        DynamicalModel m = model(withStableFoci(100, 0, new Block(0, 1, 1, -1, 0, 0, 1),
                new Block(-1.045, -20, 0, 0, 0, -1.046, -20)));
        ContinuationOutcome o = follow(m, -0.5, 0.5);
        List<SpecialPoint> points = hopf(o);
        assertEquals(1, points.size());
        assertHopfPoint(0.0, 1.0, points.get(0), 1e-8);
        // the setup: the points either side of the Hopf point list different numbers of pairs
        List<ContinuationPoint> branch = o.branches().get(0).points();
        int at = hopfPositions(o).get(0);
        assertTrue(pairsListed(branch.get(at - 1)) != pairsListed(branch.get(at + 1)));
    }

    @Test
    void aPairBornOffTheAxisIsNoHopfPointInALargeModelEither() {
        // REALS_TO_PAIR among 102 stable foci: 206 states, only the rightmost eigenvalues listed
        DynamicalModel m = model(withStableFoci(102, 0, REALS_TO_PAIR));
        assertEquals(0, hopf(m, 0.04, -0.04).size());
        assertEquals(0, hopf(m, -0.04, 0.04).size());
    }

    @Test
    void aPairBornWhileAnotherDiesInOneStepIsNoHopfPoint() {
        // going down from λ = 0.04: an unstable pair 0.45 ± i sqrt(-λ) is born from two reals at λ = 0, and the
        // stable pair -0.5 ± i sqrt(λ + 1e-5) splits into two reals at λ = -1e-5, in the same step: the count of
        // pairs is the same at both ends, but the count of unstable real eigenvalues falls by two
        Block splitting = new Block(-0.5, 0, 1, -1e-5, -1, -0.5, 0);
        assertEquals(0, hopf(model(REALS_TO_PAIR, splitting, STABLE_FOCUS), 0.04, -0.04).size());
    }

    @Test
    void aPairBornWhileARealEigenvalueCrossesZeroIsNoHopfPoint() {
        // going down from λ = 0.04: the unstable pair is born from two reals at λ = 0 while the real eigenvalue
        // -1e-5 - λ turns positive at λ = -1e-5 (a branch point of the rest state), in one step. The count of
        // unstable reals changes by one, as at a lone branch point, and the rank of the first pair changes sign;
        // but its test function jumps (at the birth) instead of passing through zero
        Block turning = new Block(-1e-5, -1, 0, 0, 0, -1, 0);
        List<SpecialPoint> special = follow(model(REALS_TO_PAIR, turning, STABLE_FOCUS), 0.04, -0.04).specialPoints();
        assertEquals(0, special.stream().filter(s -> s.kind() == SpecialPoint.Kind.HOPF).count(), special.toString());
        assertTrue(special.stream().anyMatch(s -> s.kind() == SpecialPoint.Kind.BRANCH_POINT
                && Math.abs(s.parameter() + 1e-5) < 1e-9), special.toString());
    }

    @Test
    void aDoublePairCrossingIsOneHopfPoint() {
        // two equal pairs λ ± i (as modes k and -k of a symmetric ring have): one Hopf point, dense and sparse
        Block crossing = new Block(0, 1, 1, -1, 0, 0, 1);
        List<SpecialPoint> dense = hopf(model(crossing, crossing, STABLE_FOCUS), -0.5, 0.5);
        assertEquals(1, dense.size());
        assertEquals(0.0, dense.get(0).parameter(), 1e-9);
        // two equal pairs span a 4-dimensional centre space: no first Lyapunov coefficient of one pair applies
        assertEquals("criticality not computed", dense.get(0).criticality());
        List<SpecialPoint> sparse = hopf(model(withStableFoci(101, 0.05, crossing, crossing)), -0.5, 0.5);
        assertEquals(1, sparse.size());
        assertEquals(0.0, sparse.get(0).parameter(), 1e-8);
    }

    @Test
    void aHopfPointAndABranchPointInOneStepAreBothFoundInALargeModel() {
        // re = λ with frequency 1, and a real eigenvalue λ - 5e-5 (the other of its block -1): the real one makes
        // the rest state singular at λ = 5e-5, a branch point, in the same step as the Hopf point at λ = 0. The
        // other branch there is a straight line of equilibria, stopped early by a low blow-up bound.
        DynamicalModel m = model(withStableFoci(101, 0.05, new Block(0, 1, 1, -1, 0, 0, 1),
                new Block(-5e-5, 1, 0, 0, 0, -1, 0)));
        CompiledModel cm = ModelCompiler.compile(m);
        List<SpecialPoint> special = new BranchFollower(cm.field(), new ParameterVector(m, cm.parameters(), 0), 1,
                -0.5, 0.5, ContinuationSettings.DEFAULT.withBlowUpBound(1), Long.MAX_VALUE, () -> false)
                .follow(List.of(new double[cm.field().dimension()])).specialPoints();
        List<SpecialPoint> hopf = special.stream().filter(s -> s.kind() == SpecialPoint.Kind.HOPF).toList();
        assertEquals(1, hopf.size());
        assertEquals(0.0, hopf.get(0).parameter(), 1e-8);
        assertTrue(special.stream().anyMatch(s -> s.kind() == SpecialPoint.Kind.BRANCH_POINT
                && Math.abs(s.parameter() - 5e-5) < 1e-8), special.toString());
    }
}
