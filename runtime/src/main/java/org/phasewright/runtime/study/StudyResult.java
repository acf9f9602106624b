package org.phasewright.runtime.study;

import java.util.List;

/** Everything a study produced, with the names needed to report it. Results are in the order of the analyses. */
public record StudyResult(String modelName, String studyName, String timeName, List<String> stateNames,
        List<String> derivedNames, List<String> parameterNames, double[] parameterValues,
        List<AnalysisResult> results) {

    public StudyResult {
        stateNames = List.copyOf(stateNames);
        derivedNames = List.copyOf(derivedNames);
        parameterNames = List.copyOf(parameterNames);
        parameterValues = parameterValues.clone();
        results = List.copyOf(results);
    }

    @Override
    public double[] parameterValues() {
        return parameterValues.clone();
    }

    public List<SimulationResult> simulations() {
        return results.stream().filter(SimulationResult.class::isInstance).map(SimulationResult.class::cast).toList();
    }

    public List<EquilibriumResult> equilibriumSearches() {
        return results.stream().filter(EquilibriumResult.class::isInstance).map(EquilibriumResult.class::cast)
                .toList();
    }

    public List<SectionResult> sections() {
        return results.stream().filter(SectionResult.class::isInstance).map(SectionResult.class::cast).toList();
    }

    public List<LyapunovResult> lyapunovSpectra() {
        return results.stream().filter(LyapunovResult.class::isInstance).map(LyapunovResult.class::cast).toList();
    }

    public List<ContinuationResult> continuations() {
        return results.stream().filter(ContinuationResult.class::isInstance).map(ContinuationResult.class::cast)
                .toList();
    }

    public List<SweepResult> sweeps() {
        return results.stream().filter(SweepResult.class::isInstance).map(SweepResult.class::cast).toList();
    }

    /** The worst status of any analysis (COMPLETED for an empty study). */
    public Status status() {
        Status worst = Status.COMPLETED;
        for (AnalysisResult r : results) {
            if (r.status().compareTo(worst) > 0) {
                worst = r.status();
            }
        }
        return worst;
    }
}
