package org.phasewright.runtime.study;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.integrate.DormandPrince54;
import org.phasewright.runtime.integrate.DormandPrince853;
import org.phasewright.runtime.integrate.Integrator;
import org.phasewright.runtime.integrate.Rodas4;
import org.phasewright.runtime.model.IntegrationMethod;

/** Maps the method named in a study to an integrator for a compiled model. */
final class IntegratorChoice {
    private IntegratorChoice() {
    }

    static Integrator create(IntegrationMethod method, CompiledModel model, double[] p) {
        return switch (method) {
            case EXPLICIT -> new DormandPrince54(model.field(), p);
            case HIGH_ORDER -> new DormandPrince853(model.field(), p);
            case STIFF -> new Rodas4(model.field(), p, model.autonomous());
        };
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
