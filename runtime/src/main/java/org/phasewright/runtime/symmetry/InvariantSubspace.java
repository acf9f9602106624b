package org.phasewright.runtime.symmetry;

import java.util.List;

/**
 * A fixed-point subspace Fix(H) = {u : h·u = u for all h in H} of some declared symmetries H. The flow leaves it
 * invariant, since f(h·u) = h·f(u) gives h·f(u) = f(u) there (Golubitsky, Stewart & Schaeffer, Singularities and
 * Groups in Bifurcation Theory II, ch. XIII, §2).
 *
 * @param equations e.g. "x = 0, y = 0"
 * @param description e.g. "the z axis", or the equations again when there is no shorter name
 */
public record InvariantSubspace(String equations, String description, int dimension, List<String> fixedBy) {
    public InvariantSubspace {
        fixedBy = List.copyOf(fixedBy);
    }
}
