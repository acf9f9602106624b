package org.phasewright.runtime.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.study.AnalysisResult;
import org.phasewright.runtime.study.BasinsResult;
import org.phasewright.runtime.study.ContinuationResult;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.LyapunovMapResult;
import org.phasewright.runtime.study.LyapunovResult;
import org.phasewright.runtime.study.ReducedOutput;
import org.phasewright.runtime.study.SectionResult;
import org.phasewright.runtime.study.SimulationResult;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.SweepResult;

/**
 * Writes every file of a study result into a folder: summary.txt, trajectory.csv for each simulation that produced
 * samples (and final-state.csv, one row per state, when the model has more states than the summary shows),
 * equilibria.csv and equilibria.json for each search (and equilibria-states.csv, one row per state, when the model
 * has more states than a row of equilibria.csv holds), section.csv (the crossings, same columns as a trajectory)
 * for each section, lyapunov.csv (running estimates) for each Lyapunov request, branches.csv and branches.json for
 * each continuation (and cycles.csv when it followed periodic orbits from Hopf points), sweep.csv (local maxima)
 * for each orbit diagram, lyapunov-map.csv for each Lyapunov map and basins.csv for each basins request. The second
 * simulation or search of a study gets files named trajectory-2.csv, equilibria-2.csv, and so on.
 */
public final class ReportWriter {
    private ReportWriter() {
    }

    /** @return the files written, in the order of the analyses, summary last */
    public static List<Path> writeAll(StudyResult study, Path folder) throws IOException {
        List<Path> written = new ArrayList<>();
        int simulation = 0, search = 0, section = 0, lyapunov = 0, continuation = 0, sweep = 0, map = 0, basins = 0;
        for (AnalysisResult r : study.results()) {
            switch (r) {
                case SimulationResult s -> {
                    simulation++;
                    if (s.trajectory() != null) {
                        Path file = folder.resolve(name("trajectory", simulation, "csv"));
                        AtomicFiles.write(file, out -> TrajectoryCsv.write(s.trajectory(), out));
                        written.add(file);
                    }
                    if (s.integration() != null && s.integration().state().length > TextSummary.SHOWN_STATES) {
                        Path file = folder.resolve(name("final-state", simulation, "csv"));
                        AtomicFiles.write(file, out -> FinalStateCsv.write(study.stateNames(), s.integration(),
                                out));
                        written.add(file);
                    }
                }
                case EquilibriumResult e -> {
                    search++;
                    Path csv = folder.resolve(name("equilibria", search, "csv"));
                    AtomicFiles.write(csv, EquilibriaCsv.render(study.stateNames(), e));
                    written.add(csv);
                    if (ReducedOutput.reduced(study.stateNames().size()) && !e.equilibria().isEmpty()) {
                        Path states = folder.resolve(name("equilibria-states", search, "csv"));
                        AtomicFiles.write(states, out -> EquilibriumStatesCsv.write(study.stateNames(), e, out));
                        written.add(states);
                    }
                    Path json = folder.resolve(name("equilibria", search, "json"));
                    AtomicFiles.write(json, EquilibriaJson.render(study, e));
                    written.add(json);
                }
                case SectionResult x -> {
                    section++;
                    if (x.points() != null) {
                        Path file = folder.resolve(name("section", section, "csv"));
                        AtomicFiles.write(file, out -> TrajectoryCsv.write(x.points(), out));
                        written.add(file);
                    }
                }
                case LyapunovResult l -> {
                    lyapunov++;
                    if (l.spectrum() != null) {
                        Path file = folder.resolve(name("lyapunov", lyapunov, "csv"));
                        AtomicFiles.write(file, LyapunovCsv.render(study.timeName(), l.spectrum()));
                        written.add(file);
                    }
                }
                case ContinuationResult c -> {
                    continuation++;
                    if (c.continuation() != null) {
                        Path csv = folder.resolve(name("branches", continuation, "csv"));
                        AtomicFiles.write(csv, BranchesCsv.render(study.stateNames(), c.continuation()));
                        written.add(csv);
                        Path json = folder.resolve(name("branches", continuation, "json"));
                        AtomicFiles.write(json, BranchesJson.render(study, c));
                        written.add(json);
                        if (!c.cycles().isEmpty()) {
                            Path cycles = folder.resolve(name("cycles", continuation, "csv"));
                            AtomicFiles.write(cycles, CyclesCsv.render(c.continuation().parameterName(),
                                    study.stateNames(), c.cycles()));
                            written.add(cycles);
                        }
                    }
                }
                case SweepResult w -> {
                    sweep++;
                    if (w.sweep() != null) {
                        Path csv = folder.resolve(name("sweep", sweep, "csv"));
                        AtomicFiles.write(csv, SweepCsv.render(study.stateNames(), w.sweep()));
                        written.add(csv);
                    }
                }
                case LyapunovMapResult m -> {
                    map++;
                    if (m.first() != null && !m.points().isEmpty()) {
                        Path csv = folder.resolve(name("lyapunov-map", map, "csv"));
                        AtomicFiles.write(csv, LyapunovMapCsv.render(m));
                        written.add(csv);
                    }
                }
                case BasinsResult b -> {
                    basins++;
                    if (b.first() != null && !b.points().isEmpty()) {
                        Path csv = folder.resolve(name("basins", basins, "csv"));
                        AtomicFiles.write(csv, BasinsCsv.render(b));
                        written.add(csv);
                    }
                }
            }
        }
        Path summary = folder.resolve("summary.txt");
        AtomicFiles.write(summary, TextSummary.render(study) + "\n" + TextSummary.CAUTION + "\n");
        written.add(summary);
        return written;
    }

    private static String name(String stem, int number, String extension) {
        return stem + (number > 1 ? "-" + number : "") + "." + extension;
    }
}
