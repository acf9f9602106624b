package org.phasewright.spark;

import java.util.List;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.ensemble.ModelRecipe;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Parameter;
import org.phasewright.runtime.model.StateVariable;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/** Models built in Java (this module has no language), shipped to Spark as recipes that name them. */
enum JavaModels implements ModelRecipe {
    /** Lorenz (1963): x' = σ(y − x), y' = x(r − z) − y, z' = xy − bz, σ = 10, r = 28, b = 8/3, from (1, 1, 1). */
    LORENZ {
        @Override
        DynamicalModel build() {
            Expr x = s(0, "x"), y = s(1, "y"), z = s(2, "z"), sigma = p(0, "sigma"), r = p(1, "r"), b = p(2, "b");
            return model("lorenz", List.of(state("x", 1), state("y", 1), state("z", 1)),
                    List.of(param("sigma", 10), param("r", 28), param("b", 8.0 / 3)),
                    List.of(op(BinaryOperator.MULTIPLY, sigma, op(BinaryOperator.SUBTRACT, y, x)),
                            op(BinaryOperator.SUBTRACT, op(BinaryOperator.MULTIPLY, x,
                                    op(BinaryOperator.SUBTRACT, r, z)), y),
                            op(BinaryOperator.SUBTRACT, op(BinaryOperator.MULTIPLY, x, y),
                                    op(BinaryOperator.MULTIPLY, b, z))));
        }
    },
    /** The damped double-well Duffing oscillator x' = v, v' = x − x³ − δv with δ = 0.5. */
    DUFFING {
        @Override
        DynamicalModel build() {
            Expr x = s(0, "x"), v = s(1, "v"), delta = p(0, "delta");
            return model("duffing", List.of(state("x", 0.5), state("v", 0)), List.of(param("delta", 0.5)),
                    List.of(v, op(BinaryOperator.SUBTRACT, op(BinaryOperator.SUBTRACT, x,
                            op(BinaryOperator.POWER, x, new Constant(3))), op(BinaryOperator.MULTIPLY, delta, v))));
        }
    },
    /** The Hopf normal form in Cartesian form, x' = μx − y − x(x² + y²), y' = x + μy − y(x² + y²), from (0.1, 0). */
    HOPF {
        @Override
        DynamicalModel build() {
            Expr x = s(0, "x"), y = s(1, "y"), mu = p(0, "mu");
            Expr r2 = op(BinaryOperator.ADD, op(BinaryOperator.MULTIPLY, x, x), op(BinaryOperator.MULTIPLY, y, y));
            return model("hopf", List.of(state("x", 0.1), state("y", 0)), List.of(param("mu", -1)),
                    List.of(op(BinaryOperator.SUBTRACT, op(BinaryOperator.SUBTRACT, op(BinaryOperator.MULTIPLY, mu,
                            x), y), op(BinaryOperator.MULTIPLY, x, r2)),
                            op(BinaryOperator.SUBTRACT, op(BinaryOperator.ADD, x, op(BinaryOperator.MULTIPLY, mu, y)),
                                    op(BinaryOperator.MULTIPLY, y, r2))));
        }
    };

    abstract DynamicalModel build();

    @Override
    public String key() {
        return name();
    }

    @Override
    public CompiledModel compile() {
        return ModelCompiler.compile(build());
    }

    private static Expr s(int i, String name) {
        return new Variable(VariableKind.STATE, i, name);
    }

    private static Expr p(int i, String name) {
        return new Variable(VariableKind.PARAMETER, i, name);
    }

    private static Expr op(BinaryOperator o, Expr a, Expr b) {
        return new Binary(o, a, b);
    }

    private static StateVariable state(String name, double initial) {
        return new StateVariable(name, new Constant(initial), null, null);
    }

    private static Parameter param(String name, double value) {
        return new Parameter(name, new Constant(value), null, null, null);
    }

    private static DynamicalModel model(String name, List<StateVariable> states, List<Parameter> parameters,
            List<Expr> rates) {
        return new DynamicalModel(name, null, TimeAxis.DEFAULT, states, parameters, List.of(), rates, List.of(),
                List.of());
    }
}
