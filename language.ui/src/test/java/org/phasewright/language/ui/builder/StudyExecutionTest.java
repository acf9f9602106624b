package org.phasewright.language.ui.builder;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.ui.ExampleModels;
import org.phasewright.language.ui.PhaseLanguage;
import org.phasewright.language.ui.results.EquilibriumRow;
import org.phasewright.language.ui.results.ModelResults;
import org.phasewright.language.ui.results.StudyResults;

/** What the results view receives after a save: the pipeline's numbers, reshaped for the table and the plots. */
class StudyExecutionTest {
    @TempDir
    Path folder;

    @Test
    void thermosyphonResultsReachTheViewAndTheFolder() throws Exception {
        String text = ExampleModels.read("thermosyphon.phase");
        Path model = Files.writeString(folder.resolve("thermosyphon.phase"), text);
        CheckedModel checked = PhaseLanguage.get().check(model.toString(), model.toString(), text);

        ModelResults results = StudyExecution.run(checked, model, () -> false);

        StudyResults study = results.studies().get(0);
        assertEquals("first_look", study.name());
        assertEquals(List.of("q", "h", "v"), study.stateNames());
        assertEquals(study.times().length, study.states()[0].length, "one value per state and time");
        assertEquals(50.0, study.times()[study.times().length - 1], 1e-9, "simulate to t = 50");
        // Lorenz (1963) with r = 28, b = 8/3: equilibria at the origin and at (±sqrt(b(r-1)), ±sqrt(b(r-1)), r-1).
        double c = Math.sqrt(8.0 / 3.0 * 27.0);
        assertEquals(3, study.equilibria().size());
        assertTrue(study.equilibria().stream().anyMatch(row -> near(row, c, c, 27)), study.equilibria()::toString);
        assertTrue(study.equilibria().stream().anyMatch(row -> near(row, -c, -c, 27)));
        EquilibriumRow origin = study.equilibria().stream().filter(row -> near(row, 0, 0, 0)).findFirst().orElseThrow();
        assertTrue(origin.orbit().contains("fixed by reversal"), origin.orbit());
        for (String file : List.of("trajectory.csv", "equilibria.csv", "equilibria.json")) {
            assertTrue(Files.isRegularFile(study.folder().resolve(file)), file);
        }
    }

    @Test
    void eigenvaluesReadAsComplexNumbers() {
        assertEquals("0.09396 + 10.19i, 0.09396 - 10.19i, -13.85",
                StudyExecution.eigenvalueText(new double[] { 0.093956, 0.093956, -13.8545 },
                        new double[] { 10.1945, -10.1945, 0 }));
    }

    private static boolean near(EquilibriumRow row, double q, double h, double v) {
        double[] x = row.coordinates();
        return Math.abs(x[0] - q) < 1e-6 && Math.abs(x[1] - h) < 1e-6 && Math.abs(x[2] - v) < 1e-6;
    }
}
