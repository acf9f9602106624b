package org.phasewright.runtime.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.phasewright.runtime.symmetry.EquilibriumSymmetry;
import org.phasewright.runtime.symmetry.InvariantSubspace;
import org.phasewright.runtime.symmetry.SymmetryAnalysis;
import org.phasewright.runtime.symmetry.SymmetryReport;

/** The symmetry part of a search's text summary and of equilibria.json. */
final class SymmetrySummary {
    private SymmetrySummary() {
    }

    /** Lines under the equilibria table; nothing when the model declares no symmetry. */
    static void text(StringBuilder out, SymmetryReport report) {
        if (report.isEmpty()) {
            return;
        }
        out.append("  Symmetries: ").append(String.join(", ", report.symmetries())).append('\n');
        for (String sentence : report.orbitSentences()) {
            out.append("  ").append(sentence).append('\n');
        }
        // One line per isotropy, so a model with many equilibria stays readable.
        Map<String, List<String>> byIsotropy = new LinkedHashMap<>();
        for (EquilibriumSymmetry e : report.equilibria()) {
            String key = e.isotropy().isEmpty() ? "no declared symmetry" : String.join(", ", e.isotropy());
            byIsotropy.computeIfAbsent(key, k -> new ArrayList<>()).add(e.equilibrium());
        }
        byIsotropy.forEach((isotropy, names) -> out.append("  Fixed by ").append(isotropy).append(": ")
                .append(String.join(", ", names)).append('\n'));
        // An image of an equilibrium is an equilibrium too: a missing one shows the search was incomplete.
        Map<String, List<String>> missing = new LinkedHashMap<>();
        for (EquilibriumSymmetry e : report.equilibria()) {
            for (String image : e.images()) {
                if (image.endsWith(SymmetryAnalysis.MISSING)) {
                    missing.computeIfAbsent(image.substring(0, image.indexOf(':')), k -> new ArrayList<>())
                            .add(e.equilibrium());
                }
            }
        }
        missing.forEach((symmetry, names) -> out.append("  Not found: the images under ").append(symmetry)
                .append(" of ").append(String.join(", ", names)).append(" (equilibria too; the search missed them)\n"));
        for (InvariantSubspace s : report.invariantSubspaces()) {
            out.append("  Invariant subspace ").append(s.equations())
                    .append(s.description().equals(s.equations()) ? "" : " (" + s.description() + ")")
                    .append(", fixed by ").append(String.join(", ", s.fixedBy())).append('\n');
        }
    }

    /** The per-equilibrium JSON fields, starting with a comma, or "" without symmetries. */
    static String equilibriumFields(SymmetryReport report, int index, String indent) {
        if (report.isEmpty() || index >= report.equilibria().size()) {
            return "";
        }
        EquilibriumSymmetry e = report.equilibria().get(index);
        return ",\n" + indent + "\"orbit\": " + e.orbit() + ",\n" + indent + "\"isotropy\": " + strings(e.isotropy());
    }

    /** The top-level JSON fields "symmetries" and "invariantSubspaces", each line ending in a comma. */
    static String topFields(SymmetryReport report) {
        List<String> subspaces = new ArrayList<>();
        for (InvariantSubspace s : report.invariantSubspaces()) {
            subspaces.add("{\"equations\": " + Json.string(s.equations()) + ", \"description\": "
                    + Json.string(s.description()) + ", \"dimension\": " + s.dimension() + ", \"fixedBy\": "
                    + strings(s.fixedBy()) + "}");
        }
        return "  \"symmetries\": " + strings(report.symmetries()) + ",\n  \"invariantSubspaces\": ["
                + String.join(", ", subspaces) + "],\n";
    }

    private static String strings(List<String> values) {
        List<String> quoted = values.stream().map(Json::string).toList();
        return "[" + String.join(", ", quoted) + "]";
    }
}
