package org.phasewright.language.ui.wizard;

/** The text of a new model: a damped oscillator that checks and runs as it is. */
public final class ModelTemplate {
    private ModelTemplate() {
    }

    public static String text(String name) {
        String modelName = name.isEmpty() || !Character.isLetter(name.charAt(0)) && name.charAt(0) != '_'
                ? "model_" + name : name;
        return """
                // A new model: replace the states, parameters and rates with your own.
                model %s "A damped oscillator to start from"
                time t in s
                param damping = 0.2 range 0 .. 2   "friction over inertia"
                param stiffness = 1                "restoring force per unit displacement"
                state x = 1   "displacement"
                state v = 0   "velocity"
                let energy = v^2/2 + stiffness*x^2/2
                rate x = v
                rate v = -stiffness*x - damping*v
                symmetry mirror: x -> -x, v -> -v
                study first_look {
                  simulate to t = 30
                  equilibria
                }
                """.formatted(modelName);
    }
}
