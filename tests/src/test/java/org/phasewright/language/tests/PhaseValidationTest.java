package org.phasewright.language.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
import org.phasewright.language.linking.PhaseLinkingDiagnosticMessageProvider;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.validation.IssueCodes;

import com.google.inject.Inject;

/** Every validation rule, each with a model that breaks it and one that keeps it. */
@ExtendWith(InjectionExtension.class)
@InjectWith(PhaseInjectorProvider.class)
class PhaseValidationTest {

    @Inject
    private ParseHelper<PhaseModel> parser;
    @Inject
    private ValidationTestHelper validator;

    private static final String CLEAN = """
            model m
            param a = 2 range 0 .. 5
            state x = a
            state y = 0
            let e = a*x
            rate x = y
            rate y = -e
            """;

    /** Errors and warnings; infos (verified or discovered symmetries) are tested in SymmetryValidationTest. */
    private List<Issue> issues(String text) throws Exception {
        return validator.validate(parser.parse(text)).stream().filter(i -> i.getSeverity() != Severity.INFO)
                .collect(Collectors.toList());
    }

    private List<Issue> withCode(String text, String code) throws Exception {
        return issues(text).stream().filter(i -> code.equals(i.getCode())).collect(Collectors.toList());
    }

    /** Asserts exactly one issue with this code, of this severity, at this line and column; returns its message. */
    private String single(String text, String code, Severity severity, int line, int column) throws Exception {
        List<Issue> found = withCode(text, code);
        assertEquals(1, found.size(), () -> "issues with code " + code + ": " + describe(text));
        Issue issue = found.get(0);
        assertEquals(severity, issue.getSeverity());
        assertEquals(line, issue.getLineNumber(), "line");
        assertEquals(column, issue.getColumn(), "column");
        return issue.getMessage();
    }

    private String describe(String text) {
        List<Issue> all;
        try {
            all = issues(text);
        } catch (Exception e) {
            return e.toString();
        }
        return all.stream().map(i -> i.getLineNumber() + ":" + i.getColumn() + " " + i.getMessage())
                .collect(Collectors.joining("; "));
    }

    @Test
    void cleanModelHasNoIssues() throws Exception {
        assertTrue(issues(CLEAN).isEmpty(), () -> describe(CLEAN));
    }

    @Test
    void unknownName() throws Exception {
        String message = single("model m\nstate x = 1\nrate x = -x + zz\n",
                PhaseLinkingDiagnosticMessageProvider.UNKNOWN_NAME, Severity.ERROR, 3, 15);
        assertTrue(message.contains("'zz'"), message);
    }

    @Test
    void timeIsKnownOnlyWhenDeclared() throws Exception {
        assertEquals(1, withCode("model m\nstate x = 1\nrate x = sin(t)\n",
                PhaseLinkingDiagnosticMessageProvider.UNKNOWN_NAME).size());
        assertTrue(issues("model m\ntime t\nstate x = 1\nrate x = sin(t)\n").isEmpty());
    }

    @Test
    void duplicateNames() throws Exception {
        String message = single("model m\nstate x = 1\nparam x = 2\nrate x = -x\n", IssueCodes.DUPLICATE_NAME,
                Severity.ERROR, 3, 7);
        assertTrue(message.contains("state on line 2"), message);
        assertEquals(1, withCode("model m\nstate x = 1\nrate x = -x\nstudy s { equilibria }\nstudy s { equilibria }",
                IssueCodes.DUPLICATE_NAME).size());
        assertTrue(withCode(CLEAN, IssueCodes.DUPLICATE_NAME).isEmpty());
    }

    @Test
    void onlyOneTimeVariable() throws Exception {
        single("model m\ntime t\ntime s\nstate x = 1\nrate x = -x\n", IssueCodes.DUPLICATE_TIME, Severity.ERROR, 3, 6);
    }

    @Test
    void emptyModel() throws Exception {
        single("model nothing_here", IssueCodes.NO_STATES, Severity.ERROR, 1, 7);
        assertTrue(withCode(CLEAN, IssueCodes.NO_STATES).isEmpty());
    }

    @Test
    void stateWithoutRate() throws Exception {
        String message = single("model m\nstate x = 1\nstate y = 1\nrate x = -x\n", IssueCodes.MISSING_RATE,
                Severity.ERROR, 3, 7);
        assertTrue(message.contains("rate y = "), message);
    }

    @Test
    void twoRatesForOneState() throws Exception {
        String message = single("model m\nstate x = 1\nrate x = -x\nrate x = x\n", IssueCodes.DUPLICATE_RATE,
                Severity.ERROR, 4, 6);
        assertTrue(message.contains("line 3"), message);
    }

    @Test
    void rateForNonState() throws Exception {
        String message = single("model m\nparam a = 1\nstate x = 1\nrate x = -a*x\nrate a = 1\n",
                IssueCodes.RATE_OF_NON_STATE, Severity.ERROR, 5, 6);
        assertTrue(message.contains("is a param"), message);
    }

    @Test
    void cycleAmongLets() throws Exception {
        List<Issue> found = withCode("model m\nstate x = 1\nlet a = b + x\nlet b = 2*a\nlet c = a\nrate x = -c\n",
                IssueCodes.LET_CYCLE);
        assertEquals(2, found.size(), "both lets on the cycle, not the one that merely uses it");
        assertTrue(found.get(0).getMessage().contains("a -> b -> a"), found.get(0).getMessage());
        assertEquals(1, withCode("model m\nstate x = 1\nlet a = a\nrate x = -a\n", IssueCodes.LET_CYCLE).size());
    }

    @Test
    void cycleAmongParams() throws Exception {
        assertEquals(2, withCode("model m\nparam a = b\nparam b = a + 1\nstate x = 1\nrate x = -a*b*x\n",
                IssueCodes.PARAM_CYCLE).size());
    }

    @Test
    void functionArityAndUnknownFunction() throws Exception {
        String message = single("model m\nstate x = 1\nrate x = max(x)\n", IssueCodes.WRONG_ARITY, Severity.ERROR, 3,
                10);
        assertTrue(message.contains("takes 2 arguments, not 1"), message);
        single("model m\nstate x = 1\nrate x = sin(x, x)\n", IssueCodes.WRONG_ARITY, Severity.ERROR, 3, 10);
        String unknown = single("model m\nstate x = 1\nrate x = erf(x)\n", IssueCodes.UNKNOWN_FUNCTION, Severity.ERROR,
                3, 10);
        assertTrue(unknown.contains("Known functions: sin"), unknown);
        assertTrue(issues("model m\nstate x = 1\nrate x = min(x, 1) + atan(x) + exp(-x)\n").isEmpty());
    }

    @Test
    void constantPlacesUseOnlyParams() throws Exception {
        String message = single("model m\nstate x = 1\nstate y = x\nrate x = -x\nrate y = -y\n",
                IssueCodes.NOT_CONSTANT, Severity.ERROR, 3, 11);
        assertTrue(message.contains("initial value of state 'y'"), message);
        single("model m\nstate x = 1\nparam a = x\nrate x = -a*x\n", IssueCodes.NOT_CONSTANT, Severity.ERROR, 3, 11);
        single("model m\nstate x = 1\nrate x = -x\nstudy s { simulate to t = x }\n", IssueCodes.NOT_CONSTANT,
                Severity.ERROR, 4, 27);
    }

    @Test
    void unusedParamIsAWarning() throws Exception {
        String message = single("model m\nparam unused = 3\nstate x = 1\nrate x = -x\n", IssueCodes.UNUSED_PARAM,
                Severity.WARNING, 2, 7);
        assertTrue(message.contains("'unused'"), message);
        assertTrue(withCode(CLEAN, IssueCodes.UNUSED_PARAM).isEmpty());
    }

    @Test
    void simulationNamesTheModelTime() throws Exception {
        String message = single("model m\ntime tau\nstate x = 1\nrate x = -x\nstudy s { simulate to t = 1 }\n",
                IssueCodes.WRONG_TIME_NAME, Severity.ERROR, 5, 23);
        assertTrue(message.contains("simulate to tau"), message);
        assertTrue(issues("model m\ntime tau\nstate x = 1\nrate x = -x\nstudy s { simulate to tau = 1 }\n").isEmpty());
    }

    @Test
    void startPointHasOneValuePerState() throws Exception {
        String message = single("model m\nstate x = 1\nstate y = 1\nrate x = -x\nrate y = -y\n"
                + "study s { simulate to t = 1 from (1, 2, 3) }\n", IssueCodes.WRONG_START_SIZE, Severity.ERROR, 6, 35);
        assertTrue(message.contains("3 values") && message.contains("2 states"), message);
    }

    @Test
    void emptyStudyIsAWarning() throws Exception {
        single("model m\nstate x = 1\nrate x = -x\nstudy nothing { }\n", IssueCodes.EMPTY_STUDY, Severity.WARNING, 4, 7);
    }

    @Test
    void symmetryMapsEachStateOnce() throws Exception {
        single("model m\nparam a = 1\nstate x = 1\nrate x = -a*x\nsymmetry s: a -> -a\n",
                IssueCodes.SYMMETRY_OF_NON_STATE, Severity.ERROR, 5, 13);
        single("model m\nstate x = 1\nrate x = -x\nsymmetry s: x -> -x, x -> x\n", IssueCodes.SYMMETRY_REPEATS_STATE,
                Severity.ERROR, 4, 22);
    }

    @Test
    void paramValueOutsideItsRange() throws Exception {
        String message = single("model m\nparam lo = 1\nparam a = 7 range lo .. 2*lo + 3\nstate x = 1\nrate x = -a*x\n",
                IssueCodes.OUT_OF_RANGE, Severity.ERROR, 3, 11);
        assertTrue(message.contains("outside its range 1 .. 5"), message);
        assertTrue(withCode("model m\nparam a = 5 range 0 .. 5\nstate x = 1\nrate x = -a*x\n", IssueCodes.OUT_OF_RANGE)
                .isEmpty(), "bounds are included");
        single("model m\nparam a = 1 range 3 .. 2\nstate x = 1\nrate x = -a*x\n", IssueCodes.EMPTY_RANGE,
                Severity.ERROR, 2, 19);
    }

    @Test
    void endTimeAndToleranceMustBeSensible() throws Exception {
        single("model m\nparam a = 1\nstate x = 1\nrate x = -a*x\nstudy s { simulate to t = a - 1 }\n",
                IssueCodes.BAD_END_TIME, Severity.ERROR, 5, 27);
        single("model m\nstate x = 1\nrate x = -x\nstudy s { simulate to t = 1 tolerance 2 }\n",
                IssueCodes.BAD_TOLERANCE, Severity.ERROR, 4, 39);
        assertTrue(issues("model m\nstate x = 1\nrate x = -x\nstudy s { simulate to t = 1 tolerance 1e-6 }\n")
                .isEmpty());
    }

    @Test
    void studyNameMustFitAFolderName() throws Exception {
        // Found by the checker fuzz: a 250-character study name made writing its results folder fail
        // (file systems allow 255 bytes per name; common practice, no published source).
        String model = "model m\nstate x = 1\nrate x = -x\nstudy %s { equilibria }\n";
        String message = single(String.format(model, "s".repeat(101)), IssueCodes.STUDY_NAME_TOO_LONG, Severity.ERROR,
                4, 7);
        assertTrue(message.contains("101 characters"), message);
        assertTrue(withCode(String.format(model, "s".repeat(100)), IssueCodes.STUDY_NAME_TOO_LONG).isEmpty());
    }
}
