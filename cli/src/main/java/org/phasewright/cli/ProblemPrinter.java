package org.phasewright.cli;

import java.io.PrintStream;
import java.util.List;

import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.Problem;

/** Prints problems as `file:line:column: severity: message`, the form editors and CI logs link to. */
final class ProblemPrinter {
    private ProblemPrinter() {
    }

    static void print(CheckedModel checked, PrintStream out) {
        for (Problem problem : checked.problems()) {
            out.println(problem);
        }
    }

    static String tally(List<CheckedModel> checked) {
        long errors = checked.stream().flatMap(c -> c.problems().stream()).filter(Problem::isError).count();
        long warnings = checked.stream().flatMap(c -> c.problems().stream())
                .filter(p -> p.severity() == Problem.Severity.WARNING).count();
        return checked.size() + (checked.size() == 1 ? " file" : " files") + " checked: " + errors
                + (errors == 1 ? " error, " : " errors, ") + warnings + (warnings == 1 ? " warning" : " warnings");
    }
}
