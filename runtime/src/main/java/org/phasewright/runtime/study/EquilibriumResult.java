package org.phasewright.runtime.study;

import java.util.List;

import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.equilibria.EquilibriumSearchOutcome;
import org.phasewright.runtime.symmetry.SymmetryReport;

/**
 * @param search details of the search; null when it could not run (e.g. NOT_AUTONOMOUS)
 * @param symmetry orbits, isotropy and invariant subspaces under the declared symmetries; never null
 */
public record EquilibriumResult(List<Equilibrium> equilibria, EquilibriumSearchOutcome search, Status status,
        String outcome, String message, SymmetryReport symmetry) implements AnalysisResult {
    public EquilibriumResult {
        equilibria = List.copyOf(equilibria);
        symmetry = symmetry == null ? SymmetryReport.NONE : symmetry;
    }

    /** A result without symmetry information. */
    public EquilibriumResult(List<Equilibrium> equilibria, EquilibriumSearchOutcome search, Status status,
            String outcome, String message) {
        this(equilibria, search, status, outcome, message, SymmetryReport.NONE);
    }
}
