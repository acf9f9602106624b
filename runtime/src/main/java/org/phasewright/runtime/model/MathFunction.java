package org.phasewright.runtime.model;

import java.util.Optional;

/** The functions a rate law may call, with their arity. */
public enum MathFunction {
    SIN("sin", 1), COS("cos", 1), TAN("tan", 1), EXP("exp", 1), LOG("log", 1), SQRT("sqrt", 1),
    ABS("abs", 1), TANH("tanh", 1), SINH("sinh", 1), COSH("cosh", 1), ATAN("atan", 1),
    MIN("min", 2), MAX("max", 2);

    private final String notationName;
    private final int arity;

    MathFunction(String notationName, int arity) {
        this.notationName = notationName;
        this.arity = arity;
    }

    /** The name written in `.phase` files. */
    public String notationName() {
        return notationName;
    }

    public int arity() {
        return arity;
    }

    public static Optional<MathFunction> byNotationName(String name) {
        for (MathFunction f : values()) {
            if (f.notationName.equals(name)) {
                return Optional.of(f);
            }
        }
        return Optional.empty();
    }
}
