package org.phasewright.runtime.symmetry;

import java.util.List;

/**
 * How the declared symmetries act on one equilibrium.
 *
 * @param orbit     number of its orbit (1, 2, ...): equilibria with the same number are images of each other
 * @param isotropy  the declared symmetries that fix it
 * @param images    e.g. "rotation: E3", where each declared symmetry sends it
 */
public record EquilibriumSymmetry(String equilibrium, int orbit, List<String> isotropy, List<String> images) {
    public EquilibriumSymmetry {
        isotropy = List.copyOf(isotropy);
        images = List.copyOf(images);
    }
}
