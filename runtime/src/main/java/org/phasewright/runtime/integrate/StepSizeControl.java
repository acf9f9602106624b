package org.phasewright.runtime.integrate;

/**
 * The step-size controller of DOPRI5 and DOP853 (Hairer, Nørsett &amp; Wanner, Solving ODEs I, Section II.4, as
 * coded there): h_new = h / fac with fac = err^expo / facOld^beta / safety kept within [1/facMax, 1/facMin];
 * beta > 0 is DOPRI5's PI ("Lund-stabilised") form, beta = 0 the classical one. One instance per integration.
 */
final class StepSizeControl {
    private final double expo, beta, safety, facMin, facMax;
    private double facOld = 1e-4;

    StepSizeControl(double expo, double beta, double safety, double facMin, double facMax) {
        this.expo = expo;
        this.beta = beta;
        this.safety = safety;
        this.facMin = facMin;
        this.facMax = facMax;
    }

    /** The next step after an accepted attempt of size h with error err <= 1, before the driver's limits. */
    double accepted(double err, double h) {
        double fac = Math.pow(err, expo) / Math.pow(facOld, beta);
        fac = Math.max(1 / facMax, Math.min(1 / facMin, fac / safety));
        facOld = Math.max(err, 1e-4);
        return h / fac;
    }

    /** The retry after a rejected attempt of size h with error err > 1 (never grows). */
    double rejected(double err, double h) {
        return h / Math.min(1 / facMin, Math.pow(err, expo) / safety);
    }
}
