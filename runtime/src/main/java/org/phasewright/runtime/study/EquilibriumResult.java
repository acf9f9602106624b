package org.phasewright.runtime.study;

import java.util.List;

import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.equilibria.EquilibriumSearchOutcome;

/**
 * @param search details of the search; null when it could not run (e.g. NOT_AUTONOMOUS)
 */
public record EquilibriumResult(List<Equilibrium> equilibria, EquilibriumSearchOutcome search, Status status,
        String outcome, String message) implements AnalysisResult {
    public EquilibriumResult {
        equilibria = List.copyOf(equilibria);
    }
}
