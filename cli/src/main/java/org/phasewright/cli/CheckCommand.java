package org.phasewright.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.PhaseFiles;

/** `phasewright check FILE...`: parse and validate, print problems, exit 1 when any file has an error. */
final class CheckCommand {
    private final PrintStream out;

    CheckCommand(PrintStream out) {
        this.out = out;
    }

    int execute(List<String> args) throws UsageException {
        Arguments parsed = Arguments.parse(args, Set.of(), Set.of("quiet"));
        if (parsed.operands().isEmpty()) {
            throw new UsageException("check needs at least one .phase file");
        }
        PhaseFiles files = new PhaseFiles();
        List<CheckedModel> checked = new ArrayList<>();
        for (String file : parsed.operands()) {
            CheckedModel model = files.check(Path.of(file));
            ProblemPrinter.print(model, out);
            checked.add(model);
        }
        if (!parsed.flag("quiet")) {
            out.println(ProblemPrinter.tally(checked));
        }
        return checked.stream().anyMatch(CheckedModel::hasErrors) ? ExitCodes.MODEL_ERRORS : ExitCodes.OK;
    }
}
