package org.phasewright.language.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.diagnostics.Severity;
import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.eclipse.xtext.testing.validation.ValidationTestHelper;
import org.eclipse.xtext.validation.Issue;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.units.DimensionInference;
import org.phasewright.language.validation.IssueCodes;
import org.phasewright.runtime.units.Dimension;

import com.google.inject.Inject;

/** Unit names and dimensional consistency: each rule broken once (with its position) and kept once. */
@ExtendWith(InjectionExtension.class)
@InjectWith(PhaseInjectorProvider.class)
class UnitValidationTest {

    @Inject
    private ParseHelper<PhaseModel> parser;
    @Inject
    private ValidationTestHelper validator;

    /** The bundled pendulum: every quantity has a unit. */
    private static String pendulum() throws Exception {
        return Files.readString(Path.of(System.getProperty("phasewright.examples"), "pendulum.phase"));
    }

    private List<Issue> problems(String text) throws Exception {
        return validator.validate(parser.parse(text)).stream().filter(i -> i.getSeverity() != Severity.INFO)
                .collect(Collectors.toList());
    }

    private Issue single(String text, String code, int line, int column) throws Exception {
        List<Issue> found = problems(text).stream().filter(i -> code.equals(i.getCode())).toList();
        assertEquals(1, found.size(), () -> describe(text));
        Issue issue = found.get(0);
        assertEquals(Severity.ERROR, issue.getSeverity());
        assertEquals(line, issue.getLineNumber(), "line");
        assertEquals(column, issue.getColumn(), "column");
        return issue;
    }

    private String describe(String text) {
        try {
            return problems(text).stream().map(i -> i.getLineNumber() + ":" + i.getColumn() + " " + i.getCode() + " "
                    + i.getMessage()).collect(Collectors.joining("; "));
        } catch (Exception e) {
            return e.toString();
        }
    }

    @Test
    void pendulumWithUnitsIsClean() throws Exception {
        // Dimensions by hand: g/length is 1/s^2, damping*omega is 1/s^2, omega over s is 1/s^2 (common practice).
        String text = pendulum();
        assertTrue(problems(text).isEmpty(), () -> describe(text));
    }

    @Test
    void pendulumDampingOnTheAngleIsMarkedAtThatTerm() throws Exception {
        // damping*theta is 1/s (rad is 1, SI Brochure table 4) but g/length*sin(theta) is 1/s^2.
        String text = pendulum().replace("- damping*omega", "- damping*theta");
        Issue issue = single(text, IssueCodes.UNLIKE_DIMENSIONS, 13, 37);
        assertEquals(13, issue.getLength());
        assertTrue(issue.getMessage().contains("'-g/length*sin(theta)' is 1/s^2 but 'damping*theta' is 1/s"),
                issue.getMessage());
    }

    @Test
    void rateInTheWrongUnit() throws Exception {
        // theta' must be rad/s = 1/s; omega*length is m/s.
        String text = pendulum().replace("rate theta = omega", "rate theta = omega*length");
        Issue issue = single(text, IssueCodes.WRONG_RATE_DIMENSION, 12, 14);
        assertTrue(issue.getMessage().contains("must be in 1/s") && issue.getMessage().contains("is m/s"),
                issue.getMessage());
    }

    @Test
    void argumentOfAFunctionMustBeDimensionless() throws Exception {
        String text = pendulum().replace("sin(theta)", "sin(omega)");
        Issue issue = single(text, IssueCodes.DIMENSIONED_ARGUMENT, 13, 28);
        assertTrue(issue.getMessage().contains("'omega' is 1/s"), issue.getMessage());
    }

    @Test
    void exponentsOfDimensionedQuantities() throws Exception {
        String base = "model m\ntime t in s\nparam L = 2 in m\nstate x = 1 in m\nstate y = 1 in 1\n";
        // A state in the exponent of a dimensioned base: not constant.
        single(base + "let a = L^y in m\nrate x = 0\nrate y = 0\n", IssueCodes.BAD_EXPONENT, 6, 11);
        // A dimensioned exponent.
        single(base + "let a = y^L\nrate x = 0\nrate y = 0\n", IssueCodes.BAD_EXPONENT, 6, 11);
        // A constant integer power is fine and gives L^2 = m^2, which a let in m^2 accepts.
        String fine = base + "let a = L^2 in m^2\nrate x = 0\nrate y = 0\n";
        assertTrue(problems(fine).isEmpty(), () -> describe(fine));
    }

    @Test
    void startValuesFollowTheFlatElements() throws Exception {
        // x[i] takes the first three start values, so the fourth is y's (in s), not x's (in m).
        String base = "model m\ntime t in s\nparam L = 2 in m\nparam T = 3 in s\nindex i in 1 .. 3 bounded\n"
                + "state x[i] = 1 in m\nstate y = 1 in s\nrate x[i] = 0\nrate y = 0\n";
        Issue issue = single(base + "study s { simulate to t = 1 from (L, L, L, L) }\n",
                IssueCodes.WRONG_VALUE_DIMENSION, 10, 44);
        assertTrue(issue.getMessage().contains("start value of 'y' is in s"), issue.getMessage());
        String fine = base + "study s { simulate to t = 1 from (L, L, L, T) }\n";
        assertTrue(problems(fine).isEmpty(), () -> describe(fine));
    }

    @Test
    void rangeBoundInAnotherUnit() throws Exception {
        String text = "model m\ntime t in s\nparam v = 1 in m/s\nparam L = 1 in m range 0 .. v\nstate x = L in m\n"
                + "rate x = v\n";
        Issue issue = single(text, IssueCodes.WRONG_RANGE_DIMENSION, 4, 29);
        assertTrue(issue.getMessage().contains("is in m but 'v' is m/s"), issue.getMessage());
    }

    @Test
    void studySettingsAndSymmetryImagesKeepTheirUnits() throws Exception {
        String base = "model m\ntime t in s\nparam L = 2 in m\nstate x = 1 in m\nstate v = 0 in m/s\n"
                + "rate x = v\nrate v = 0\n";
        // The end time is in the time unit s, not in m.
        single(base + "study s { simulate to t = L }\n", IssueCodes.WRONG_VALUE_DIMENSION, 8, 27);
        // A Poincaré section compares a length with a speed.
        single(base + "param w = 1 in m/s\nstudy s { section where x = w to t = 10 }\n",
                IssueCodes.WRONG_VALUE_DIMENSION, 9, 29);
        // A symmetry sending a length to a velocity and back: both images are marked, the first at `v`.
        String image = base + "symmetry s: x -> v, v -> x\n";
        List<Issue> wrong = problems(image).stream()
                .filter(i -> IssueCodes.WRONG_VALUE_DIMENSION.equals(i.getCode())).toList();
        assertEquals(2, wrong.size(), () -> describe(image));
        assertEquals(8, wrong.get(0).getLineNumber());
        assertEquals(18, wrong.get(0).getColumn());
    }

    @Test
    void unknownUnitName() throws Exception {
        Issue issue = single("model m\nstate x = 1 in furlong/s\nrate x = -x\n", IssueCodes.UNKNOWN_UNIT, 2, 16);
        assertTrue(issue.getMessage().contains("Unknown unit 'furlong'") && issue.getMessage().contains("km"),
                issue.getMessage());
    }

    @Test
    void unitsWithPrefixesAndDerivedNamesAgree() throws Exception {
        // SI Brochure table 4: N = kg*m/s^2, W = J/s, Pa = N/m^2; table 7: k = 1e3 (the factor is not checked).
        String text = "model m\ntime t in s\nparam f = 2 in N\nparam mass = 3 in kg\nparam p = 1 in kPa\n"
                + "param area = 2 in m^2\nstate v = 0 in m/s\nstate e = 0 in J\n"
                + "rate v = f/mass - p*area/mass\nrate e = f*v\n";
        assertTrue(problems(text).isEmpty(), () -> describe(text));
    }

    @Test
    void unitlessModelsAreNotChecked() throws Exception {
        // Opt-in: without `in`, a quantity's dimension is unknown, so the thermosyphon's rates pass as written.
        String text = "model m\ntime t in s\nparam k = 2\nstate x = 1\nrate x = k*x - exp(x)\n";
        assertTrue(problems(text).isEmpty(), () -> describe(text));
    }

    @Test
    void numbersAreDimensionless() throws Exception {
        // 1 - x: x is in m, 1 is a pure number (common practice: numbers carry no unit).
        single("model m\ntime t in s\nparam k = 1 in 1/s\nstate x = 1 in m\nrate x = k*x*(1 - x)\n",
                IssueCodes.UNLIKE_DIMENSIONS, 5, 19);
    }

    @Test
    void hoverDimensionOfAnyExpression() throws Exception {
        PhaseModel model = parser.parse(pendulum());
        LetDecl period = EcoreUtil2.getAllContentsOfType(model, LetDecl.class).get(0);
        // sqrt(length/g) = sqrt(m / (m/s^2)) = s (a pendulum's period, common practice).
        Optional<Dimension> dimension = DimensionInference.dimensionOf(period.getDefinition());
        assertEquals("s", dimension.map(Dimension::toString).orElse("unknown"));
    }
}
