package org.phasewright.language.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.BinaryExpr;
import org.phasewright.language.phase.FunctionCall;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.Negation;
import org.phasewright.language.phase.NumberLiteral;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.PiConstant;
import org.phasewright.language.phase.SimulateRequest;
import org.phasewright.language.phase.SymbolRef;

import com.google.inject.Inject;

@ExtendWith(InjectionExtension.class)
@InjectWith(PhaseInjectorProvider.class)
class PhaseParsingTest {

    @Inject
    private ParseHelper<PhaseModel> parser;

    private PhaseModel parse(String text) throws Exception {
        PhaseModel model = parser.parse(text);
        assertNotNull(model);
        assertTrue(model.eResource().getErrors().isEmpty(), () -> "syntax errors: " + model.eResource().getErrors());
        return model;
    }

    private LetDecl onlyLet(String expression) throws Exception {
        PhaseModel model = parse("model m state x = 1 rate x = 0 let e = " + expression);
        return PhaseModels.lets(model).get(0);
    }

    @Test
    void bundledThermosyphonExampleParses() throws Exception {
        PhaseModel model = parse(Files.readString(Path.of(System.getProperty("phasewright.examples"),
                "thermosyphon.phase")));
        assertEquals("thermosyphon", model.getName());
        assertEquals("Closed-loop thermosyphon, three-mode truncation", model.getTitle());
        assertEquals(3, PhaseModels.states(model).size());
        assertEquals(3, PhaseModels.params(model).size());
        assertEquals(3, PhaseModels.rates(model).size());
        assertEquals(1, PhaseModels.symmetries(model).size());
        assertEquals("t", PhaseModels.timeName(model));
        SimulateRequest simulate = (SimulateRequest) PhaseModels.studies(model).get(0).getAnalyses().get(0);
        assertEquals(50.0, ((NumberLiteral) simulate.getEnd()).getValue());
    }

    @Test
    void powerBindsTighterThanUnaryMinus() throws Exception {
        // -x^2 is -(x^2): the usual convention of mathematics (common practice).
        Negation negation = assertInstanceOf(Negation.class, onlyLet("-x^2").getDefinition());
        BinaryExpr power = assertInstanceOf(BinaryExpr.class, negation.getOperand());
        assertEquals("^", power.getOp());
    }

    @Test
    void powerIsRightAssociativeAndTakesSignedExponent() throws Exception {
        BinaryExpr outer = assertInstanceOf(BinaryExpr.class, onlyLet("x^2^3").getDefinition());
        assertInstanceOf(SymbolRef.class, outer.getLeft());
        assertEquals("^", ((BinaryExpr) outer.getRight()).getOp());
        BinaryExpr signed = assertInstanceOf(BinaryExpr.class, onlyLet("x^-1").getDefinition());
        assertInstanceOf(Negation.class, signed.getRight());
    }

    @Test
    void productsBindTighterThanSums() throws Exception {
        BinaryExpr sum = assertInstanceOf(BinaryExpr.class, onlyLet("1 + 2*x").getDefinition());
        assertEquals("+", sum.getOp());
        assertEquals("*", ((BinaryExpr) sum.getRight()).getOp());
        BinaryExpr quotient = assertInstanceOf(BinaryExpr.class, onlyLet("8/3/2").getDefinition());
        assertInstanceOf(BinaryExpr.class, quotient.getLeft(), "division is left-associative");
    }

    @Test
    void numberForms() throws Exception {
        assertEquals(2.5, ((NumberLiteral) onlyLet("2.5").getDefinition()).getValue());
        assertEquals(1e-3, ((NumberLiteral) onlyLet("1e-3").getDefinition()).getValue());
        assertEquals(6.02e23, ((NumberLiteral) onlyLet("6.02E+23").getDefinition()).getValue());
        assertEquals(12345678901.0, ((NumberLiteral) onlyLet("12345678901").getDefinition()).getValue());
        assertInstanceOf(PiConstant.class, onlyLet("pi").getDefinition());
    }

    @Test
    void functionCallsAndReferencesAreDistinguished() throws Exception {
        FunctionCall call = assertInstanceOf(FunctionCall.class, onlyLet("max(x, sin(x))").getDefinition());
        assertEquals("max", call.getFunction());
        assertEquals(2, call.getArguments().size());
        assertInstanceOf(SymbolRef.class, onlyLet("x").getDefinition());
    }

    @Test
    void unitsRangesDescriptionsAndComments() throws Exception {
        PhaseModel model = parse("""
                /* block comment */ model pendulum "Damped pendulum"
                time t in s
                param g = 9.81 in m/s^2 range 0 .. 30 "gravity" // trailing comment
                param c = 0.1 in 1/s
                param l = 1 in m
                param rho = 1000 in kg*m^-3
                param flow = 2 in mol/(m^3*s)
                state theta = 0.1 in 1 "angle"
                state omega = 0 in 1/s
                rate theta = omega
                rate omega = -g/l*sin(theta) - c*omega
                """);
        ParamDecl g = PhaseModels.params(model).get(0);
        assertEquals("gravity", g.getDescription());
        assertNotNull(g.getUnit());
        assertNotNull(g.getLow());
        assertEquals(2, PhaseModels.params(model).get(4).getUnit().getFactors().size());
    }

    @Test
    void symmetryAndStudyForms() throws Exception {
        PhaseModel model = parse("""
                model m
                state x = 1 state y = 2
                rate x = y rate y = -x
                symmetry flip: x -> -x, y -> -y
                symmetry mirror: x -> -x reverses time
                study a {
                  simulate to t = 10 from (0.5, 1e-3) tolerance 1e-9
                  simulate to t = 5 from initial
                  equilibria
                }
                """);
        assertTrue(PhaseModels.symmetries(model).get(1).isReversesTime());
        assertFalse(PhaseModels.symmetries(model).get(0).isReversesTime());
        SimulateRequest first = (SimulateRequest) PhaseModels.studies(model).get(0).getAnalyses().get(0);
        assertEquals(2, first.getStart().size());
        assertNotNull(first.getTolerance());
        assertTrue(((SimulateRequest) PhaseModels.studies(model).get(0).getAnalyses().get(1)).isFromInitial());
    }

    @Test
    void syntaxErrorIsReportedNotThrown() throws Exception {
        PhaseModel model = parser.parse("model m state x = rate x = 1");
        assertFalse(model.eResource().getErrors().isEmpty());
    }
}
