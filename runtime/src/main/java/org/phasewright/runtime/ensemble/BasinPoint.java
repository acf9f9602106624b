package org.phasewright.runtime.ensemble;

import java.io.Serializable;

/**
 * Where one start of a basins grid ended up.
 *
 * @param label  index of the equilibrium the final state lies on, or {@link BasinPoints#NONE}
 * @param ending how the integration ended (COMPLETED, BLEW_UP, ..., or INVALID_INPUT)
 */
public record BasinPoint(int label, String ending) implements Serializable {
}
