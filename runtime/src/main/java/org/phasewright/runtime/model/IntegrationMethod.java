package org.phasewright.runtime.model;

/** Which integrator a study step uses. */
public enum IntegrationMethod {
    /** Dormand–Prince 5(4), with a stiffness warning: the default. */
    EXPLICIT,
    /** Dormand–Prince 8(5,3): fewer, costlier steps; best for tight tolerances on smooth problems. */
    HIGH_ORDER,
    /** Rosenbrock method RODAS4 with the exact Jacobian, for stiff models. */
    STIFF
}
