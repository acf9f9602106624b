package org.phasewright.runtime.symbolic;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.add;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.model;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.param;
import static org.phasewright.runtime.TestModels.parameter;
import static org.phasewright.runtime.TestModels.state;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.StateVariable;

class ParameterValuesTest {

    @Test
    void resolvesParametersInDependencyOrderWhateverTheirDeclarationOrder() {
        // c = a + b is declared before a and b = 2a; by hand: a = 3, b = 6, c = 9, and x(0) = 2c = 18.
        // Indices: c = 0, a = 1, b = 2.
        DynamicalModel m = model("m", List.of(new StateVariable("x", mul(param(0, "c"), c(2)), null, null)),
                List.of(parameter("c", add(param(1, "a"), param(2, "b"))), parameter("a", c(3)),
                        parameter("b", mul(c(2), param(1, "a")))),
                List.of(), List.of(c(0)));
        double[] p = ParameterValues.resolve(m);
        assertArrayEquals(new double[] {9, 3, 6}, p);
        assertArrayEquals(new double[] {18}, InitialValues.resolve(m, p));
    }

    @Test
    void cycleIsReportedWithItsMembers() {
        DynamicalModel m = model("m", List.of(), List.of(parameter("a", add(param(1, "b"), c(1))),
                parameter("b", mul(param(2, "c"), c(2))), parameter("c", param(0, "a"))), List.of(), List.of());
        ModelEvaluationException e = assertThrows(ModelEvaluationException.class, () -> ParameterValues.resolve(m));
        assertEquals("parameters are defined in a cycle: a -> b -> c -> a", e.getMessage());
    }

    @Test
    void selfReferenceIsACycle() {
        DynamicalModel m = model("m", List.of(), List.of(parameter("a", add(param(0, "a"), c(1)))), List.of(),
                List.of());
        assertTrue(assertThrows(ModelEvaluationException.class, () -> ParameterValues.resolve(m)).getMessage()
                .contains("a -> a"));
    }

    @Test
    void parameterMayNotUseAState() {
        DynamicalModel m = model("m", List.of(new StateVariable("x", c(1), null, null)),
                List.of(parameter("a", state(0, "x"))), List.of(), List.of(c(0)));
        assertTrue(assertThrows(ModelEvaluationException.class, () -> ParameterValues.resolve(m)).getMessage()
                .contains("parameter 'a' refers to state 'x'"));
    }

    @Test
    void nonFiniteValueIsRejected() {
        DynamicalModel m = model("m", List.of(), List.of(parameter("a", org.phasewright.runtime.TestModels.div(c(1),
                c(0)))), List.of(), List.of());
        assertTrue(assertThrows(ModelEvaluationException.class, () -> ParameterValues.resolve(m)).getMessage()
                .contains("Infinity"));
    }
}
