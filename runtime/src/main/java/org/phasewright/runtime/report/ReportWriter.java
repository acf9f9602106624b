package org.phasewright.runtime.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.study.AnalysisResult;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.SimulationResult;
import org.phasewright.runtime.study.StudyResult;

/**
 * Writes every file of a study result into a folder: summary.txt, trajectory.csv for each simulation that produced
 * samples, equilibria.csv and equilibria.json for each search. The second simulation or search of a study gets
 * files named trajectory-2.csv, equilibria-2.csv, and so on.
 */
public final class ReportWriter {
    private ReportWriter() {
    }

    /** @return the files written, in the order of the analyses, summary last */
    public static List<Path> writeAll(StudyResult study, Path folder) throws IOException {
        List<Path> written = new ArrayList<>();
        int simulation = 0, search = 0;
        for (AnalysisResult r : study.results()) {
            switch (r) {
                case SimulationResult s -> {
                    simulation++;
                    if (s.trajectory() != null) {
                        Path file = folder.resolve(name("trajectory", simulation, "csv"));
                        AtomicFiles.write(file, out -> TrajectoryCsv.write(s.trajectory(), out));
                        written.add(file);
                    }
                }
                case EquilibriumResult e -> {
                    search++;
                    Path csv = folder.resolve(name("equilibria", search, "csv"));
                    AtomicFiles.write(csv, EquilibriaCsv.render(study.stateNames(), e));
                    written.add(csv);
                    Path json = folder.resolve(name("equilibria", search, "json"));
                    AtomicFiles.write(json, EquilibriaJson.render(study, e));
                    written.add(json);
                }
            }
        }
        Path summary = folder.resolve("summary.txt");
        AtomicFiles.write(summary, TextSummary.render(study));
        written.add(summary);
        return written;
    }

    private static String name(String stem, int number, String extension) {
        return stem + (number > 1 ? "-" + number : "") + "." + extension;
    }
}
