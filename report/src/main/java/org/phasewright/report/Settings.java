package org.phasewright.report;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

import org.phasewright.runtime.model.Analysis;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.IntegrationMethod;
import org.phasewright.runtime.model.LyapunovExponents;
import org.phasewright.runtime.model.Section;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.study.AnalysisResult;
import org.phasewright.runtime.study.ContinuationResult;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.LyapunovResult;
import org.phasewright.runtime.study.SectionResult;
import org.phasewright.runtime.study.SimulationResult;
import org.phasewright.runtime.study.SweepResult;
import org.phasewright.runtime.study.LyapunovMapResult;
import org.phasewright.runtime.study.BasinsResult;

/** The settings of an analysis as the report shows them: from the result, and from the declaration when known. */
final class Settings {
    private Settings() {
    }

    static String kind(AnalysisResult r) {
        return switch (r) {
            case SimulationResult s -> "simulation";
            case EquilibriumResult e -> "equilibria";
            case SectionResult x -> "section";
            case LyapunovResult l -> "lyapunov";
            case ContinuationResult c -> "continuation";
            case SweepResult w -> "sweep";
            case LyapunovMapResult m -> "lyapunov-map";
            case BasinsResult b -> "basins";
        };
    }

    static String title(AnalysisResult r) {
        return switch (r) {
            case SimulationResult s -> "Simulation";
            case EquilibriumResult e -> "Equilibria";
            case SectionResult x -> "Poincaré section";
            case LyapunovResult l -> "Lyapunov exponents";
            case ContinuationResult c -> "Continuation of equilibria";
            case SweepResult w -> "Orbit diagram";
            case LyapunovMapResult m -> "Lyapunov map";
            case BasinsResult b -> "Basins of attraction";
        };
    }

    /** The declared analysis at {@code index} of the named study, or null when the model does not say. */
    static Analysis declared(DynamicalModel model, String studyName, int index, int count) {
        if (model == null) {
            return null;
        }
        for (Study s : model.studies()) {
            if (s.name().equals(studyName) && s.analyses().size() == count) {
                return s.analyses().get(index);
            }
        }
        return null;
    }

    /** Name to value (Double for numbers, String otherwise), in reading order. */
    static Map<String, Object> of(AnalysisResult r, Analysis declared) {
        Map<String, Object> m = new LinkedHashMap<>();
        switch (r) {
            case SimulationResult s -> {
                m.put("endTime", s.endTime());
                m.put("relativeTolerance", s.relativeTolerance());
                if (declared instanceof Simulation d) {
                    m.put("method", method(d.method()));
                    m.put("start", d.startsFromInitialValues() ? "declared initial values" : "given start values");
                }
            }
            case EquilibriumResult e -> {
                // No settings of its own in the notation.
            }
            case SectionResult x -> {
                m.put("endTime", x.endTime());
                if (declared instanceof Section d) {
                    m.put("direction", d.direction().name().toLowerCase(Locale.ROOT));
                    m.put("method", method(d.method()));
                }
            }
            case LyapunovResult l -> {
                m.put("endTime", l.endTime());
                if (declared instanceof LyapunovExponents) {
                    m.put("method", "QR re-orthonormalisation of the variational equations (Dormand–Prince 8)");
                }
            }
            case ContinuationResult c -> {
                if (c.continuation() != null) {
                    m.put("parameter", c.continuation().parameterName());
                    m.put("from", c.continuation().from());
                    m.put("to", c.continuation().to());
                    m.put("method", "pseudo-arclength continuation with fold, Hopf and branch-point test functions");
                }
            }
            case SweepResult w -> {
                if (w.sweep() != null) {
                    m.put("parameter", w.sweep().parameterName());
                    m.put("from", w.sweep().from());
                    m.put("to", w.sweep().to());
                    m.put("endTime", w.sweep().endTime());
                    m.put("method", "local maxima after the first half of each run (Dormand–Prince 5(4))");
                }
            }
            case LyapunovMapResult l -> {
                if (l.first() != null) {
                    grid(m, l.first(), l.second(), l.endTime(), l.executor());
                    m.put("method", "largest exponent from one tangent vector of the variational equations, "
                            + "renormalised at intervals (Dormand–Prince 8), at every grid point");
                }
            }
            case BasinsResult b -> {
                if (b.first() != null) {
                    grid(m, b.first(), b.second(), b.endTime(), b.executor());
                    m.put("method", "each start integrated (Dormand–Prince 5(4)) and labelled by the equilibrium "
                            + "its final state lies on");
                }
            }
        }
        return m;
    }

    private static void grid(Map<String, Object> m, org.phasewright.runtime.ensemble.Axis first,
            org.phasewright.runtime.ensemble.Axis second, double endTime, String executor) {
        m.put("first", first.name() + " from " + Formats.plain(first.from()) + " to " + Formats.plain(first.to())
                + ", " + first.steps() + " values");
        m.put("second", second.name() + " from " + Formats.plain(second.from()) + " to "
                + Formats.plain(second.to()) + ", " + second.steps() + " values");
        m.put("endTime", endTime);
        if (executor != null) {
            m.put("ranOn", executor);
        }
    }

    static String method(IntegrationMethod m) {
        return switch (m) {
            case EXPLICIT -> "explicit (Dormand–Prince 5(4))";
            case HIGH_ORDER -> "high order (Dormand–Prince 8(5,3))";
            case STIFF -> "stiff (Rosenbrock RODAS4)";
        };
    }
}
