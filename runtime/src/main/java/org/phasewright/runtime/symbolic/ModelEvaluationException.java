package org.phasewright.runtime.symbolic;

/**
 * A model's numbers cannot be worked out: a cyclic parameter definition, a reference that is not allowed in that
 * place, or a value that is not a finite number. The message is written for the person who wrote the model.
 */
public final class ModelEvaluationException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public ModelEvaluationException(String message) {
        super(message);
    }
}
