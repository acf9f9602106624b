package org.phasewright.runtime.ensemble;

import java.io.Serializable;

/**
 * The largest Lyapunov exponent at one grid point.
 *
 * @param exponent  estimate over the whole run (NaN when nothing could be integrated)
 * @param converged whether it moved by less than 1% (at least 0.01) over the second half of the run
 * @param ending    how the integration ended (COMPLETED, BLEW_UP, ..., or INVALID_INPUT)
 */
public record LyapunovPoint(double exponent, boolean converged, String ending) implements Serializable {
}
