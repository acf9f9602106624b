package org.phasewright.runtime.symmetry;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.add;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.call;
import static org.phasewright.runtime.TestModels.div;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.neg;
import static org.phasewright.runtime.TestModels.pow;
import static org.phasewright.runtime.TestModels.state;
import static org.phasewright.runtime.TestModels.stateVar;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.MathFunction;
import org.phasewright.runtime.model.Symmetry;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.RunSettings;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.StudyRunner;

/** Equivariance checks, discovery and the use of symmetries on equilibria. */
class SymmetryTest {

    private static DynamicalModel withSymmetries(DynamicalModel m, Symmetry... symmetries) {
        return new DynamicalModel(m.name(), m.title(), m.time(), m.states(), m.parameters(), m.derived(), m.rates(),
                List.of(symmetries), m.studies());
    }

    /** Lorenz's map (x, y, z) -> (-x, -y, z). */
    private static Symmetry rotation() {
        return new Symmetry("rotation", List.of(neg(state(0, "x")), neg(state(1, "y")), state(2, "z")), false);
    }

    private static EquivarianceCheck checkOf(DynamicalModel m) {
        return new EquivarianceCheck(PreparedField.of(m), "t");
    }

    private static LinearMap map(Symmetry s, int n) {
        return LinearMap.of(s, n).orElseThrow();
    }

    @Test
    void lorenzRotationHoldsExactly() {
        // Lorenz (1963), J. Atmos. Sci. 20:130-141: the equations are unchanged when X and Y change sign.
        DynamicalModel lorenz = TestModels.lorenz();
        EquivarianceVerdict verdict = checkOf(lorenz).check(map(rotation(), 3));
        assertTrue(verdict.holds(), verdict.toString());
        assertEquals(EquivarianceVerdict.Method.NORMAL_FORM, verdict.method());
    }

    @Test
    void lorenzIsNotSymmetricUnderFlippingZ() {
        // z -> -z: the y rate has x*z, which changes sign, and r*x - y, which does not (Lorenz 1963, eq. 26),
        // so y is the first rate to break it.
        Symmetry flipZ = new Symmetry("flip", List.of(state(0, "x"), state(1, "y"), neg(state(2, "z"))), false);
        EquivarianceVerdict verdict = checkOf(TestModels.lorenz()).check(map(flipZ, 3));
        assertEquals(EquivarianceVerdict.Outcome.BROKEN, verdict.outcome());
        assertEquals(1, verdict.brokenRate());
        assertTrue(verdict.leftSide().contains("x*z"), verdict.leftSide());
        assertTrue(verdict.rightSide().contains("x*z"), verdict.rightSide());
        assertFalse(verdict.leftSide().equals(verdict.rightSide()));
    }

    @Test
    void lorenzRotationIsDiscoveredAndOnlyWhenUndeclared() {
        DynamicalModel lorenz = TestModels.lorenz();
        PreparedField field = PreparedField.of(lorenz);
        List<SymmetryDiscovery.Found> found = new SymmetryDiscovery(field, checkOf(lorenz)).discover(List.of());
        assertEquals(1, found.size(), found.toString()); // Lorenz (1963): the sign change of X and Y, nothing else
        assertEquals("symmetry s1: x -> -x, y -> -y", found.get(0).symmetry().declaration("s1", field.stateNames()));
        assertTrue(new SymmetryDiscovery(field, checkOf(lorenz)).discover(List.of(map(rotation(), 3))).isEmpty());
    }

    /** θ' = ω, ω' = -sin θ: the pendulum, whose rates are not polynomials, so checks sample. */
    private static DynamicalModel pendulum() {
        Expr theta = state(0, "theta"), omega = state(1, "omega");
        return new DynamicalModel("pendulum", null, TimeAxis.DEFAULT,
                List.of(stateVar("theta", 1), stateVar("omega", 0)), List.of(), List.of(),
                List.of(omega, neg(call(MathFunction.SIN, theta))), List.of(), List.of());
    }

    @Test
    void pendulumIsOddAndReversibleBySampling() {
        // Common practice in mechanics (Lamb & Roberts, Physica D 112 (1998) 1-39, sec. 1): a Hamiltonian system
        // with H even in the momentum is reversible under p -> -p; the pendulum's H is even in theta as well.
        DynamicalModel m = pendulum();
        EquivarianceCheck check = checkOf(m);
        assertFalse(check.exact());
        Symmetry odd = new Symmetry("odd", List.of(neg(state(0, "theta")), neg(state(1, "omega"))), false);
        Symmetry reversal = new Symmetry("reversal", List.of(state(0, "theta"), neg(state(1, "omega"))), true);
        Symmetry reversalForward = new Symmetry("wrong", List.of(state(0, "theta"), neg(state(1, "omega"))), false);
        EquivarianceVerdict oddVerdict = check.check(map(odd, 2));
        assertTrue(oddVerdict.holds());
        assertEquals(EquivarianceVerdict.Method.SAMPLED, oddVerdict.method());
        assertEquals(EquivarianceCheck.SAMPLES, oddVerdict.samples());
        assertTrue(check.check(map(reversal, 2)).holds());
        assertEquals(EquivarianceVerdict.Outcome.BROKEN, check.check(map(reversalForward, 2)).outcome());
        // Discovery: the group {id, odd, reversal, odd∘reversal} needs two generators.
        List<SymmetryDiscovery.Found> found = new SymmetryDiscovery(PreparedField.of(m), check).discover(List.of());
        assertEquals(2, found.size(), found.toString());
        assertEquals(1, found.stream().filter(f -> f.symmetry().reversesTime()).count());
    }

    @Test
    void rationalRatesAreCheckedExactly() {
        // x' = x/(1 + y^2), y' = -y: even in y and odd in x by inspection (closed form).
        Expr x = state(0, "x"), y = state(1, "y");
        DynamicalModel m = new DynamicalModel("rational", null, TimeAxis.DEFAULT,
                List.of(stateVar("x", 1), stateVar("y", 1)), List.of(), List.of(),
                List.of(div(x, add(c(1), pow(y, c(2)))), neg(y)), List.of(), List.of());
        EquivarianceCheck check = checkOf(m);
        assertTrue(check.exact());
        Symmetry flipY = new Symmetry("flipY", List.of(x, neg(y)), false);
        Symmetry swap = new Symmetry("swap", List.of(y, x), false);
        assertTrue(check.check(map(flipY, 2)).holds());
        assertEquals(EquivarianceVerdict.Outcome.BROKEN, check.check(map(swap, 2)).outcome());
    }

    @Test
    void linearityAndInvertibility() {
        Expr x = state(0, "x"), y = state(1, "y");
        assertTrue(LinearMap.nonlinearImage(new Symmetry("sq", List.of(mul(x, x), y), false), 2).isPresent());
        assertFalse(LinearMap.of(new Symmetry("collapse", List.of(x, x), false), 2).orElseThrow().invertible());
        assertTrue(LinearMap.of(new Symmetry("shear", List.of(add(x, y), y), false), 2).orElseThrow().invertible());
    }

    @Test
    void lorenzEquilibriaFormOrbitsAndTheZAxisIsInvariant() {
        DynamicalModel lorenz = withSymmetries(TestModels.lorenz(TestModels.study("s", TestModels.equilibria())),
                rotation());
        StudyResult result = StudyRunner.run(ModelCompiler.compile(lorenz), lorenz.studies().get(0),
                RunSettings.DEFAULT);
        EquilibriumResult search = result.equilibriumSearches().get(0);
        // Lorenz (1963), steady convection: the origin and C± = (±sqrt(b(r-1)), ±sqrt(b(r-1)), r-1).
        assertEquals(3, search.equilibria().size());
        SymmetryReport report = search.symmetry();
        List<Integer> orbitOfNonTrivial = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            Equilibrium e = search.equilibria().get(k);
            EquilibriumSymmetry s = report.equilibria().get(k);
            if (Math.abs(e.coordinates()[0]) < 1e-9) {
                assertEquals(List.of("rotation"), s.isotropy()); // the origin is fixed by the rotation
            } else {
                assertEquals(Math.sqrt(8.0 / 3 * 27), Math.abs(e.coordinates()[0]), 1e-8);
                assertTrue(s.isotropy().isEmpty());
                orbitOfNonTrivial.add(s.orbit());
            }
        }
        assertEquals(2, orbitOfNonTrivial.size());
        assertEquals(orbitOfNonTrivial.get(0), orbitOfNonTrivial.get(1));
        assertEquals(1, report.orbitSentences().size());
        assertTrue(report.orbitSentences().get(0).endsWith("are images under rotation"));
        // Fix(rotation) = {x = y = 0}, invariant by Golubitsky, Stewart & Schaeffer vol. II, ch. XIII §2;
        // check that claim on the rates too: at (0, 0, z) the x and y rates vanish.
        assertEquals(1, report.invariantSubspaces().size());
        InvariantSubspace zAxis = report.invariantSubspaces().get(0);
        assertEquals("x = 0, y = 0", zAxis.equations());
        assertEquals("the z axis", zAxis.description());
        assertEquals(1, zAxis.dimension());
        // The reports carry the same: orbit and isotropy per equilibrium, the subspace, a sentence.
        com.google.gson.JsonObject json = com.google.gson.JsonParser
                .parseString(org.phasewright.runtime.report.EquilibriaJson.render(result, search)).getAsJsonObject();
        assertEquals("x = 0, y = 0", json.getAsJsonArray("invariantSubspaces").get(0).getAsJsonObject()
                .get("equations").getAsString());
        for (int k = 0; k < 3; k++) {
            assertEquals(report.equilibria().get(k).orbit(), json.getAsJsonArray("equilibria").get(k)
                    .getAsJsonObject().get("orbit").getAsInt());
        }
        String summary = org.phasewright.runtime.report.TextSummary.render(result);
        assertTrue(summary.contains(report.orbitSentences().get(0)), summary);
        assertTrue(summary.contains("Invariant subspace x = 0, y = 0 (the z axis), fixed by rotation"), summary);
        PreparedField field = PreparedField.of(lorenz);
        for (double z : new double[] { -3.5, 0.25, 40 }) {
            double[] f = field.evaluate(new double[] { 0, 0, z }, 0);
            assertArrayEquals(new double[] { 0, 0 }, new double[] { f[0], f[1] }, 0);
        }
    }

    /** n uncoupled copies of u' = u - u^3, each state starting at {@code initial}. */
    private static DynamicalModel uncoupled(int n, java.util.function.UnaryOperator<Expr> rate) {
        List<org.phasewright.runtime.model.StateVariable> states = new ArrayList<>();
        List<Expr> rates = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            states.add(stateVar("u" + i, 0.5));
            rates.add(rate.apply(state(i, "u" + i)));
        }
        return new DynamicalModel("copies", null, TimeAxis.DEFAULT, states, List.of(), List.of(), rates, List.of(),
                List.of());
    }

    @Test
    void beyondSixStatesOnlySignChangesAreSearched() {
        // Each rate u_i - u_i^3 is odd in its own state and the copies are interchangeable (by inspection), so
        // the symmetry group is all signed permutations; with 7 states only the 7 sign changes are looked for.
        DynamicalModel seven = uncoupled(7, u -> org.phasewright.runtime.TestModels.sub(u, pow(u, c(3))));
        List<SymmetryDiscovery.Found> found = new SymmetryDiscovery(PreparedField.of(seven), checkOf(seven))
                .discover(List.of());
        assertEquals(7, found.size());
        assertTrue(found.stream().allMatch(f -> f.symmetry().moved() == 1));
        // With 3 states the permutations are searched too: 3 sign changes and 2 exchanges generate the group.
        DynamicalModel three = uncoupled(3, u -> org.phasewright.runtime.TestModels.sub(u, pow(u, c(3))));
        assertEquals(5, new SymmetryDiscovery(PreparedField.of(three), checkOf(three)).discover(List.of()).size());
    }

    @Test
    void ratesUndefinedAlmostEverywhereLeaveTheQuestionOpen() {
        // sqrt(u - 10) is undefined wherever sampling looks (|u| <= 2), so nothing can be compared.
        DynamicalModel m = uncoupled(2, u -> call(MathFunction.SQRT, org.phasewright.runtime.TestModels.sub(u, c(10))));
        Symmetry swap = new Symmetry("swap", List.of(state(1, "u1"), state(0, "u0")), false);
        assertEquals(EquivarianceVerdict.Outcome.UNDECIDED, checkOf(m).check(map(swap, 2)).outcome());
    }

    @Test
    void aMissingImageIsReported() {
        // Lorenz (1963): with C+ = (6√2, 6√2, 27) an equilibrium, so is its image C- under the rotation; a list
        // holding only the origin and C+ must be incomplete.
        double c = Math.sqrt(8.0 / 3 * 27);
        SymmetryReport report = SymmetryAnalysis.analyse(List.of(map(rotation(), 3)), List.of("O", "C+"),
                List.of(new double[] { 0, 0, 0 }, new double[] { c, c, 27 }), List.of("x", "y", "z"));
        assertEquals(List.of("rotation: O"), report.equilibria().get(0).images());
        assertEquals(List.of("rotation: " + SymmetryAnalysis.MISSING), report.equilibria().get(1).images());
        assertTrue(report.orbitSentences().isEmpty());
    }

    @Test
    void swapFixesTheDiagonal() {
        // Fix of the exchange of two states is the diagonal x = y (Golubitsky, Stewart & Schaeffer vol. II,
        // ch. XIII §2: Fix(Σ) is the set of points every element of Σ leaves in place).
        Expr x = state(0, "x"), y = state(1, "y");
        LinearMap swap = LinearMap.of(new Symmetry("swap", List.of(y, x), false), 2).orElseThrow();
        List<InvariantSubspace> spaces = SymmetryAnalysis.invariantSubspaces(List.of(swap), List.of("x", "y"));
        assertEquals(1, spaces.size());
        assertEquals("x = y", spaces.get(0).equations());
        assertEquals(1, spaces.get(0).dimension());
    }
}
