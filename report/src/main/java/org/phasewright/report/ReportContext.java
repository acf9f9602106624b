package org.phasewright.report;

import java.time.Duration;
import java.time.Instant;
import java.util.List;

import org.phasewright.runtime.model.DynamicalModel;

/**
 * What a report needs besides the numbers of a study.
 *
 * @param modelFile   the model's file name as the user gave it (shown, never interpreted); may be null
 * @param modelText   the model's source text, shown in the report; may be null
 * @param model       the lowered model, for units, descriptions and analysis settings; may be null
 * @param toolVersion e.g. "0.1.0"
 * @param runTime     wall time of the study run
 * @param finished    when the run finished
 * @param projections pairs of state names to plot against each other; empty for the default choice
 */
public record ReportContext(String modelFile, String modelText, DynamicalModel model, String toolVersion,
        Duration runTime, Instant finished, List<List<String>> projections) {

    public ReportContext {
        projections = projections == null ? List.of() : projections.stream().map(List::copyOf).toList();
        for (List<String> pair : projections) {
            if (pair.size() != 2) {
                throw new IllegalArgumentException("a projection needs two state names, got " + pair);
            }
        }
        runTime = runTime == null ? Duration.ZERO : runTime;
        finished = finished == null ? Instant.now() : finished;
        toolVersion = toolVersion == null ? "unknown" : toolVersion;
    }

    public ReportContext withProjections(List<List<String>> pairs) {
        return new ReportContext(modelFile, modelText, model, toolVersion, runTime, finished, pairs);
    }
}
