package org.phasewright.language.ui.selfcheck;

import java.io.IOException;
import java.io.OutputStream;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Properties;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.function.Supplier;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.text.IDocument;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IMarkerResolution;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.ide.IDE;
import org.eclipse.ui.texteditor.ITextEditor;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.ui.builder.BuildEvents;
import org.phasewright.language.ui.editor.PhaseEditor;
import org.phasewright.language.ui.builder.ProblemMarkers;
import org.phasewright.language.ui.results.ModelResults;
import org.phasewright.language.ui.results.ResultsView;

/**
 * End-to-end check of the assembled IDE, started by {@code -Dphasewright.selfcheck=REPORT}: opens an example, types an
 * unknown name into a rate, saves, waits for the marker, undoes it, saves, waits for the study results, takes a
 * screenshot and writes what it saw (and how long each step took) to REPORT as properties, then closes the workbench.
 * The test that launched the IDE judges the report; this class only observes.
 */
public final class SelfCheck extends Thread {
    public static final String PROPERTY = "phasewright.selfcheck";
    static final String FILE_PROPERTY = "phasewright.selfcheck.file";
    static final String INTRODUCED = " + kk";
    private static final int ROUNDS = 5;
    private static final long PAUSE_MILLIS = 500;

    private final Path reportFile;
    private final Properties report = new Properties();
    private final Display display;

    public SelfCheck(Path reportFile) {
        super("phasewright-selfcheck");
        this.reportFile = reportFile;
        this.display = PlatformUI.getWorkbench().getDisplay();
        setDaemon(true);
    }

    @Override
    public void run() {
        report.setProperty("startup.millis", Long.toString(System.currentTimeMillis()
                - ManagementFactory.getRuntimeMXBean().getStartTime()));
        try {
            Files.createDirectories(reportFile.toAbsolutePath().getParent());
            check();
            report.setProperty("finished", "true");
        } catch (Throwable e) {
            report.setProperty("failure", e.toString());
        } finally {
            takeScreenshot();
            writeReport();
            display.asyncExec(() -> PlatformUI.getWorkbench().close());
        }
    }

    private void check() throws Exception {
        Job.getJobManager().join(ResourcesPlugin.FAMILY_AUTO_BUILD, null);
        Job.getJobManager().join(org.phasewright.language.ui.builder.StudyJobs.FAMILY, null);
        String relative = System.getProperty(FILE_PROPERTY, "examples/thermosyphon.phase");
        IFile file = ResourcesPlugin.getWorkspace().getRoot().getFile(org.eclipse.core.runtime.Path.fromPortableString(
                relative));
        report.setProperty("file", relative);
        report.setProperty("file.exists", Boolean.toString(file.exists()));
        if (!file.exists()) {
            return;
        }
        Watcher watcher = new Watcher(file);
        BuildEvents.add(watcher);
        try {
            long openStart = System.nanoTime();
            ITextEditor editor = ui(() -> {
                var window = PlatformUI.getWorkbench().getActiveWorkbenchWindow();
                // No window manager under Xvfb: size the window to the screen so the screenshot shows everything.
                window.getShell().setBounds(display.getPrimaryMonitor().getClientArea());
                IWorkbenchPage page = window.getActivePage();
                try {
                    page.showView(ResultsView.ID);
                    return (ITextEditor) IDE.openEditor(page, file);
                } catch (Exception e) {
                    throw new IllegalStateException(e);
                }
            });
            report.setProperty("editor.open.millis", Long.toString(millisSince(openStart)));
            report.setProperty("editor.class", editor.getClass().getName());
            report.setProperty("window.title",
                    ui(() -> PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell().getText()));
            IDocument document = ui(() -> editor.getDocumentProvider().getDocument(editor.getEditorInput()));
            String original = ui(document::get);
            describeEditor(editor, original);
            checkToggleComment(editor, document, original);
            int at = endOfFirstRate(original);

            List<Long> toMarkers = new ArrayList<>();
            List<Long> toClean = new ArrayList<>();
            List<Long> toResults = new ArrayList<>();
            List<Long> studyRuns = new ArrayList<>();
            for (int round = 0; round < ROUNDS; round++) {
                Thread.sleep(PAUSE_MILLIS); // a person does not save twice a second
                // 1. Introduce an unknown name and save: the marker must appear.
                CompletableFuture<CheckedModel> checked = watcher.nextCheck();
                long saved = editAndSave(editor, document, at, 0, INTRODUCED);
                checked.get(30, TimeUnit.SECONDS);
                IMarker marker = waitForMarker(file, true);
                toMarkers.add(millisSince(saved));
                if (round == 0) {
                    describeMarker(marker, document);
                    Thread.sleep(400); // let the editor paint the squiggle for the screenshot
                    takeScreenshot("with-error");
                }
                // 2. Undo it and save: markers clear and the studies run.
                CompletableFuture<ModelResults> results = watcher.nextResults();
                saved = editAndSave(editor, document, at, INTRODUCED.length(), "");
                waitForMarker(file, false);
                toClean.add(millisSince(saved));
                ModelResults done = results.get(60, TimeUnit.SECONDS);
                toResults.add(millisSince(saved));
                studyRuns.add(done.elapsedMillis());
                if (round == ROUNDS - 1) {
                    describeResults(file, done);
                }
            }
            report.setProperty("save.to.marker.millis", toMarkers.toString());
            report.setProperty("save.to.clean.millis", toClean.toString());
            report.setProperty("save.to.results.millis", toResults.toString());
            report.setProperty("study.run.millis", studyRuns.toString());
            report.setProperty("save.to.marker.median.millis", Long.toString(median(toMarkers)));
            report.setProperty("save.to.results.median.millis", Long.toString(median(toResults)));
            Thread.sleep(600); // let the results view repaint
        } finally {
            BuildEvents.remove(watcher);
        }
    }

    /** What the editor shows once its background parse has run: colours by kind, folding, outline. */
    private void describeEditor(ITextEditor editor, String text) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(20);
        while (System.nanoTime() < deadline
                && (!(editor instanceof PhaseEditor phase) || phase.lastSnapshot() == null)) {
            Thread.sleep(20);
        }
        Thread.sleep(300); // the snapshot is applied in the UI thread right after
        int state = text.indexOf("\nrate ") + "\nrate ".length();
        int param = text.indexOf("\nparam ") + "\nparam ".length();
        report.setProperty("colour.state", ui(() -> colourAt(editor, state)));
        report.setProperty("colour.param", ui(() -> colourAt(editor, param)));
        report.setProperty("colour.plain", ui(() -> colourAt(editor, text.indexOf("model ") + "model ".length())));
        report.setProperty("folding.regions", ui(() -> {
            var viewer = (org.eclipse.jface.text.source.projection.ProjectionViewer) editor
                    .getAdapter(org.eclipse.jface.text.ITextOperationTarget.class);
            int count = 0;
            for (var it = viewer.getProjectionAnnotationModel().getAnnotationIterator(); it.hasNext(); it.next()) {
                count++;
            }
            return Integer.toString(count);
        }));
        report.setProperty("outline.entries", ui(() -> {
            var page = (org.phasewright.language.ui.outline.PhaseOutlinePage) editor
                    .getAdapter(org.eclipse.ui.views.contentoutline.IContentOutlinePage.class);
            return Integer.toString(page.shownEntries());
        }));
    }

    /** Runs the Toggle Comment command twice on one line through the command framework, as Ctrl+/ would. */
    private void checkToggleComment(ITextEditor editor, IDocument document, String original) {
        int line = original.indexOf("param k");
        report.setProperty("toggle.comment.keys", ui(() -> {
            var bindings = PlatformUI.getWorkbench().getService(org.eclipse.ui.keys.IBindingService.class);
            return String.join(" ", Arrays.stream(bindings.getActiveBindingsFor(
                    "org.phasewright.language.ui.toggleComment"))
                    .map(org.eclipse.jface.bindings.TriggerSequence::format).toList());
        }));
        report.setProperty("toggle.comment.once", ui(() -> {
            editor.selectAndReveal(line, 0);
            String once = runCommand("org.phasewright.language.ui.toggleComment") ? lineAt(document, line) : "not run";
            runCommand("org.phasewright.language.ui.toggleComment");
            return once;
        }));
        report.setProperty("toggle.comment.twice.restores", Boolean.toString(ui(document::get).equals(original)));
        ui(() -> {
            editor.doRevertToSaved();
            return null;
        });
    }

    private static boolean runCommand(String id) {
        try {
            PlatformUI.getWorkbench().getService(org.eclipse.ui.handlers.IHandlerService.class)
                    .executeCommand(id, null);
            return true;
        } catch (Exception e) {
            return false;
        }
    }

    private static String lineAt(IDocument document, int offset) {
        try {
            var region = document.getLineInformationOfOffset(offset);
            return document.get(region.getOffset(), region.getLength());
        } catch (Exception e) {
            return "";
        }
    }

    private static String colourAt(ITextEditor editor, int offset) {
        org.eclipse.swt.custom.StyledText widget = (org.eclipse.swt.custom.StyledText) editor
                .getAdapter(org.eclipse.swt.widgets.Control.class);
        org.eclipse.swt.custom.StyleRange style = widget.getStyleRangeAtOffset(offset);
        return style == null || style.foreground == null ? "default" : style.foreground.getRGB().toString();
    }

    private static int endOfFirstRate(String text) {
        int rate = text.indexOf("\nrate ");
        return text.indexOf('\n', rate + 1);
    }

    private long editAndSave(ITextEditor editor, IDocument document, int offset, int length, String text) {
        return ui(() -> {
            try {
                document.replace(offset, length, text);
            } catch (Exception e) {
                throw new IllegalStateException(e);
            }
            long saved = System.nanoTime();
            editor.doSave(null);
            return saved;
        });
    }

    private static IMarker waitForMarker(IFile file, boolean present) throws Exception {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(30);
        while (System.nanoTime() < deadline) {
            IMarker[] markers = file.findMarkers(ProblemMarkers.TYPE, false, IResource.DEPTH_ZERO);
            IMarker error = Arrays.stream(markers)
                    .filter(m -> m.getAttribute(IMarker.SEVERITY, -1) == IMarker.SEVERITY_ERROR).findFirst()
                    .orElse(null);
            if (present == (error != null)) {
                return error;
            }
            Thread.sleep(2);
        }
        throw new IllegalStateException("no " + (present ? "error marker appeared" : "clean check") + " within 30 s");
    }

    private void describeMarker(IMarker marker, IDocument document) throws Exception {
        int start = marker.getAttribute(IMarker.CHAR_START, -1);
        int end = marker.getAttribute(IMarker.CHAR_END, -1);
        report.setProperty("marker.message", marker.getAttribute(IMarker.MESSAGE, ""));
        report.setProperty("marker.line", Integer.toString(marker.getAttribute(IMarker.LINE_NUMBER, -1)));
        report.setProperty("marker.text", start >= 0 && end > start ? ui(() -> safeGet(document, start, end)) : "");
        IMarkerResolution[] fixes = IDE.getMarkerHelpRegistry().getResolutions(marker);
        report.setProperty("marker.quickfixes",
                String.join(" | ", Arrays.stream(fixes).map(IMarkerResolution::getLabel).toList()));
    }

    private static String safeGet(IDocument document, int start, int end) {
        try {
            return document.get(start, end - start);
        } catch (Exception e) {
            return "";
        }
    }

    private void describeResults(IFile file, ModelResults results) {
        report.setProperty("results.failure", String.valueOf(results.failure()));
        report.setProperty("results.studies", Integer.toString(results.studies().size()));
        if (!results.studies().isEmpty()) {
            var study = results.studies().get(0);
            report.setProperty("results.study", study.name());
            report.setProperty("results.equilibria", Integer.toString(study.equilibria().size()));
            report.setProperty("results.trajectory.points", Integer.toString(study.times().length));
            List<String> written = new ArrayList<>();
            for (String name : List.of("trajectory.csv", "equilibria.csv", "equilibria.json")) {
                if (Files.isRegularFile(study.folder().resolve(name))) {
                    written.add(name);
                }
            }
            report.setProperty("results.folder", study.folder().toString());
            report.setProperty("results.files", String.join(",", written));
        }
    }

    private void takeScreenshot() {
        takeScreenshot("final");
    }

    private void takeScreenshot(String name) {
        try {
            Path image = reportFile.resolveSibling("ide-" + name + ".png");
            ui(() -> {
                Screenshot.of(display.getActiveShell() != null ? display.getActiveShell()
                        : PlatformUI.getWorkbench().getActiveWorkbenchWindow().getShell(), image);
                return null;
            });
            report.setProperty("screenshot." + name, image.toString());
        } catch (RuntimeException e) {
            report.setProperty("screenshot." + name + ".failure", e.toString());
        }
    }

    private void writeReport() {
        try {
            Files.createDirectories(reportFile.toAbsolutePath().getParent());
            try (OutputStream out = Files.newOutputStream(reportFile)) {
                report.store(out, "Phasewright IDE self-check");
            }
        } catch (IOException e) {
            System.err.println("phasewright self-check: cannot write " + reportFile + ": " + e.getMessage());
        }
    }

    private <T> T ui(Supplier<T> task) {
        Object[] result = new Object[1];
        RuntimeException[] failure = new RuntimeException[1];
        display.syncExec(() -> {
            try {
                result[0] = task.get();
            } catch (RuntimeException e) {
                failure[0] = e;
            }
        });
        if (failure[0] != null) {
            throw failure[0];
        }
        @SuppressWarnings("unchecked")
        T value = (T) result[0];
        return value;
    }

    private static long millisSince(long nanoStart) {
        return TimeUnit.NANOSECONDS.toMillis(System.nanoTime() - nanoStart);
    }

    private static long median(List<Long> values) {
        List<Long> sorted = new ArrayList<>(values);
        sorted.sort(null);
        return sorted.get(sorted.size() / 2);
    }

    /** Hands the next check and the next study results of one file to the waiting self-check. */
    private static final class Watcher implements BuildEvents.Listener {
        private final IFile file;
        private volatile CompletableFuture<CheckedModel> check = new CompletableFuture<>();
        private volatile CompletableFuture<ModelResults> results = new CompletableFuture<>();

        Watcher(IFile file) {
            this.file = file;
        }

        CompletableFuture<CheckedModel> nextCheck() {
            check = new CompletableFuture<>();
            return check;
        }

        CompletableFuture<ModelResults> nextResults() {
            results = new CompletableFuture<>();
            return results;
        }

        @Override
        public void checked(IFile checkedFile, CheckedModel checked) {
            if (file.equals(checkedFile)) {
                check.complete(checked);
            }
        }

        @Override
        public void studiesFinished(IFile finished, ModelResults done) {
            if (file.equals(finished)) {
                results.complete(done);
            }
        }
    }
}
