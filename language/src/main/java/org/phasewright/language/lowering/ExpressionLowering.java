package org.phasewright.language.lowering;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.phasewright.language.phase.BinaryExpr;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.FunctionCall;
import org.phasewright.language.phase.Negation;
import org.phasewright.language.phase.NumberLiteral;
import org.phasewright.language.phase.PiConstant;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.SymbolRef;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.MathFunction;
import org.phasewright.runtime.model.Variable;

/** Lowers AST expressions into runtime {@link Expr} trees, given where each symbol landed in the runtime model. */
final class ExpressionLowering {
    private final Map<Symbol, Variable> variables;

    ExpressionLowering(Map<Symbol, Variable> variables) {
        this.variables = variables;
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
            Variable variable = variables.get(ref.getSymbol());
            if (variable == null) {
                throw new LoweringException("unresolved name in expression");
            }
            return variable;
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
