package org.phasewright.runtime.model;

import java.util.List;

/** A call of one of the built-in functions. */
public record Call(MathFunction function, List<Expr> arguments) implements Expr {
    public Call {
        arguments = List.copyOf(arguments);
        if (arguments.size() != function.arity()) {
            throw new IllegalArgumentException(function.notationName() + " takes " + function.arity()
                    + " argument(s), got " + arguments.size());
        }
    }
}
