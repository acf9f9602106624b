package org.phasewright.language.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;

import org.eclipse.xtext.diagnostics.Severity;
import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.eclipse.xtext.testing.validation.ValidationTestHelper;
import org.eclipse.xtext.validation.Issue;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.validation.IssueCodes;

import com.google.inject.Inject;

/** Every rule of indexed families, each with a model that breaks it (line and column) and one that keeps it. */
@ExtendWith(InjectionExtension.class)
@InjectWith(PhaseInjectorProvider.class)
class IndexedFamilyValidationTest {

    @Inject
    private ParseHelper<PhaseModel> parser;
    @Inject
    private ValidationTestHelper validator;

    /** A clean ring of forced cells (Lorenz 1996 form); tests change one line of it. */
    private static final String RING = """
            model ring
            param N = 6
            param forcing = 8
            index i in 1 .. N cyclic
            index j in 1 .. N cyclic
            state x[i] = forcing + 0.01 * sin(i)
            let energy = sum(j, x[j]^2) / 2
            rate x[i] = (x[i+1] - x[i-2]) * x[i-1] - x[i] + forcing
            """;

    private List<Issue> all(String text) throws Exception {
        PhaseModel model = parser.parse(text);
        assertTrue(model.eResource().getErrors().isEmpty(), () -> "syntax errors: " + model.eResource().getErrors());
        return validator.validate(model);
    }

    private List<Issue> issues(String text) throws Exception {
        return all(text).stream().filter(i -> i.getSeverity() != Severity.INFO).collect(Collectors.toList());
    }

    private List<Issue> withCode(String text, String code) throws Exception {
        return all(text).stream().filter(i -> code.equals(i.getCode())).collect(Collectors.toList());
    }

    private String single(String text, String code, int line, int column) throws Exception {
        List<Issue> found = withCode(text, code);
        assertEquals(1, found.size(), () -> "issues with code " + code + ": " + describe(text));
        Issue issue = found.get(0);
        assertEquals(line, issue.getLineNumber(), "line");
        assertEquals(column, issue.getColumn(), "column");
        return issue.getMessage();
    }

    private void none(String text, String code) throws Exception {
        assertTrue(withCode(text, code).isEmpty(), () -> describe(text));
    }

    private String describe(String text) {
        try {
            return all(text).stream().map(i -> i.getLineNumber() + ":" + i.getColumn() + " " + i.getCode() + " "
                    + i.getMessage()).collect(Collectors.joining("; "));
        } catch (Exception e) {
            return e.toString();
        }
    }

    private static String ring(String line, String replacement) {
        assertTrue(RING.contains(line), line);
        return RING.replace(line, replacement);
    }

    private static String example(String name) throws Exception {
        return Files.readString(Path.of(System.getProperty("phasewright.examples"), name));
    }

    @Test
    void ringAndExamplesAreClean() throws Exception {
        assertTrue(issues(RING).isEmpty(), () -> describe(RING));
        assertTrue(issues(example("ring-lattice.phase")).isEmpty(), () -> describe("ring-lattice"));
        assertTrue(issues(example("galerkin-channel.phase")).isEmpty(), () -> describe("galerkin-channel"));
    }

    @Test
    void indexSaysCyclicOrBounded() throws Exception {
        single(ring("index j in 1 .. N cyclic", "index j in 1 .. N"), IssueCodes.INDEX_KIND_MISSING, 5, 7);
        none(ring("index j in 1 .. N cyclic", "index j in 1 .. N bounded"), IssueCodes.INDEX_KIND_MISSING);
    }

    @Test
    void indexBoundsAreWholeConstants() throws Exception {
        String half = ring("param forcing = 8", "param forcing = 8\nparam h = 2.5");
        String message = single(half.replace("index j in 1 .. N", "index j in 1 .. h"), IssueCodes.BAD_INDEX_BOUND, 6,
                17);
        assertTrue(message.contains("'h' is 2.5"), message);
        // A state is not known before the run: reported as not constant, at the same place.
        single(ring("index j in 1 .. N", "index j in 1 .. x"), IssueCodes.NOT_CONSTANT, 5, 17);
        // N/2 = 3 is whole: fine (common practice: half a lattice).
        none(ring("index j in 1 .. N", "index j in 1 .. N/2"), IssueCodes.BAD_INDEX_BOUND);
    }

    @Test
    void indexRangeIsNotEmptyNorHuge() throws Exception {
        String message = single(ring("index j in 1 .. N", "index j in N .. 2"), IssueCodes.EMPTY_INDEX, 5, 17);
        assertTrue(message.contains("from 6 to 2"), message);
        // More than 10^7 values is an error; exactly 10^7 is allowed (the documented limit).
        single(ring("index j in 1 .. N", "index j in 1 .. 10000001"), IssueCodes.INDEX_TOO_LARGE, 5, 7);
        none(ring("index j in 1 .. N", "index j in 1 .. 10000000"), IssueCodes.INDEX_TOO_LARGE);
    }

    @Test
    void familyIsUsedElementByElement() throws Exception {
        String message = single(ring("let energy = sum(j, x[j]^2) / 2", "let energy = x / 2"),
                IssueCodes.FAMILY_WITHOUT_INDEX, 7, 14);
        assertTrue(message.contains("`x[i]`"), message);
        none(RING, IssueCodes.FAMILY_WITHOUT_INDEX);
    }

    @Test
    void scalarIsUsedWithoutSubscript() throws Exception {
        String message = single(ring("- x[i] + forcing", "- x[i] + forcing[i]"), IssueCodes.SCALAR_WITH_INDEX, 8, 57);
        assertTrue(message.contains("single param"), message);
        single(ring("rate x[i] = (x[i+1]", "rate x[i] = (i[1] + x[i+1]"), IssueCodes.SCALAR_WITH_INDEX, 8, 16);
        none(RING, IssueCodes.SCALAR_WITH_INDEX);
    }

    @Test
    void indexHasAValueOnlyWhereBound() throws Exception {
        // j is bound only inside the sum over it.
        single(ring("let energy = sum(j, x[j]^2) / 2", "let energy = sum(j, x[j]^2) / j"),
                IssueCodes.INDEX_NOT_BOUND, 7, 31);
        // i is bound by the family rate, j is not.
        single(ring("- x[i] + forcing", "- x[j] + forcing"), IssueCodes.INDEX_NOT_BOUND, 8, 44);
        none(RING, IssueCodes.INDEX_NOT_BOUND);
    }

    @Test
    void subscriptsAreIntegerArithmetic() throws Exception {
        String division = single(ring("(x[i+1] - x[i-2])", "(x[i/2] - x[i-2])"), IssueCodes.BAD_INDEX_EXPRESSION, 8,
                17);
        assertTrue(division.contains("'/' is not allowed"), division);
        String real = single(ring("(x[i+1] - x[i-2])", "(x[i+0.5] - x[i-2])"), IssueCodes.BAD_INDEX_EXPRESSION, 8,
                18);
        assertTrue(real.contains("not a whole number"), real);
        String state = single(ring("(x[i+1] - x[i-2])", "(x[x[i]] - x[i-2])"), IssueCodes.BAD_INDEX_EXPRESSION, 8, 16);
        assertTrue(state.contains("element of a family"), state);
        String function = single(ring("(x[i+1] - x[i-2])", "(x[sin(i)] - x[i-2])"), IssueCodes.BAD_INDEX_EXPRESSION,
                8, 16);
        assertTrue(function.contains("function"), function);
        String param = single(ring("(x[i+1] - x[i-2])", "(x[i+forcing/16] - x[i-2])"),
                IssueCodes.BAD_INDEX_EXPRESSION, 8, 25);
        assertTrue(param.contains("'/'"), param);
        // Reflection across the ring with an integer param and parentheses: fine.
        none(ring("(x[i+1] - x[i-2])", "(x[N + 1 - (i - 1) * 1] - x[-2 + i])"), IssueCodes.BAD_INDEX_EXPRESSION);
        assertTrue(issues(ring("(x[i+1] - x[i-2])", "(x[N + 1 - (i - 1) * 1] - x[-2 + i])")).isEmpty());
    }

    @Test
    void sumBindsAFreshIndex() throws Exception {
        String message = single(ring("- x[i] + forcing", "- sum(i, x[i]) + forcing"), IssueCodes.SUM_REBINDS_INDEX,
                8, 46);
        assertTrue(message.contains("line 8"), message);
        single(ring("sum(j, x[j]^2)", "sum(j, x[j]^2 * sum(j, x[j]))"), IssueCodes.SUM_REBINDS_INDEX, 7, 34);
        none(ring("- x[i] + forcing", "- sum(j, x[j]) / N + forcing"), IssueCodes.SUM_REBINDS_INDEX);
    }

    @Test
    void familyRateUsesItsOwnIndex() throws Exception {
        String message = single(RING.replace("rate x[i] = (x[i+1] - x[i-2]) * x[i-1] - x[i] + forcing",
                "rate x[j] = (x[j+1] - x[j-2]) * x[j-1] - x[j] + forcing"), IssueCodes.RATE_INDEX_MISMATCH, 8, 8);
        assertTrue(message.contains("`rate x[i] = ...`"), message);
        single(ring("rate x[i] = (x[i+1]", "rate x = (x[i+1]"), IssueCodes.RATE_INDEX_MISMATCH, 8, 6);
        none(RING, IssueCodes.RATE_INDEX_MISMATCH);
    }

    @Test
    void everyStateFamilyHasExactlyOneRate() throws Exception {
        String missing = RING.replace("rate x[i] = (x[i+1] - x[i-2]) * x[i-1] - x[i] + forcing\n", "");
        String message = single(missing, IssueCodes.MISSING_RATE, 6, 7);
        assertTrue(message.contains("`rate x[i] = ...`"), message);
        single(RING + "rate x[i] = -x[i]\n", IssueCodes.DUPLICATE_RATE, 9, 6);
        String index = single(RING + "rate i = 1\n", IssueCodes.RATE_OF_NON_STATE, 9, 6);
        assertTrue(index.contains("'i' is an index"), index);
        none(RING, IssueCodes.MISSING_RATE);
    }

    @Test
    void listedTableHasOneValuePerIndexValue() throws Exception {
        String table = ring("param forcing = 8", "param forcing = 8\nparam w[i] = [1, 2, 3]");
        table = table.replace("+ forcing\n", "+ forcing * w[i]\n");
        String message = single(table, IssueCodes.TABLE_SIZE_MISMATCH, 4, 14);
        assertTrue(message.contains("3 values but index i has 6"), message);
        assertTrue(issues(table.replace("[1, 2, 3]", "[1, 2, 3, 4, 5, 6]")).isEmpty());
        single(ring("param forcing = 8", "param forcing[i] = 8 range 0 .. 10"), IssueCodes.TABLE_WITH_RANGE, 3, 28);
        single(ring("param forcing = 8", "param forcing = [8]"), IssueCodes.LISTED_WITHOUT_INDEX, 3, 17);
    }

    @Test
    void familiesOfDifferentSizesMeetThroughIndexArithmetic() throws Exception {
        // A coarse row of 3 read by a fine ring of 6 through k = (i+1)/2-like arithmetic is allowed: elements
        // outside the bounded range read as 0, cyclic ones wrap.
        String text = RING + """
                index k in 1 .. 3 bounded
                state y[k] = 0
                rate y[k] = x[2*k] - y[k] + y[k+1]
                """;
        assertTrue(issues(text).isEmpty(), () -> describe(text));
    }

    @Test
    void cyclesThroughFamiliesAreErrors() throws Exception {
        String text = ring("let energy = sum(j, x[j]^2) / 2", "let flux[i] = flux[i-1] + x[i]\nlet energy = 1");
        single(text, IssueCodes.LET_CYCLE, 7, 5);
        none(ring("let energy = sum(j, x[j]^2) / 2", "let flux[i] = x[i-1] + x[i]\nlet energy = sum(j, flux[j])"),
                IssueCodes.LET_CYCLE);
    }

    @Test
    void unitsOfElementsIndicesAndSums() throws Exception {
        String units = """
                model heat
                time t in s
                param N = 4
                param h = 2 in 1/s
                index i in 1 .. N cyclic
                index j in 1 .. N cyclic
                param c[i] = 0.1 * i in 1/s
                state T[i] = 300 in K
                let mean = sum(j, T[j]) / N
                rate T[i] = h * (T[i+1] - T[i]) - c[i] * (T[i] - mean)
                """;
        assertTrue(issues(units).isEmpty(), () -> describe(units));
        // An element has its family's unit: K added to 1/s.
        single(units.replace("- c[i] * (T[i] - mean)", "- c[i]"), IssueCodes.UNLIKE_DIMENSIONS, 10, 35);
        // A sum has its body's dimension: mean would be in K*s... here a sum of K compared with 1/s.
        single(units.replace("let mean = sum(j, T[j]) / N", "let mean = sum(j, T[j]) + h"),
                IssueCodes.UNLIKE_DIMENSIONS, 9, 27);
        // Index values are plain numbers: T[i] + i adds a number to K.
        single(units.replace("(T[i+1] - T[i])", "(T[i+1] - i)"), IssueCodes.UNLIKE_DIMENSIONS, 10, 27);
        // A table given by a formula of the index takes its declared unit (like a literal).
        none(units, IssueCodes.WRONG_VALUE_DIMENSION);
        single(units.replace("param c[i] = 0.1 * i in 1/s", "param c[i] = 0.1 * i * h in K"),
                IssueCodes.WRONG_VALUE_DIMENSION, 7, 14);
    }

    @Test
    void leadingAsksForOneToDimensionExponents() throws Exception {
        String message = single(RING + "study s {\n  lyapunov to t = 50 leading 7\n}\n", IssueCodes.BAD_LEADING, 10,
                30);
        assertTrue(message.contains("(6)"), message);
        single(RING + "study s {\n  lyapunov to t = 50 leading 0\n}\n", IssueCodes.BAD_LEADING, 10, 30);
        none(RING + "study s {\n  lyapunov to t = 50 leading 6 tolerance 1e-8\n}\n", IssueCodes.BAD_LEADING);
        none(RING + "study s {\n  lyapunov to t = 50 tolerance 1e-8 leading 2\n}\n", IssueCodes.BAD_LEADING);
    }

    @Test
    void startPointCountsElements() throws Exception {
        String message = single(RING + "study s {\n  simulate to t = 1 from (1, 2)\n}\n", IssueCodes.WRONG_START_SIZE,
                10, 27);
        assertTrue(message.contains("2 values but the model has 6 states"), message);
        none(RING + "study s {\n  simulate to t = 1 from (1, 2, 3, 4, 5, 6)\n}\n", IssueCodes.WRONG_START_SIZE);
    }

    @Test
    void gridsVaryTwoScalarsOfTheRightKind() throws Exception {
        String scalar = """
                model m
                param r = 1
                param c = 2
                state a = 0
                state b = 1
                rate a = r * b - a
                rate b = c - a * b
                study s {
                  lyapunov map over r from 4 to 10 steps 12 and c from 0 to 1 steps 12 until t = 40
                  basins over a from -2 to 2 steps 40 and b from -2 to 2 steps 40 until t = 30 tolerance 1e-6
                }
                """;
        assertTrue(issues(scalar).isEmpty(), () -> describe(scalar));
        String stateInMap = single(scalar.replace("and c from 0 to 1", "and a from 0 to 1"),
                IssueCodes.GRID_VARIABLE, 9, 49);
        assertTrue(stateInMap.contains("'a' is a state"), stateInMap);
        single(scalar.replace("basins over a", "basins over r"), IssueCodes.GRID_VARIABLE, 10, 15);
        single(scalar.replace("and b from -2", "and a from -2"), IssueCodes.GRID_VARIABLE, 10, 43);
        single(scalar.replace("steps 40 and", "steps 1 and"), IssueCodes.BAD_GRID_STEPS, 10, 36);
        single(scalar.replace("until t = 30", "until s = 30"), IssueCodes.WRONG_TIME_NAME, 10, 73);
        List<Issue> family = withCode(RING + "study s {\n  basins over x from 0 to 1 steps 4 and x from 0 to 1 steps 4 "
                + "until t = 5\n}\n", IssueCodes.GRID_VARIABLE);
        assertEquals(2, family.size(), "both axes name the family x");
        assertEquals(15, family.get(0).getColumn());
        assertTrue(family.get(0).getMessage().contains("'x' is a family"), family.get(0).getMessage());
    }

    @Test
    void cyclicShiftOfTheRingIsASymmetry() throws Exception {
        // Lorenz (1996): the equations are invariant under the cyclic shift of the cells.
        String text = RING + "symmetry shift: x[i] -> x[i+1]\n";
        List<Issue> verified = withCode(text, IssueCodes.SYMMETRY_VERIFIED);
        assertEquals(1, verified.size(), () -> describe(text));
        assertEquals(9, verified.get(0).getLineNumber());
        // Closed form: shifting by two cells is also a symmetry; so is the shift written backwards.
        assertEquals(1, withCode(RING + "symmetry two: x[i] -> x[i-2]\n", IssueCodes.SYMMETRY_VERIFIED).size());
    }

    @Test
    void wrongShiftsAreRejected() throws Exception {
        // On a bounded index the shift drops x[6] (x[7] reads 0): not invertible, so not a symmetry (closed form).
        String bounded = RING.replace("index i in 1 .. N cyclic", "index i in 1 .. N bounded")
                + "symmetry shift: x[i] -> x[i+1]\n";
        single(bounded, IssueCodes.SINGULAR_SYMMETRY, 9, 10);
        // A forcing table that grows with i breaks the shift: the rate of x[1] gets 8.1 where x[2]'s needs 8.2.
        String table = ring("param forcing = 8", "param forcing = 8\nparam f[i] = 8 + 0.1 * i")
                .replace("- x[i] + forcing\n", "- x[i] + f[i]\n") + "symmetry shift: x[i] -> x[i+1]\n";
        single(table, IssueCodes.BROKEN_SYMMETRY, 9, 13);
        // The reflection i -> -i is not a symmetry of the Lorenz-96 ring (advection has a direction; closed form).
        assertEquals(1, withCode(RING + "symmetry flip: x[i] -> x[N - i]\n", IssueCodes.BROKEN_SYMMETRY).size());
    }

    @Test
    void symmetryMapUsesTheFamilyIndex() throws Exception {
        single(RING + "symmetry shift: x[j] -> x[j+1]\n", IssueCodes.MAP_INDEX_MISMATCH, 9, 19);
        single(RING + "symmetry shift: x -> x\n", IssueCodes.MAP_INDEX_MISMATCH, 9, 17);
        none(RING + "symmetry shift: x[i] -> x[i+1]\n", IssueCodes.MAP_INDEX_MISMATCH);
    }

    @Test
    void largeRingsAreCheckedWithoutExpanding() throws Exception {
        String big = ring("param N = 6", "param N = 1000000") + "symmetry shift: x[i] -> x[i+1]\n"
                + "study s {\n  simulate to t = 10\n  lyapunov to t = 50 leading 3\n}\n";
        assertTrue(issues(big).isEmpty(), () -> describe(big));
        String message = single(big, IssueCodes.SYMMETRY_NOT_CHECKED, 9, 10);
        assertTrue(message.contains("1000000 states"), message);
        // Discovery stays quiet on indexed models above a few hundred states (it would search permutations).
        assertTrue(withCode(ring("param N = 6", "param N = 300"), IssueCodes.SYMMETRY_DISCOVERED).isEmpty());
    }
}
