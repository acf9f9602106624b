package org.phasewright.runtime.study;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.integrate.DormandPrince853;
import org.phasewright.runtime.integrate.ExplicitMethod;
import org.phasewright.runtime.integrate.Integrator;
import org.phasewright.runtime.integrate.Rodas4;
import org.phasewright.runtime.model.IntegrationMethod;

/** Maps the method named in a study to an integrator for a compiled model. */
final class IntegratorChoice {
    private IntegratorChoice() {
    }

    static Integrator create(IntegrationMethod method, CompiledModel model, double[] p) {
        return switch (method) {
            case EXPLICIT -> ExplicitMethod.create(model, p, Runtime.getRuntime().availableProcessors());
            case HIGH_ORDER -> new DormandPrince853(model.field(), p);
            case STIFF -> new Rodas4(model.field(), p, model.autonomous());
        };
    }

    /**
     * Why {@code method} cannot run on {@code model}, or null when it can: the stiff solver of a large model needs a
     * sparse Jacobian, which a model with too many nonzeros (e.g. an all-to-all sum) does not get.
     */
    static String unavailable(IntegrationMethod method, CompiledModel model) {
        if (method == IntegrationMethod.STIFF && model.field().large() && model.field().sparseJacobian() == null) {
            return "the stiff method needs a sparse Jacobian, and this model of " + model.dimension()
                    + " states couples too many of them; use the explicit method or fewer states";
        }
        return null;
    }

    /** Coarse status of an integration's ending. */
    static Status status(org.phasewright.runtime.integrate.IntegrationOutcome outcome) {
        return switch (outcome.ending()) {
            case COMPLETED, STOPPED -> Status.COMPLETED;
            case STEP_LIMIT, TIME_LIMIT, CANCELLED -> Status.INCOMPLETE;
            case BLEW_UP, NOT_FINITE, STEP_SIZE_UNDERFLOW -> Status.FAILED;
        };
    }
}
