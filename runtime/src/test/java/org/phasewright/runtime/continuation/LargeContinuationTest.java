package org.phasewright.runtime.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.add;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.sub;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.assemble.ModelAssembler;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.equilibria.EquilibriumFinder;
import org.phasewright.runtime.equilibria.EquilibriumSettings;
import org.phasewright.runtime.equilibria.StartPoints;
import org.phasewright.runtime.linalg.Forced;
import org.phasewright.runtime.linalg.LatticeModels;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.EquilibriumContinuation;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.study.ContinuationResult;
import org.phasewright.runtime.study.RunSettings;
import org.phasewright.runtime.report.TextSummary;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.StudyRunner;

/** Continuation of models above the dense limit (200 states), with the sparse Jacobian. */
class LargeContinuationTest {

    static Expr at(Family f, int offset) {
        return ModelAssembler.element(f, add(new IndexValue("i"), c(offset)));
    }

    static ContinuationResult follow(DynamicalModel model, String parameter, double from, double to) {
        return run(model, parameter, from, to).continuations().get(0);
    }

    static StudyResult run(DynamicalModel model, String parameter, double from, double to) {
        CompiledModel compiled = ModelCompiler.compile(model);
        assertTrue(compiled.field().large());
        int index = model.parameters().stream().map(p -> p.name()).toList().indexOf(parameter);
        Variable p = new Variable(org.phasewright.runtime.model.VariableKind.PARAMETER, index, parameter);
        Study study = new Study("follow", List.of(new EquilibriumContinuation(p, new Constant(from),
                new Constant(to))));
        return StudyRunner.run(compiled, study, RunSettings.DEFAULT);
    }

    @Test
    void bratuFoldOnTwoHundredFiftyPoints() {
        // u'' + λ e^u = 0 on (0, 1), u = 0 at both ends: the lower branch turns back at λ_c = 3.513830719 (from
        // memory: e.g. Boyd, J. Sci. Comput. 1, 1986, for the 1D problem), with the second difference on 250
        // interior points a few 1e-5 away (O(h²), h = 1/251). Stable below the fold, one unstable direction above.
        ContinuationResult r = follow(LatticeModels.bratu(250, 0.5), "lambda", 0.5, 4);
        assertNotNull(r.continuation(), r.message());
        List<SpecialPoint> folds = r.continuation().specialPoints().stream()
                .filter(s -> s.kind() == SpecialPoint.Kind.FOLD).toList();
        assertEquals(1, folds.size(), r.message());
        assertEquals(3.513830719, folds.get(0).parameter(), 2e-4);
        Branch b = r.continuation().branches().get(0);
        ContinuationPoint first = b.points().get(0), last = b.points().get(b.points().size() - 1);
        assertEquals("stable", first.classification().type());
        assertEquals(1, last.classification().unstableDimension(), last.classification().type());
        assertTrue(r.message().contains("sparse Jacobian"), r.message());
    }

    @Test
    void sparseAndDenseFoldsAgreeOnTheSameModel() {
        // The same 150-point Bratu model followed dense (its own Jacobian) and through the sparse path (the field
        // forced large): the fold must be the same to the location tolerance.
        CompiledModel m = ModelCompiler.compile(LatticeModels.bratu(150, 0.5));
        ParameterVector parameters = new ParameterVector(m.model(), m.parameters(), 0);
        // Newton from u = 0 reaches the lower solution at λ = 0.5
        EquilibriumSettings one = new EquilibriumSettings(0, 0, 100, 1000, 1e-10, 1e-9, 1e-6, 1e-7);
        double[] lower = new EquilibriumFinder(m.field(), m.parameters(), one).find(StartPoints.build(
                m.parameters(), m.initialState(), List.of(), one), Long.MAX_VALUE, () -> false).equilibria().get(0)
                .coordinates();
        double dense = fold(new BranchFollower(m.field(), parameters, 1, 0.5, 4, ContinuationSettings.DEFAULT,
                Long.MAX_VALUE, () -> false).follow(List.of(lower)));
        double sparse = fold(new BranchFollower(Forced.sparse(m.model(), m.field()), parameters, 1, 0.5, 4,
                ContinuationSettings.DEFAULT, Long.MAX_VALUE, () -> false).follow(List.of(lower)));
        assertEquals(dense, sparse, 1e-7);
    }

    private static double fold(ContinuationOutcome o) {
        return o.specialPoints().stream().filter(s -> s.kind() == SpecialPoint.Kind.FOLD).findFirst()
                .orElseThrow().parameter();
    }

    /**
     * A ring of Brusselator cells (Prigogine &amp; Lefever, J. Chem. Phys. 48, 1968): u' = A - (B+1) u + u² v
     * + D (u_{i-1} - 2u_i + u_{i+1}), v' = B u - u² v + D (v_{i-1} - 2v_i + v_{i+1}), equal diffusion for both.
     */
    static DynamicalModel brusselatorRing(int cells, double a, double b, double d) {
        ModelAssembler m = new ModelAssembler("brusselator-ring", null, new TimeAxis("t", null));
        Variable pa = m.parameter("A", c(a), null, null, null);
        Variable pb = m.parameter("B", c(b), null, null, null);
        Variable pd = m.parameter("D", c(d), null, null, null);
        IndexRange range = new IndexRange("i", 1, cells, true);
        Family u = m.stateFamily("u", range, add(c(a), mul(c(0.01), new IndexValue("i"))), null, null);
        Family v = m.stateFamily("v", range, c(b / a), null, null);
        Expr u2v = mul(mul(at(u, 0), at(u, 0)), at(v, 0));
        Expr du = mul(pd, add(sub(at(u, -1), mul(c(2), at(u, 0))), at(u, 1)));
        Expr dv = mul(pd, add(sub(at(v, -1), mul(c(2), at(v, 0))), at(v, 1)));
        m.familyRate(u, add(add(sub(pa, mul(add(pb, c(1)), at(u, 0))), u2v), du));
        m.familyRate(v, add(sub(mul(pb, at(u, 0)), u2v), dv));
        return m.build(List.of(), List.of());
    }

    @Test
    void brusselatorRingLosesStabilityAtTheHopfPointOfItsUniformState() {
        // Uniform state u = A, v = B/A; the k = 0 block [[B-1, A²], [-B, -A²]] has trace B - 1 - A², so a Hopf
        // point at B = 1 + A² = 5 for A = 2 with frequency A = 2 (Prigogine & Lefever 1968). Mode k has trace
        // B - 1 - A² - 4D (1 - cos(2πk/N)), so with D = 50 the next Hopf point (k = ±1) is at B = 5.175, beyond the
        // interval; with equal diffusion no Turing instability occurs ((1 + A sqrt(Du/Dv))² = 9).
        StudyResult study = run(brusselatorRing(150, 2, 3, 50), "B", 3, 5.1);
        ContinuationResult r = study.continuations().get(0);
        assertNotNull(r.continuation(), r.message());
        List<SpecialPoint> hopf = r.continuation().specialPoints().stream()
                .filter(s -> s.kind() == SpecialPoint.Kind.HOPF).toList();
        // the old test function (real part of the pair nearest the axis) also flagged B = 5.0877, where the k = 0
        // pair (right of the axis) and the k = ±1 pair (left of it) are equally near
        assertEquals(1, hopf.size(), r.message());
        assertEquals(5.0, hopf.get(0).parameter(), 1e-7);
        assertEquals(2.0, hopf.get(0).frequency(), 1e-6);
        // l1 of the uniform mode with q, p normalised over all 2N states is the single cell's divided by N (each
        // of the forms is a sum over N cells of terms N^(-2)); the cell's l1 from the dense path, itself checked
        // against the Hopf normal form in BranchFollowerTest. Negative: supercritical.
        double cell = FirstLyapunovCoefficient.at(ModelCompiler.compile(brusselatorRing(1, 2, 5, 50)).field(),
                new double[] {2, 5, 50}, new double[] {2, 2.5}, 2);
        assertTrue(cell < 0, "cell l1 " + cell);
        assertEquals(cell / 150, hopf.get(0).firstLyapunovCoefficient(), 1e-5 * Math.abs(cell / 150));
        assertEquals("supercritical", hopf.get(0).criticality());
        assertTrue(r.cycles().isEmpty());
        // points list the rightmost of the ring's whole spectrum without cutting a pair (modes ±k give equal pairs)
        for (ContinuationPoint p : r.continuation().branches().get(0).points()) {
            long upper = java.util.Arrays.stream(p.eigenvaluesImag()).filter(im -> im > 0).count();
            long lower = java.util.Arrays.stream(p.eigenvaluesImag()).filter(im -> im < 0).count();
            assertEquals(upper, lower, "at B = " + p.parameter());
            assertTrue(p.eigenvaluesReal().length >= 12 && p.eigenvaluesReal().length <= 14);
        }
        // the summary's table of special points keeps the first 16 of the 300 states (our own output rule)
        String summary = TextSummary.render(study);
        assertTrue(summary.contains("u[16]  ...  notes"), summary);
        assertTrue(!summary.contains("u[17]") && summary.contains("supercritical, first Lyapunov coefficient"),
                summary);
    }

    @Test
    void forcedRingMeetsItsHopfPointsInTheOrderOfTheClosedForm() {
        // The Lorenz (1996) ring at its uniform state x_i = F: f_u = F (S - S^-2) - I with (S x)_i = x_{i+1}, a
        // circulant with eigenvalues F (w^k - w^-2k) - 1, w = exp(2πi/N) (Gray 2006). Mode pair ±k crosses the
        // imaginary axis at F_k = 1 / (cos θ - cos 2θ), θ = 2πk/N, with frequency F_k (sin θ + sin 2θ); their
        // least value is 8/9 at cos θ = 1/4 (from memory: van Kekem & Sterk, Physica D 2018). For N = 600, 17 pairs
        // cross between F = 0.8888 and 0.9, several within one continuation step: each is its own Hopf point, in
        // order, also after more than the 12 listed eigenvalues have become unstable (the ring's whole spectrum is
        // known at a uniform state).
        int n = 600;
        ContinuationResult r = follow(LatticeModels.lorenz96(n, 0.5, true), "F", 0.5, 0.9);
        assertNotNull(r.continuation(), r.message());
        List<SpecialPoint> hopf = r.continuation().specialPoints().stream()
                .filter(s -> s.kind() == SpecialPoint.Kind.HOPF).toList();
        List<double[]> expected = new ArrayList<>(); // {F_k, frequency}, increasing F_k < 0.9
        for (int k = 1; k < n / 2; k++) {
            double theta = 2 * Math.PI * k / n, fk = 1 / (Math.cos(theta) - Math.cos(2 * theta));
            if (fk > 0 && fk < 0.9) {
                expected.add(new double[] {fk, fk * (Math.sin(theta) + Math.sin(2 * theta))});
            }
        }
        expected.sort(java.util.Comparator.comparingDouble(e -> e[0]));
        assertEquals(17, expected.size());
        assertEquals(expected.size(), hopf.size(), r.message());
        for (int j = 0; j < expected.size(); j++) {
            assertEquals(expected.get(j)[0], hopf.get(j).parameter(), 1e-8, "Hopf point " + j);
            assertEquals(expected.get(j)[1], hopf.get(j).frequency(), 1e-7, "Hopf point " + j);
        }
        assertTrue(!r.message().contains("may be missed"), r.message());
    }

    @Test
    void theMessageSaysWhereTheHopfTestLosesSightOfCrossings() {
        // eight pairs λ - 0.01j ± (1 + 0.1j) i, j = 0..7, among 100 stable foci (block eigenvalues in closed form,
        // as in HopfTestFunctionTest): the 12 rightmost eigenvalues hold the first six pairs, all unstable from
        // λ = 0.05 on, so the crossings at 0.06 and 0.07 are out of sight, and the message says so
        List<HopfTestFunctionTest.Block> crossing = new ArrayList<>();
        for (int j = 0; j < 8; j++) {
            double im = 1 + 0.1 * j;
            crossing.add(new HopfTestFunctionTest.Block(-0.01 * j, 1, 1, -im * im, 0, -0.01 * j, 1));
        }
        DynamicalModel m = HopfTestFunctionTest.model(HopfTestFunctionTest.withStableFoci(100, 0.05,
                crossing.toArray(HopfTestFunctionTest.Block[]::new)));
        ContinuationResult r = follow(m, "lambda", -0.1, 0.2);
        List<SpecialPoint> hopf = r.continuation().specialPoints().stream()
                .filter(s -> s.kind() == SpecialPoint.Kind.HOPF).toList();
        assertEquals(6, hopf.size(), r.message());
        for (int j = 0; j < 6; j++) {
            assertEquals(0.01 * j, hopf.get(j).parameter(), 1e-8);
            assertEquals(1 + 0.1 * j, hopf.get(j).frequency(), 1e-8);
        }
        double lost = r.continuation().hopfSightLostAt();
        assertTrue(lost >= 0.05 - 1e-8 && lost < 0.06, "lost sight at " + lost);
        assertTrue(r.message().contains(" on branch 1 every listed eigenvalue is unstable, so Hopf points further "
                + "down the spectrum may be missed"), r.message());
        // ending just before: no point in the interval loses sight (the step past its end does not count)
        ContinuationResult shorter = follow(m, "lambda", -0.1, 0.0499);
        assertTrue(Double.isNaN(shorter.continuation().hopfSightLostAt()), shorter.message());
        assertTrue(!shorter.message().contains("may be missed"), shorter.message());
    }

    /** x_i' = λ x_i - x_i³ + D (x_{i-1} - 2x_i + x_{i+1}) on a ring. */
    static DynamicalModel cubicRing(int cells, double lambda, double d) {
        ModelAssembler m = new ModelAssembler("cubic-ring", null, new TimeAxis("t", null));
        Variable l = m.parameter("lambda", c(lambda), null, null, null);
        Variable pd = m.parameter("D", c(d), null, null, null);
        Family x = m.stateFamily("x", new IndexRange("i", 1, cells, true), c(0), null, null);
        Expr cube = mul(mul(at(x, 0), at(x, 0)), at(x, 0));
        m.familyRate(x, add(sub(mul(l, at(x, 0)), cube), mul(pd, add(sub(at(x, -1), mul(c(2), at(x, 0))),
                at(x, 1)))));
        return m.build(List.of(), List.of());
    }

    @Test
    void pitchforkOfTheRestingRingIsLocatedAndItsOtherBranchFollowed() {
        // The rest state x = 0 of every cell: f_u = λ I + D L with eigenvalues λ - 2D (1 - cos θ_k); the uniform
        // mode k = 0 crosses zero alone at λ = 0, a simple branch point (pitchfork, x -> -x). The modes k = ±1
        // cross together (a double eigenvalue), which leaves the determinant's sign unchanged.
        // The cells' state is uniform on both branches: the classification is exact (block circulant).
        ContinuationResult r = follow(cubicRing(250, -0.5, 1), "lambda", -0.5, 0.5);
        assertNotNull(r.continuation(), r.message());
        List<SpecialPoint> branch = r.continuation().specialPoints().stream()
                .filter(s -> s.kind() == SpecialPoint.Kind.BRANCH_POINT).toList();
        assertEquals(1, branch.size(), r.message());
        assertEquals(0.0, branch.get(0).parameter(), 1e-8);
        // the other branch through it: x_i = ±sqrt(λ) in every cell (λ x - x³ = 0, no diffusion between equal cells)
        List<Branch> others = r.continuation().branches().stream().filter(b -> b.origin().startsWith("branch point"))
                .toList();
        assertEquals(2, others.size(), r.message());
        for (Branch b : others) {
            ContinuationPoint end = b.points().get(b.points().size() - 1);
            assertEquals(0.5, end.parameter(), 1e-9, b.ending());
            for (double x : end.state()) {
                assertEquals(Math.sqrt(0.5), Math.abs(x), 1e-8);
            }
            assertEquals("stable node", end.classification().type()); // eigenvalues -2λ - 2D(1 - cos θ_k), real
        }
    }
}
