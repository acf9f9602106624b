package org.phasewright.language.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.phasewright.language.lowering.LoweringException;
import org.phasewright.language.lowering.ModelLowering;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.EquilibriumSearch;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.ExprEvaluator;
import org.phasewright.runtime.symbolic.ParameterValues;

import com.google.inject.Inject;

@ExtendWith(InjectionExtension.class)
@InjectWith(PhaseInjectorProvider.class)
class ModelLoweringTest {

    @Inject
    private ParseHelper<PhaseModel> parser;

    private DynamicalModel lower(String text) throws Exception {
        return new ModelLowering().lower(parser.parse(text));
    }

    @Test
    void thermosyphonExampleLowersToThreeStatesInDeclarationOrder() throws Exception {
        DynamicalModel model = lower(Files.readString(Path.of(System.getProperty("phasewright.examples"),
                "thermosyphon.phase")));
        assertEquals("thermosyphon", model.name());
        assertEquals(List.of("q", "h", "v"), model.states().stream().map(s -> s.name()).toList());
        assertEquals(List.of("p", "ra", "k"), model.parameters().stream().map(p -> p.name()).toList());
        assertEquals("s", model.time().unit());
        assertEquals("scaled heating", model.parameters().get(1).description());
        // rate q = p*(h - q)
        Binary rateQ = assertInstanceOf(Binary.class, model.rates().get(0));
        assertEquals(BinaryOperator.MULTIPLY, rateQ.operator());
        assertEquals(new Variable(VariableKind.PARAMETER, 0, "p"), rateQ.left());
        // rate v = flux - k*v refers to the derived quantity, kept by reference
        Binary rateV = assertInstanceOf(Binary.class, model.rates().get(2));
        assertEquals(new Variable(VariableKind.DERIVED, 0, "flux"), rateV.left());
        // symmetry reversal: q -> -q, h -> -h; v is fixed
        List<?> images = model.symmetries().get(0).images();
        assertEquals(new Negation(new Variable(VariableKind.STATE, 0, "q")), images.get(0));
        assertEquals(new Variable(VariableKind.STATE, 2, "v"), images.get(2));
        assertInstanceOf(Simulation.class, model.studies().get(0).analyses().get(0));
        assertInstanceOf(EquilibriumSearch.class, model.studies().get(0).analyses().get(1));
        // k = 8/3 is an expression, evaluated by the runtime
        assertEquals(8.0 / 3.0, ParameterValues.resolve(model)[2], 0.0);
    }

    @Test
    void letsAreOrderedSoEachUsesOnlyEarlierOnes() throws Exception {
        DynamicalModel model = lower("""
                model m
                state x = 1
                let c = b + 1
                let b = a*2
                let a = x
                rate x = -c
                """);
        assertEquals(List.of("a", "b", "c"), model.derived().stream().map(d -> d.name()).toList());
        Binary c = assertInstanceOf(Binary.class, model.derived().get(2).definition());
        assertEquals(new Variable(VariableKind.DERIVED, 1, "b"), c.left());
    }

    @Test
    void constantsAndTimeLower() throws Exception {
        DynamicalModel model = lower("model m\ntime tau in s\nstate x = 1\nrate x = sin(2*pi*tau) - x\n");
        assertEquals("tau", model.time().name());
        double atQuarter = ExprEvaluator.evaluate(model.rates().get(0), 0.25, new double[] { 0.5 }, new double[0],
                new double[0]);
        assertEquals(0.5, atQuarter, 1e-12, "sin(pi/2) - 0.5");
        assertEquals(new Constant(1.0), model.states().get(0).initial());
    }

    @Test
    void modelWithErrorsIsRefused() throws Exception {
        assertThrows(LoweringException.class, () -> lower("model m\nstate x = 1\nstate y = 2\nrate x = y\n"));
        assertThrows(LoweringException.class, () -> lower("model m\nstate x = 1\nrate x = -x + nowhere\n"));
        assertTrue(lower("model m\nstate x = 1\nrate x = -x\n").studies().isEmpty());
    }
}
