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

/** Declared symmetries verified (or the breaking rate marked) and undeclared ones pointed out. */
@ExtendWith(InjectionExtension.class)
@InjectWith(PhaseInjectorProvider.class)
class SymmetryValidationTest {

    @Inject
    private ParseHelper<PhaseModel> parser;
    @Inject
    private ValidationTestHelper validator;

    private static String lorenz() throws Exception {
        return Files.readString(Path.of(System.getProperty("phasewright.examples"), "lorenz1963.phase"));
    }

    private List<Issue> withCode(String text, String code) throws Exception {
        return validator.validate(parser.parse(text)).stream().filter(i -> code.equals(i.getCode()))
                .collect(Collectors.toList());
    }

    @Test
    void lorenzRotationIsVerifiedExactly() throws Exception {
        // Lorenz (1963), J. Atmos. Sci. 20:130-141: the equations are unchanged under (X, Y, Z) -> (-X, -Y, Z).
        List<Issue> verified = withCode(lorenz(), IssueCodes.SYMMETRY_VERIFIED);
        assertEquals(1, verified.size());
        assertEquals(Severity.INFO, verified.get(0).getSeverity());
        assertEquals(13, verified.get(0).getLineNumber());
        assertTrue(verified.get(0).getMessage().contains("exactly on the polynomial normal form"),
                verified.get(0).getMessage());
        assertTrue(withCode(lorenz(), IssueCodes.SYMMETRY_DISCOVERED).isEmpty(), "declared, so not reported");
    }

    @Test
    void lorenzRotationIsDiscoveredWhenUndeclared() throws Exception {
        String text = lorenz().replace("symmetry rotation: x -> -x, y -> -y\n", "");
        List<Issue> found = withCode(text, IssueCodes.SYMMETRY_DISCOVERED);
        assertEquals(1, found.size(), found.toString());
        Issue issue = found.get(0);
        assertEquals(Severity.INFO, issue.getSeverity());
        assertEquals(3, issue.getLineNumber()); // on the model name
        assertEquals("symmetry s1: x -> -x, y -> -y", issue.getData()[0]);
        assertTrue(issue.getMessage().contains("`symmetry s1: x -> -x, y -> -y`"), issue.getMessage());
        // The declaration is ready to insert: with it the model is clean and the symmetry verified.
        String declared = text + issue.getData()[0] + "\n";
        assertTrue(withCode(declared, IssueCodes.SYMMETRY_DISCOVERED).isEmpty());
        assertEquals(1, withCode(declared, IssueCodes.SYMMETRY_VERIFIED).size());
    }

    @Test
    void brokenSymmetryIsMarkedOnTheBreakingRate() throws Exception {
        // Adding a constant forcing +1 to the x rate of Lorenz's model makes x' even in (x, y), not odd.
        String text = lorenz().replace("rate x = sigma*(y - x)", "rate x = sigma*(y - x) + 1");
        List<Issue> broken = withCode(text, IssueCodes.BROKEN_SYMMETRY);
        assertEquals(1, broken.size());
        Issue issue = broken.get(0);
        assertEquals(Severity.ERROR, issue.getSeverity());
        assertEquals(10, issue.getLineNumber());
        assertEquals(10, issue.getColumn()); // the law of `rate x`
        assertTrue(issue.getMessage().contains("f(g·u) = 10*x - 10*y + 1 but g·f(u) = 10*x - 10*y - 1"),
                issue.getMessage());
    }

    @Test
    void timeReversingSymmetryOfAFrictionlessPendulum() throws Exception {
        // A conservative mechanical system with kinetic energy even in the velocity is reversible under
        // v -> -v (Lamb & Roberts, Physica D 112 (1998) 1-39, sec. 1). sin is not a polynomial: sampled.
        String text = "model p\nstate a = 1\nstate v = 0\nrate a = v\nrate v = -sin(a)\n"
                + "symmetry reversal: v -> -v reverses time\n";
        List<Issue> verified = withCode(text, IssueCodes.SYMMETRY_VERIFIED);
        assertEquals(1, verified.size());
        assertTrue(verified.get(0).getMessage().contains("by sampling 200 seeded random points"),
                verified.get(0).getMessage());
        // The same map without time reversal is not a symmetry: a' = v changes sign on one side only.
        List<Issue> broken = withCode(text.replace(" reverses time", ""), IssueCodes.BROKEN_SYMMETRY);
        assertEquals(1, broken.size());
        assertEquals(4, broken.get(0).getLineNumber());
        // Undeclared: (a, v) -> (-a, -v), which with the reversal generates the rest.
        List<Issue> found = withCode(text, IssueCodes.SYMMETRY_DISCOVERED);
        assertEquals(1, found.size(), found.toString());
        assertEquals("symmetry s1: a -> -a, v -> -v", found.get(0).getData()[0]);
    }

    @Test
    void nonlinearAndSingularMaps() throws Exception {
        String base = "model m\nstate x = 1\nstate y = 1\nrate x = -x\nrate y = -y\n";
        List<Issue> nonlinear = withCode(base + "symmetry sq: x -> x*y\n", IssueCodes.NONLINEAR_SYMMETRY);
        assertEquals(1, nonlinear.size());
        assertEquals(6, nonlinear.get(0).getLineNumber());
        assertEquals(19, nonlinear.get(0).getColumn());
        List<Issue> singular = withCode(base + "symmetry flat: x -> y\n", IssueCodes.SINGULAR_SYMMETRY);
        assertEquals(1, singular.size());
        assertEquals(10, singular.get(0).getColumn());
    }

    @Test
    void bundledExamplesHaveNoSymmetryErrorsOrWarnings() throws Exception {
        try (var files = Files.list(Path.of(System.getProperty("phasewright.examples")))) {
            for (Path file : files.filter(p -> p.toString().endsWith(".phase")).toList()) {
                List<Issue> bad = validator.validate(parser.parse(Files.readString(file))).stream()
                        .filter(i -> i.getSeverity() != Severity.INFO).toList();
                assertTrue(bad.isEmpty(), () -> file + ": " + bad);
            }
        }
    }
}
