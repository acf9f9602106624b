package org.phasewright.language.ui.results;

import java.util.List;

/** The outcome of running a model's studies after a save: the studies' results, or why they could not run. */
public record ModelResults(String fileName, String failure, List<StudyResults> studies, long elapsedMillis) {
    public ModelResults {
        studies = List.copyOf(studies);
    }

    public static ModelResults failed(String fileName, String failure) {
        return new ModelResults(fileName, failure, List.of(), 0);
    }
}
