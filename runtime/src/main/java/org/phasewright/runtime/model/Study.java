package org.phasewright.runtime.model;

import java.util.List;

/** A named list of analyses, run in order. */
public record Study(String name, List<Analysis> analyses) {
    public Study {
        analyses = List.copyOf(analyses);
    }
}
