package org.phasewright.runtime.symmetry;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * What the declared symmetries say about a search's equilibria: orbits, isotropy, and the invariant fixed-point
 * subspaces of the flow.
 */
public record SymmetryReport(List<String> symmetries, List<EquilibriumSymmetry> equilibria,
        List<InvariantSubspace> invariantSubspaces) {

    public static final SymmetryReport NONE = new SymmetryReport(List.of(), List.of(), List.of());

    public SymmetryReport {
        symmetries = List.copyOf(symmetries);
        equilibria = List.copyOf(equilibria);
        invariantSubspaces = List.copyOf(invariantSubspaces);
    }

    public boolean isEmpty() {
        return symmetries.isEmpty();
    }

    /** Sentences for orbits of more than one equilibrium, e.g. "E2 and E3 are images under rotation". */
    public List<String> orbitSentences() {
        Map<Integer, List<EquilibriumSymmetry>> byOrbit = new TreeMap<>();
        for (EquilibriumSymmetry e : equilibria) {
            byOrbit.computeIfAbsent(e.orbit(), k -> new ArrayList<>()).add(e);
        }
        List<String> out = new ArrayList<>();
        for (List<EquilibriumSymmetry> orbit : byOrbit.values()) {
            if (orbit.size() < 2) {
                continue;
            }
            List<String> names = orbit.stream().map(EquilibriumSymmetry::equilibrium).toList();
            List<String> under = new ArrayList<>();
            for (EquilibriumSymmetry e : orbit) {
                for (String image : e.images()) {
                    String symmetry = image.substring(0, image.indexOf(':'));
                    if (!under.contains(symmetry) && !image.endsWith(": " + e.equilibrium())) {
                        under.add(symmetry);
                    }
                }
            }
            String list = names.size() == 2 ? names.get(0) + " and " + names.get(1)
                    : String.join(", ", names.subList(0, names.size() - 1)) + " and " + names.get(names.size() - 1);
            out.add(list + " are images under " + String.join(", ", under));
        }
        return out;
    }
}
