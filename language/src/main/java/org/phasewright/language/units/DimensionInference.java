package org.phasewright.language.units;

import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Consumer;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.phasewright.language.ast.Families;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.lowering.ConstantValues;
import org.phasewright.language.phase.BinaryExpr;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.FunctionCall;
import org.phasewright.language.phase.IndexDecl;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.Negation;
import org.phasewright.language.phase.NumberLiteral;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.PiConstant;
import org.phasewright.language.phase.SumExpr;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.SymbolRef;
import org.phasewright.runtime.units.Dimension;
import org.phasewright.runtime.units.Rational;
import org.phasewright.runtime.units.Unit;

/**
 * The dimension of expressions of one model. Numbers are dimensionless; a param, state or time without `in` has an
 * unknown dimension and is not checked (a model opts in by writing units); a let without `in` takes the dimension
 * of its definition, unless that is made of numbers only. Only combinations of known dimensions can be wrong.
 * After a mistake the sub-expression counts as unknown, so one slip gives one marker.
 */
public final class DimensionInference {
    /** A dimension mistake inside an expression: the node to mark and a message naming both dimensions. */
    public record Problem(EObject node, String message, Kind kind) {
    }

    public enum Kind { UNLIKE_SUM, DIMENSIONED_ARGUMENT, BAD_EXPONENT }

    /**
     * What is known about an expression: its dimension (null when unknown), and whether it is made of numbers only,
     * which lets a whole value such as `9.81` take the unit its declaration gives.
     */
    public record Inferred(Dimension dimension, boolean numeric) {
        static final Inferred UNKNOWN = new Inferred(null, false);
        static final Inferred NUMBER = new Inferred(Dimension.NONE, true);

        public boolean known() {
            return dimension != null;
        }
    }

    private final PhaseModel model;
    private ConstantValues constants;
    private final Map<Symbol, Optional<Dimension>> symbols = new HashMap<>();
    private final Set<Symbol> inferring = new HashSet<>();

    private DimensionInference(PhaseModel model) {
        this.model = model;
    }

    public static DimensionInference of(PhaseModel model) {
        return new DimensionInference(model);
    }

    /** Hover-ready: the dimension of any expression of a model, empty when it is unknown or inconsistent. */
    public static Optional<Dimension> dimensionOf(Expression expression) {
        PhaseModel model = EcoreUtil2.getContainerOfType(expression, PhaseModel.class);
        return model == null ? Optional.empty() : of(model).dimension(expression);
    }

    /** The dimension of a declared name: its unit, or for a let without unit its definition's; empty if unknown. */
    public Optional<Dimension> ofSymbol(Symbol symbol) {
        if (symbol == null || symbol.eIsProxy()) {
            return Optional.empty();
        }
        Optional<Dimension> cached = symbols.get(symbol);
        if (cached != null) {
            return cached;
        }
        Optional<Dimension> result;
        if (symbol instanceof IndexDecl) {
            result = Optional.of(Dimension.NONE); // index values are plain numbers
        } else if (Families.unitOf(symbol) != null) {
            result = UnitResolver.resolve(Families.unitOf(symbol)).map(Unit::dimension);
        } else if (symbol instanceof LetDecl let && inferring.add(let)) { // a cycle is the cycle check's to report
            Inferred definition = infer(let.getDefinition(), p -> { });
            // Numbers alone say nothing about the unit meant, as for a param without `in`.
            result = definition.numeric() ? Optional.empty() : Optional.ofNullable(definition.dimension());
            inferring.remove(let);
        } else {
            result = Optional.empty();
        }
        symbols.put(symbol, result);
        return result;
    }

    /** The dimension of the model's time variable, empty when undeclared or without unit. */
    public Optional<Dimension> timeDimension() {
        return PhaseModels.timeDecls(model).stream().findFirst().flatMap(this::ofSymbol);
    }

    public Optional<Dimension> dimension(Expression expression) {
        return Optional.ofNullable(infer(expression, p -> { }).dimension());
    }

    /** Infers bottom-up, handing each mistake to {@code problems}. */
    public Inferred infer(Expression e, Consumer<Problem> problems) {
        if (e == null) {
            return Inferred.UNKNOWN;
        }
        if (e instanceof NumberLiteral || e instanceof PiConstant) {
            return Inferred.NUMBER;
        }
        if (e instanceof SymbolRef ref) {
            // An index value is a number like a literal; an element has its family's unit.
            return ref.getSymbol() instanceof IndexDecl ? Inferred.NUMBER
                    : new Inferred(ofSymbol(ref.getSymbol()).orElse(null), false);
        }
        if (e instanceof SumExpr sum) {
            return infer(sum.getBody(), problems); // a sum has the dimension of its terms
        }
        if (e instanceof Negation negation) {
            return infer(negation.getOperand(), problems);
        }
        if (e instanceof BinaryExpr binary) {
            try {
                return binary(binary, problems);
            } catch (ArithmeticException overflow) { // exponents beyond long range: nothing sensible to say
                return Inferred.UNKNOWN;
            }
        }
        if (e instanceof FunctionCall call) {
            return call(call, problems);
        }
        return Inferred.UNKNOWN;
    }

    private Inferred binary(BinaryExpr binary, Consumer<Problem> problems) {
        Inferred left = infer(binary.getLeft(), problems);
        Inferred right = infer(binary.getRight(), problems);
        String op = binary.getOp();
        if ("+".equals(op) || "-".equals(op)) {
            return alike(binary.getLeft(), left, binary.getRight(), right,
                    "+".equals(op) ? "Cannot add " : "Cannot subtract ", problems);
        }
        if ("*".equals(op) || "/".equals(op)) {
            if (!left.known() || !right.known()) {
                return Inferred.UNKNOWN;
            }
            Dimension d = "*".equals(op) ? left.dimension().times(right.dimension())
                    : left.dimension().dividedBy(right.dimension());
            return new Inferred(d, left.numeric() && right.numeric());
        }
        return power(binary, left, right, problems);
    }

    /**
     * Terms of a sum, or the two arguments of min and max, must share one dimension. The later term is marked:
     * it is the one that joins a sum already of another dimension.
     */
    private static Inferred alike(Expression a, Inferred left, Expression b, Inferred right, String verb,
            Consumer<Problem> problems) {
        if (left.known() && right.known()) {
            if (!left.dimension().equals(right.dimension())) {
                problems.accept(new Problem(b, verb + "quantities of unlike dimensions: " + quote(a) + " is "
                        + left.dimension() + " but " + quote(b) + " is " + right.dimension() + ".", Kind.UNLIKE_SUM));
                return Inferred.UNKNOWN;
            }
            return new Inferred(left.dimension(), left.numeric() && right.numeric());
        }
        Inferred known = left.known() ? left : right;
        return known.known() ? new Inferred(known.dimension(), false) : Inferred.UNKNOWN;
    }

    private Inferred power(BinaryExpr binary, Inferred base, Inferred exponent, Consumer<Problem> problems) {
        if (exponent.known() && !exponent.dimension().isDimensionless()) {
            problems.accept(new Problem(binary.getRight(), "An exponent must be dimensionless; "
                    + quote(binary.getRight()) + " is " + exponent.dimension() + ".", Kind.BAD_EXPONENT));
            return Inferred.UNKNOWN;
        }
        if (!base.known()) {
            return Inferred.UNKNOWN;
        }
        if (base.dimension().isDimensionless()) {
            return new Inferred(Dimension.NONE, base.numeric() && exponent.numeric());
        }
        OptionalDouble value = constants().evaluate(binary.getRight());
        if (value.isEmpty()) {
            problems.accept(new Problem(binary.getRight(), "The power of a dimensioned quantity must be a constant: "
                    + quote(binary.getLeft()) + " is " + base.dimension() + " but the exponent "
                    + quote(binary.getRight()) + " changes during a run.", Kind.BAD_EXPONENT));
            return Inferred.UNKNOWN;
        }
        Rational power = Rational.approximate(value.getAsDouble(), 12);
        if (power == null) {
            problems.accept(new Problem(binary.getRight(),
                    "The power of a dimensioned quantity must be a simple fraction: " + quote(binary.getLeft())
                            + " is " + base.dimension() + " and " + quote(binary.getRight()) + " = "
                            + value.getAsDouble() + " has no small denominator.", Kind.BAD_EXPONENT));
            return Inferred.UNKNOWN;
        }
        return new Inferred(base.dimension().power(power), false);
    }

    private Inferred call(FunctionCall call, Consumer<Problem> problems) {
        Inferred[] args = call.getArguments().stream().map(a -> infer(a, problems)).toArray(Inferred[]::new);
        String f = call.getFunction();
        if (f == null || args.length == 0) {
            return Inferred.UNKNOWN;
        }
        switch (f) {
            case "abs":
                return args[0];
            case "sqrt":
                return args[0].known() ? new Inferred(args[0].dimension().power(new Rational(1, 2)), args[0].numeric())
                        : Inferred.UNKNOWN;
            case "min", "max":
                return args.length == 2
                        ? alike(call.getArguments().get(0), args[0], call.getArguments().get(1), args[1],
                                "'" + f + "' cannot compare ", problems)
                        : Inferred.UNKNOWN;
            default:
                // exp, log, trigonometric and hyperbolic functions: dimensionless in, dimensionless out.
                if (args[0].known() && !args[0].dimension().isDimensionless()) {
                    problems.accept(new Problem(call.getArguments().get(0), "The argument of '" + f
                            + "' must be dimensionless; " + quote(call.getArguments().get(0)) + " is "
                            + args[0].dimension() + ".", Kind.DIMENSIONED_ARGUMENT));
                }
                return new Inferred(Dimension.NONE, args[0].numeric());
        }
    }

    private ConstantValues constants() {
        if (constants == null) {
            constants = ConstantValues.of(model);
        }
        return constants;
    }

    /** The source text of a node in quotes, shortened when long. */
    public static String quote(EObject node) {
        String text = NodeModelUtils.getTokenText(NodeModelUtils.getNode(node));
        if (text == null) {
            return "this";
        }
        text = text.replaceAll("\\s+", " ").trim();
        return "'" + (text.length() > 40 ? text.substring(0, 37) + "..." : text) + "'";
    }
}
