package org.phasewright.runtime.ensemble;

import java.io.Serializable;

import org.phasewright.runtime.compile.CompiledModel;

/** Name and sizes of the model a task was made for, to catch a recipe that builds a different one. */
public record ModelShape(String name, int states, int parameters) implements Serializable {
    public static ModelShape of(CompiledModel model) {
        return new ModelShape(model.name(), model.dimension(), model.parameters().length);
    }

    public void check(CompiledModel model) {
        ModelShape other = of(model);
        if (!equals(other)) {
            throw new IllegalStateException("the model rebuilt on a worker (" + other
                    + ") is not the model of the ensemble (" + this + ")");
        }
    }
}
