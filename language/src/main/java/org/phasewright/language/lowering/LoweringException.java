package org.phasewright.language.lowering;

/** The model cannot be lowered: it has errors the validator should have reported first. */
public class LoweringException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public LoweringException(String message) {
        super(message);
    }
}
