package org.phasewright.language.standalone;

import java.util.List;

import org.phasewright.language.phase.PhaseModel;

/** A parsed and validated `.phase` file: its AST (null when nothing could be parsed) and all problems found. */
public record CheckedModel(String file, PhaseModel ast, List<Problem> problems) {
    public CheckedModel {
        problems = List.copyOf(problems);
    }

    public boolean hasErrors() {
        return problems.stream().anyMatch(Problem::isError);
    }
}
