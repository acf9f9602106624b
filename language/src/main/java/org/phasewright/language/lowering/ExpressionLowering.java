package org.phasewright.language.lowering;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.function.Function;

import org.phasewright.language.phase.BinaryExpr;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.FunctionCall;
import org.phasewright.language.phase.IndexDecl;
import org.phasewright.language.phase.Negation;
import org.phasewright.language.phase.NumberLiteral;
import org.phasewright.language.phase.PiConstant;
import org.phasewright.language.phase.SumExpr;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.SymbolRef;
import org.phasewright.runtime.assemble.ModelAssembler;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.MathFunction;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.symbolic.IndexExpansion;

/**
 * Lowers AST expressions into runtime {@link Expr} trees, given where each symbol landed in the runtime model:
 * scalars become {@link Variable}s, an index its {@link IndexValue}, {@code x[...]} an element of family x and
 * {@code sum(j, ...)} a {@link Sum}. Inside a subscript a param stands for its (integer) value, since index
 * arithmetic is done on numbers when the model is expanded.
 */
final class ExpressionLowering {
    private final Map<Symbol, Variable> variables;
    private final Map<Symbol, Family> families;
    private final Function<IndexDecl, IndexRange> ranges;
    private final Function<Expression, OptionalDouble> constants;

    /** For expressions over scalars only (constant evaluation). */
    ExpressionLowering(Map<Symbol, Variable> variables) {
        this(variables, Map.of(), index -> {
            throw new LoweringException("index " + index.getName() + " outside a model");
        }, e -> OptionalDouble.empty());
    }

    ExpressionLowering(Map<Symbol, Variable> variables, Map<Symbol, Family> families,
            Function<IndexDecl, IndexRange> ranges, Function<Expression, OptionalDouble> constants) {
        this.variables = variables;
        this.families = families;
        this.ranges = ranges;
        this.constants = constants;
    }

    Expr lower(Expression expression) {
        if (expression == null) {
            throw new LoweringException("incomplete expression");
        }
        if (expression instanceof NumberLiteral number) {
            return new Constant(number.getValue());
        }
        if (expression instanceof PiConstant) {
            return new Constant(Math.PI);
        }
        if (expression instanceof SymbolRef ref) {
            return reference(ref);
        }
        if (expression instanceof SumExpr sum) {
            if (sum.getIndex() == null || sum.getIndex().eIsProxy()) {
                throw new LoweringException("sum over an unknown index");
            }
            return new Sum(ranges.apply(sum.getIndex()), lower(sum.getBody()));
        }
        if (expression instanceof Negation negation) {
            return new org.phasewright.runtime.model.Negation(lower(negation.getOperand()));
        }
        if (expression instanceof BinaryExpr binary) {
            return new Binary(operator(binary.getOp()), lower(binary.getLeft()), lower(binary.getRight()));
        }
        if (expression instanceof FunctionCall call) {
            MathFunction function = MathFunction.byNotationName(call.getFunction())
                    .orElseThrow(() -> new LoweringException("unknown function " + call.getFunction()));
            List<Expr> arguments = new ArrayList<>();
            for (Expression argument : call.getArguments()) {
                arguments.add(lower(argument));
            }
            return new Call(function, arguments);
        }
        throw new LoweringException("unsupported expression " + expression.eClass().getName());
    }

    private Expr reference(SymbolRef ref) {
        Symbol symbol = ref.getSymbol();
        if (symbol instanceof IndexDecl index) {
            return new IndexValue(index.getName());
        }
        if (ref.getSubscript() != null) {
            Family family = families.get(symbol);
            if (family == null) {
                throw new LoweringException("an element of something that is not a family");
            }
            return ModelAssembler.element(family, subscript(ref.getSubscript()));
        }
        Variable variable = variables.get(symbol);
        if (variable == null) {
            throw new LoweringException("unresolved name in expression");
        }
        return variable;
    }

    /**
     * An expression outside every family (study settings, surfaces): elements with constant subscripts and sums
     * expanded into scalars, since analyses read these as they are.
     */
    Expr lowerScalar(Expression expression) {
        try {
            return IndexExpansion.expand(lower(expression), Map.of());
        } catch (IllegalArgumentException unbound) {
            throw new LoweringException("an index without a value in " + unbound.getMessage());
        }
    }

    /** Index arithmetic: indices, whole numbers and params by value, with + - * and unary minus. */
    private Expr subscript(Expression expression) {
        if (expression instanceof SymbolRef ref && !(ref.getSymbol() instanceof IndexDecl)) {
            OptionalDouble value = constants.apply(ref);
            if (value.isEmpty()) {
                throw new LoweringException("a subscript uses " + ref.getSymbol().getName() + ", not a constant");
            }
            return new Constant(value.getAsDouble());
        }
        if (expression instanceof BinaryExpr binary) {
            return new Binary(operator(binary.getOp()), subscript(binary.getLeft()), subscript(binary.getRight()));
        }
        if (expression instanceof Negation negation) {
            return new org.phasewright.runtime.model.Negation(subscript(negation.getOperand()));
        }
        return lower(expression);
    }

    static BinaryOperator operator(String op) {
        return switch (op) {
            case "+" -> BinaryOperator.ADD;
            case "-" -> BinaryOperator.SUBTRACT;
            case "*" -> BinaryOperator.MULTIPLY;
            case "/" -> BinaryOperator.DIVIDE;
            case "^" -> BinaryOperator.POWER;
            default -> throw new LoweringException("unknown operator " + op);
        };
    }
}
