package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.lsp4j.DidChangeTextDocumentParams;
import org.eclipse.lsp4j.DidSaveTextDocumentParams;
import org.eclipse.lsp4j.TextDocumentContentChangeEvent;
import org.eclipse.lsp4j.TextDocumentIdentifier;
import org.eclipse.lsp4j.VersionedTextDocumentIdentifier;
import org.junit.jupiter.api.Assertions;
import org.junit.jupiter.api.Test;
import org.phasewright.language.ide.server.PhaseLanguageServer;
import org.phasewright.language.ide.server.StudyFinished;
import org.phasewright.language.standalone.StudyPipeline;

/**
 * Saving a model runs its studies (the language's generator) and reports the outcome; opening and editing do not.
 * The check on the results uses the logistic equation dx/dt = r x (1 - x/K), whose equilibria are x = 0 with
 * eigenvalue r and x = K with eigenvalue -r (Strogatz, Nonlinear Dynamics and Chaos, 2nd ed., section 2.3).
 */
class StudyOnSaveTest extends LanguageServerTestBase {
    private static final String LOGISTIC = """
            model colony "Logistic growth"
            param r = 0.5
            param cap = 40
            state x = 1
            rate x = r*x*(1 - x/cap)
            study s {
              equilibria
            }
            """;

    private void save(String uri) {
        languageServer.didSave(new DidSaveTextDocumentParams(new TextDocumentIdentifier(uri)));
    }

    private void change(String uri, String text, int version) {
        languageServer.didChange(new DidChangeTextDocumentParams(new VersionedTextDocumentIdentifier(uri, version),
                List.of(new TextDocumentContentChangeEvent(text))));
    }

    private List<StudyFinished> finished() {
        List<StudyFinished> result = new ArrayList<>();
        notificationsOf(PhaseLanguageServer.STUDY_FINISHED).forEach(n -> result.add((StudyFinished) n));
        return result;
    }

    /** Where the studies of a model write, by the command line's convention (StudyPipeline). */
    private Path resultsOf(String fileName) {
        return StudyPipeline.resultsFolderFor(workspace.resolve(fileName));
    }

    @Test
    void openingAndEditingDoNotRunStudies() {
        String uri = openModel("colony.phase", LOGISTIC);
        change(uri, LOGISTIC.replace("0.5", "0.6"), 2);
        assertTrue(finished().isEmpty());
        assertFalse(Files.exists(resultsOf("colony.phase")));
    }

    @Test
    void savingRunsTheStudiesAndWritesResultsBesideTheModel() throws IOException {
        String uri = openModel("colony.phase", LOGISTIC);
        save(uri);
        List<StudyFinished> reports = finished();
        Assertions.assertEquals(1, reports.size(), reports::toString);
        StudyFinished report = reports.get(0);
        Assertions.assertEquals("finished", report.status(), report::toString);
        Assertions.assertEquals(uri, report.uri());
        Path csv = resultsOf("colony.phase").resolve("s").resolve("equilibria.csv");
        assertTrue(Files.isRegularFile(csv), () -> "no " + csv);
        Assertions.assertEquals(resultsOf("colony.phase"), Path.of(java.net.URI.create(report.resultsFolder())));
        List<double[]> equilibria = equilibria(csv);
        Assertions.assertEquals(2, equilibria.size());
        Assertions.assertEquals(0.0, equilibria.get(0)[0], 1e-9);
        Assertions.assertEquals(0.5, equilibria.get(0)[1], 1e-9);
        Assertions.assertEquals(40.0, equilibria.get(1)[0], 1e-9);
        Assertions.assertEquals(-0.5, equilibria.get(1)[1], 1e-9);
    }

    @Test
    void savedTextIsWhatRuns() throws IOException {
        String uri = openModel("colony.phase", LOGISTIC);
        change(uri, LOGISTIC.replace("param cap = 40", "param cap = 25"), 2);
        save(uri);
        Assertions.assertEquals("finished", finished().get(0).status());
        List<double[]> equilibria = equilibria(resultsOf("colony.phase").resolve("s").resolve("equilibria.csv"));
        Assertions.assertEquals(25.0, equilibria.get(equilibria.size() - 1)[0], 1e-9, "the edited carrying capacity ran");
    }

    /** (x, first eigenvalue's real part) of each equilibrium in equilibria.csv, by increasing x. */
    private static List<double[]> equilibria(Path csv) throws IOException {
        return Files.readAllLines(csv).stream().skip(1).map(line -> line.split(","))
                .map(cells -> new double[] { Double.parseDouble(cells[1]), Double.parseDouble(cells[2]) })
                .sorted((a, b) -> Double.compare(a[0], b[0])).toList();
    }

    @Test
    void modelWithErrorsIsNotRun() {
        String uri = openModel("broken.phase", LOGISTIC.replace("rate x = r*x", "rate x = rr*x"));
        save(uri);
        List<StudyFinished> reports = finished();
        Assertions.assertEquals(1, reports.size());
        Assertions.assertEquals("not-run", reports.get(0).status());
        Assertions.assertEquals("the model has errors", reports.get(0).message());
        assertFalse(Files.exists(resultsOf("broken.phase")));
    }

    @Test
    void studyThatEndsEarlyIsReportedAsFailedWithItsReason() {
        // x' = x^2 from x(0) = 1 follows x = 1/(1 - t) and leaves every bound before t = 1 (closed form).
        String uri = openModel("burst.phase", "model burst\nstate x = 1\nrate x = x^2\nstudy s { simulate to t = 2 }\n");
        save(uri);
        List<StudyFinished> reports = finished();
        Assertions.assertEquals(1, reports.size());
        Assertions.assertEquals("failed", reports.get(0).status(), reports.get(0)::toString);
        assertTrue(reports.get(0).message().contains("blew up"), reports.get(0).message());
    }
}
