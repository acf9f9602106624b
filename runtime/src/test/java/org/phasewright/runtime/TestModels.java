package org.phasewright.runtime;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.model.Analysis;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.EquilibriumSearch;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.MathFunction;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Parameter;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.model.StateVariable;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/** Models built by hand in the runtime IR, as the language module would lower them. */
public final class TestModels {
    private TestModels() {
    }

    public static Expr c(double v) {
        return new Constant(v);
    }

    public static Variable state(int i, String name) {
        return new Variable(VariableKind.STATE, i, name);
    }

    public static Variable param(int i, String name) {
        return new Variable(VariableKind.PARAMETER, i, name);
    }

    public static Variable let(int i, String name) {
        return new Variable(VariableKind.DERIVED, i, name);
    }

    public static Variable time() {
        return new Variable(VariableKind.TIME, 0, "t");
    }

    public static Expr add(Expr a, Expr b) {
        return new Binary(BinaryOperator.ADD, a, b);
    }

    public static Expr sub(Expr a, Expr b) {
        return new Binary(BinaryOperator.SUBTRACT, a, b);
    }

    public static Expr mul(Expr a, Expr b) {
        return new Binary(BinaryOperator.MULTIPLY, a, b);
    }

    public static Expr div(Expr a, Expr b) {
        return new Binary(BinaryOperator.DIVIDE, a, b);
    }

    public static Expr pow(Expr a, Expr b) {
        return new Binary(BinaryOperator.POWER, a, b);
    }

    public static Expr neg(Expr a) {
        return new Negation(a);
    }

    public static Expr call(MathFunction f, Expr... args) {
        return new Call(f, List.of(args));
    }

    public static StateVariable stateVar(String name, double initial) {
        return new StateVariable(name, c(initial), null, null);
    }

    public static Parameter parameter(String name, Expr value) {
        return new Parameter(name, value, null, null, null);
    }

    public static DynamicalModel model(String name, List<StateVariable> states, List<Parameter> parameters,
            List<DerivedQuantity> derived, List<Expr> rates, Study... studies) {
        return new DynamicalModel(name, null, TimeAxis.DEFAULT, states, parameters, derived, rates, List.of(),
                List.of(studies));
    }

    public static Study study(String name, Analysis... analyses) {
        return new Study(name, List.of(analyses));
    }

    public static Simulation simulation(double endTime) {
        return new Simulation(c(endTime), List.of(), null);
    }

    public static EquilibriumSearch equilibria() {
        return new EquilibriumSearch();
    }

    /**
     * Lorenz (1963), J. Atmos. Sci. 20:130, eq. (25)-(27) in the now usual letters:
     * x' = σ(y - x), y' = x(r - z) - y, z' = xy - bz with σ = 10, r = 28, b = 8/3, starting at (1, 1, 1).
     */
    public static DynamicalModel lorenz(Study... studies) {
        Variable x = state(0, "x"), y = state(1, "y"), z = state(2, "z");
        Variable sigma = param(0, "sigma"), r = param(1, "r"), b = param(2, "b");
        return model("lorenz",
                List.of(stateVar("x", 1), stateVar("y", 1), stateVar("z", 1)),
                List.of(parameter("sigma", c(10)), parameter("r", c(28)), parameter("b", div(c(8), c(3)))),
                List.of(),
                List.of(mul(sigma, sub(y, x)), sub(mul(x, sub(r, z)), y), sub(mul(x, y), mul(b, z))),
                studies);
    }

    /** x' = x - x^3: equilibria -1, 0, 1 (f'(x) = 1 - 3x^2 gives -2, 1, -2). */
    public static DynamicalModel cubic(double x0) {
        Variable x = state(0, "x");
        return model("cubic", List.of(stateVar("x", x0)), List.of(), List.of(),
                List.of(sub(x, pow(x, c(3)))));
    }

    /** x'' + 2ζω x' + ω² x = 0 as x' = v, v' = -ω² x - 2ζω v. */
    public static DynamicalModel dampedOscillator(double zeta, double omega) {
        Variable x = state(0, "x"), v = state(1, "v");
        Variable z = param(0, "zeta"), w = param(1, "omega");
        return model("oscillator", List.of(stateVar("x", 1), stateVar("v", 0)),
                List.of(parameter("zeta", c(zeta)), parameter("omega", c(omega))), List.of(),
                List.of(v, sub(neg(mul(pow(w, c(2)), x)), mul(mul(mul(c(2), z), w), v))));
    }

    /** A model that uses every function, powers, division and chained derived quantities (for cross-checks). */
    public static DynamicalModel kitchenSink() {
        Variable x = state(0, "x"), y = state(1, "y"), z = state(2, "z"), u = state(3, "u");
        Variable a = param(0, "a"), k = param(1, "k");
        List<DerivedQuantity> lets = new ArrayList<>();
        lets.add(new DerivedQuantity("q", add(mul(x, x), call(MathFunction.SIN, y)), null));          // d0
        lets.add(new DerivedQuantity("w", div(let(0, "q"), add(c(2), call(MathFunction.COS, z))), null)); // d1
        lets.add(new DerivedQuantity("s", call(MathFunction.SQRT, add(c(1), mul(let(1, "w"), let(1, "w")))), null));
        return model("sink", List.of(stateVar("x", 0.3), stateVar("y", -0.2), stateVar("z", 0.5), stateVar("u", 1)),
                List.of(parameter("a", c(1.5)), parameter("k", mul(param(0, "a"), c(2)))),
                lets,
                List.of(
                        add(mul(a, call(MathFunction.TANH, let(2, "s"))), pow(y, c(3))),
                        sub(mul(call(MathFunction.EXP, mul(c(-0.5), x)), call(MathFunction.LOG, add(c(2), mul(z, z)))),
                                div(k, add(c(3), pow(x, c(-2))))),
                        add(add(call(MathFunction.ATAN, mul(x, y)), pow(add(c(2), z), a)),
                                add(call(MathFunction.MIN, x, mul(y, z)), call(MathFunction.ABS, sub(x, c(0.1))))),
                        add(sub(call(MathFunction.SINH, mul(c(0.3), x)), call(MathFunction.COSH, mul(c(0.2), y))),
                                mul(call(MathFunction.MAX, mul(z, u), c(0.1)),
                                        call(MathFunction.TAN, mul(c(0.4), u))))));
    }
}
