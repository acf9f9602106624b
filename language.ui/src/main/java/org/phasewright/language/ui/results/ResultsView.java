package org.phasewright.language.ui.results;

import java.util.List;
import java.util.Locale;

import org.eclipse.core.resources.IFile;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.IFileEditorInput;
import org.eclipse.ui.IPartListener2;
import org.eclipse.ui.IWorkbenchPartReference;
import org.eclipse.ui.part.ViewPart;
import org.phasewright.language.ui.builder.BuildEvents;
import org.phasewright.runtime.study.ReducedOutput;

/**
 * Our results view: the latest study of the last saved model — equilibria table (coordinates, eigenvalues, type,
 * symmetry orbit), the trajectory as time series, and a 2D phase projection whose axes the user picks.
 */
public final class ResultsView extends ViewPart implements BuildEvents.Listener {
    public static final String ID = "org.phasewright.language.ui.resultsView";

    private Label summary;
    private Combo studyChoice;
    private Combo xAxis;
    private Combo yAxis;
    private TableViewer table;
    private Canvas timeSeries;
    private Canvas phasePlane;
    private ModelResults results;
    private StudyResults shown;

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        summary = new Label(parent, SWT.NONE);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        summary.setText("Save a .phase model to run its studies; results appear here.");
        Composite bar = new Composite(parent, SWT.NONE);
        bar.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        bar.setLayout(new GridLayout(6, false));
        new Label(bar, SWT.NONE).setText("Study:");
        studyChoice = new Combo(bar, SWT.READ_ONLY);
        new Label(bar, SWT.NONE).setText("Phase plane x:");
        xAxis = new Combo(bar, SWT.READ_ONLY);
        new Label(bar, SWT.NONE).setText("y:");
        yAxis = new Combo(bar, SWT.READ_ONLY);
        studyChoice.addListener(SWT.Selection, e -> showStudy(studyChoice.getSelectionIndex()));
        xAxis.addListener(SWT.Selection, e -> phasePlane.redraw());
        yAxis.addListener(SWT.Selection, e -> phasePlane.redraw());

        SashForm sash = new SashForm(parent, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        createTable(sash);
        SashForm plots = new SashForm(sash, SWT.HORIZONTAL);
        timeSeries = new Canvas(plots, SWT.DOUBLE_BUFFERED);
        timeSeries.setBackground(parent.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        timeSeries.addPaintListener(e -> paintTimeSeries(e.gc, timeSeries.getClientArea()));
        phasePlane = new Canvas(plots, SWT.DOUBLE_BUFFERED);
        phasePlane.setBackground(parent.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        phasePlane.addPaintListener(e -> paintPhasePlane(e.gc, phasePlane.getClientArea()));
        sash.setWeights(45, 55);
        BuildEvents.add(this);
        getSite().getPage().addPartListener(followEditor);
        ModelResults initial = activeFile() == null ? BuildEvents.latest() : BuildEvents.latest(activeFile());
        if (initial != null) {
            show(initial);
        }
    }

    /** Shows the results of the model in the editor the user switches to. */
    private final IPartListener2 followEditor = new IPartListener2() {
        @Override
        public void partActivated(IWorkbenchPartReference reference) {
            IFile file = activeFile();
            ModelResults forFile = file == null ? null : BuildEvents.latest(file);
            if (forFile != null && forFile != results) {
                show(forFile);
            }
        }
    };

    private IFile activeFile() {
        IEditorPart editor = getSite().getPage().getActiveEditor();
        return editor != null && editor.getEditorInput() instanceof IFileEditorInput input ? input.getFile() : null;
    }

    private void createTable(Composite parent) {
        table = new TableViewer(parent, SWT.BORDER | SWT.FULL_SELECTION);
        table.getTable().setHeaderVisible(true);
        table.getTable().setLinesVisible(true);
        table.setContentProvider(ArrayContentProvider.getInstance());
        column("Equilibrium", 85, EquilibriumRow::name);
        column("Coordinates", 190, row -> coordinates(row.coordinates()));
        column("Eigenvalues", 270, EquilibriumRow::eigenvalues);
        column("Type", 250, EquilibriumRow::type);
        column("Symmetry orbit", 240, EquilibriumRow::orbit);
    }

    private void column(String title, int width, java.util.function.Function<EquilibriumRow, String> text) {
        TableViewerColumn column = new TableViewerColumn(table, SWT.LEFT);
        column.getColumn().setText(title);
        column.getColumn().setWidth(width);
        column.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.apply((EquilibriumRow) element);
            }
        });
    }

    @Override
    public void studiesFinished(IFile file, ModelResults newResults) {
        if (summary != null && !summary.isDisposed()) {
            summary.getDisplay().asyncExec(() -> {
                IFile active = summary.isDisposed() ? null : activeFile();
                if (active == null || active.equals(file)) {
                    show(newResults);
                }
            });
        }
    }

    /** Shows new results (UI thread). */
    public void show(ModelResults newResults) {
        if (summary.isDisposed()) {
            return;
        }
        results = newResults;
        studyChoice.removeAll();
        if (newResults.failure() != null) {
            summary.setText(newResults.fileName() + ": " + newResults.failure());
            showStudy(-1);
            return;
        }
        for (StudyResults study : newResults.studies()) {
            studyChoice.add(study.name());
        }
        if (!newResults.studies().isEmpty()) {
            studyChoice.select(0);
        }
        showStudy(newResults.studies().isEmpty() ? -1 : 0);
    }

    private void showStudy(int index) {
        shown = index < 0 ? null : results.studies().get(index);
        xAxis.removeAll();
        yAxis.removeAll();
        if (shown == null) {
            table.setInput(List.of());
        } else {
            shown.stateNames().forEach(name -> {
                xAxis.add(name);
                yAxis.add(name);
            });
            xAxis.select(0);
            yAxis.select(Math.min(1, shown.stateNames().size() - 1));
            table.setInput(shown.equilibria());
            summary.setText(String.format(Locale.ROOT, "%s — study %s: %d equilibria, %s (%s, %d ms)",
                    results.fileName(), shown.name(), shown.equilibria().size(),
                    shown.hasTrajectory() ? shown.times().length + " trajectory points to " + shown.timeName() + " = "
                            + PlotPainter.format(shown.times()[shown.times().length - 1]) : "no simulation",
                    shown.note(), results.elapsedMillis()));
        }
        summary.getParent().layout(true, true);
        timeSeries.redraw();
        phasePlane.redraw();
    }

    private void paintTimeSeries(GC gc, Rectangle area) {
        if (shown == null || !shown.hasTrajectory()) {
            gc.drawString("Time series: the study has no simulation.", 10, 10, true);
            return;
        }
        double[] all = concat(shown.states());
        PlotPainter painter = new PlotPainter(gc, area, shown.times(), all);
        painter.axes("States against " + shown.timeName(), shown.timeName());
        for (int k = 0; k < shown.states().length; k++) {
            painter.line(shown.times(), shown.states()[k], PlotPainter.SERIES[k % PlotPainter.SERIES.length]);
        }
        painter.legend(shown.stateNames());
    }

    private void paintPhasePlane(GC gc, Rectangle area) {
        int xi = xAxis.getSelectionIndex();
        int yi = yAxis.getSelectionIndex();
        if (shown == null || xi < 0 || yi < 0) {
            gc.drawString("Phase projection: choose the axes above.", 10, 10, true);
            return;
        }
        double[] xs = shown.hasTrajectory() ? shown.states()[xi] : new double[0];
        double[] ys = shown.hasTrajectory() ? shown.states()[yi] : new double[0];
        double[] ex = shown.equilibria().stream().mapToDouble(e -> e.coordinates()[xi]).toArray();
        double[] ey = shown.equilibria().stream().mapToDouble(e -> e.coordinates()[yi]).toArray();
        PlotPainter painter = new PlotPainter(gc, area, concat(new double[][] { xs, ex }),
                concat(new double[][] { ys, ey }));
        painter.axes("Phase projection: " + shown.stateNames().get(yi) + " against " + shown.stateNames().get(xi)
                + (ex.length > 0 ? "  (dots: equilibria)" : ""), shown.stateNames().get(xi));
        painter.line(xs, ys, PlotPainter.SERIES[1]);
        for (int i = 0; i < ex.length; i++) {
            painter.point(ex[i], ey[i], PlotPainter.SERIES[0]);
        }
    }

    private static double[] concat(double[][] arrays) {
        int n = 0;
        for (double[] a : arrays) {
            n += a.length;
        }
        double[] all = new double[n];
        int at = 0;
        for (double[] a : arrays) {
            System.arraycopy(a, 0, all, at, a.length);
            at += a.length;
        }
        return all;
    }

    /** "(x1, x2, ...)"; for large models the first {@link ReducedOutput#KEPT} and the count, as summary.txt does. */
    static String coordinates(double[] values) {
        int shown = Math.min(values.length, ReducedOutput.KEPT);
        StringBuilder text = new StringBuilder("(");
        for (int i = 0; i < shown; i++) {
            text.append(i == 0 ? "" : ", ").append(PlotPainter.format(values[i]));
        }
        if (shown < values.length) {
            text.append(", ... of ").append(values.length).append(" states");
        }
        return text.append(')').toString();
    }

    @Override
    public void setFocus() {
        table.getControl().setFocus();
    }

    @Override
    public void dispose() {
        BuildEvents.remove(this);
        getSite().getPage().removePartListener(followEditor);
        super.dispose();
    }
}
