package org.phasewright.runtime.symmetry;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.symbolic.IndexedForms;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.ExprEvaluator;
import org.phasewright.runtime.symbolic.InitialValues;
import org.phasewright.runtime.symbolic.ParameterValues;
import org.phasewright.runtime.symbolic.Substitution;

/**
 * The rates of a model as functions of the states (and time) alone: parameters replaced by their values, lets
 * inlined. Symmetries are therefore checked at the declared parameter values.
 */
public final class PreparedField {
    private final List<Expr> rates;
    private final List<String> stateNames;
    private final double[] typicalSize;

    private PreparedField(List<Expr> rates, List<String> stateNames, double[] typicalSize) {
        this.rates = rates;
        this.stateNames = stateNames;
        this.typicalSize = typicalSize;
    }

    /** @throws org.phasewright.runtime.symbolic.ModelEvaluationException when parameters cannot be evaluated */
    public static PreparedField of(DynamicalModel model) {
        double[] p = ParameterValues.resolve(model);
        List<Expr> rates = new ArrayList<>();
        for (Expr rate : model.rates()) {
            rates.add(Substitution.parameters(Substitution.inlineDerived(rate, model.derived()), p));
        }
        double[] size = new double[model.dimension()];
        try {
            double[] initial = InitialValues.resolve(model, p);
            for (int i = 0; i < size.length; i++) {
                size[i] = Double.isFinite(initial[i]) ? Math.max(1, Math.abs(initial[i])) : 1;
            }
        } catch (RuntimeException unusable) {
            java.util.Arrays.fill(size, 1);
        }
        return new PreparedField(List.copyOf(rates), model.states().stream().map(s -> s.name()).toList(), size);
    }

    public int dimension() {
        return rates.size();
    }

    public List<String> stateNames() {
        return stateNames;
    }

    List<Expr> rates() {
        return rates;
    }

    /** Where random sample points are drawn: each state within a few times its initial size. */
    double typicalSize(int state) {
        return typicalSize[state];
    }

    /** State names plus the time variable, for printing normal forms. */
    List<String> variableNames(String timeName) {
        List<String> names = new ArrayList<>(stateNames);
        names.add(timeName);
        return names;
    }

    Optional<RationalForm> form(Expr e) {
        return RationalForm.of(e, dimension());
    }

    double[] evaluate(double[] u, double t) {
        double[] out = new double[rates.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = evaluateRate(i, u, t);
        }
        return out;
    }

    /** Rate i at (u, t); NaN where it is undefined. */
    double evaluateRate(int i, double[] u, double t) {
        try {
            return ExprEvaluator.evaluate(rates.get(i), t, u, NONE, NONE);
        } catch (RuntimeException outsideDomain) {
            return Double.NaN;
        }
    }

    private static final double[] NONE = new double[0];

    /** {@code e} with every state j replaced by {@code images.get(j)}. */
    static Expr substituteStates(Expr e, List<Expr> images) {
        return switch (e) {
            case Constant c -> c;
            case Variable v -> v.kind() == VariableKind.STATE ? images.get(v.index()) : v;
            case Negation n -> new Negation(substituteStates(n.operand(), images));
            case Binary b -> new Binary(b.operator(), substituteStates(b.left(), images),
                    substituteStates(b.right(), images));
            case Call c -> new Call(c.function(),
                    c.arguments().stream().map(a -> substituteStates(a, images)).toList());
            case IndexValue i -> throw IndexedForms.unexpanded("symmetry substitution", i);
            case Element el -> throw IndexedForms.unexpanded("symmetry substitution", el);
            case Sum s -> throw IndexedForms.unexpanded("symmetry substitution", s);
        };
    }

    /** The expression sum_j m[i][j] * u_j for each row i: the images of the states under a matrix. */
    static List<Expr> linearImages(double[][] m) {
        List<Expr> images = new ArrayList<>();
        for (double[] row : m) {
            Expr sum = Constant.ZERO;
            for (int j = 0; j < row.length; j++) {
                if (row[j] != 0) {
                    Expr term = new Binary(BinaryOperator.MULTIPLY, new Constant(row[j]),
                            new Variable(VariableKind.STATE, j, "u" + j));
                    sum = new Binary(BinaryOperator.ADD, sum, term);
                }
            }
            images.add(sum);
        }
        return images;
    }

    /** sum_j m[i][j] * e_j, e.g. the rates transformed by a symmetry. */
    static Expr combination(double[] row, List<Expr> expressions) {
        Expr sum = Constant.ZERO;
        for (int j = 0; j < row.length; j++) {
            if (row[j] != 0) {
                sum = new Binary(BinaryOperator.ADD, sum,
                        new Binary(BinaryOperator.MULTIPLY, new Constant(row[j]), expressions.get(j)));
            }
        }
        return sum;
    }
}
