package org.phasewright.runtime.report;

import java.util.List;

import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.StudyResult;

/**
 * equilibria.json: model, study, outcome and message of the search, state names, parameter values, and per
 * equilibrium its coordinates (in the order of "states"), eigenvalues {re, im}, type and manifold dimensions.
 * With declared symmetries also "symmetries", "invariantSubspaces", and per equilibrium "orbit" and "isotropy".
 * Non-finite numbers are written as null.
 */
public final class EquilibriaJson {
    private EquilibriaJson() {
    }

    public static String render(StudyResult study, EquilibriumResult result) {
        StringBuilder out = new StringBuilder("{\n");
        out.append("  \"model\": ").append(Json.string(study.modelName())).append(",\n");
        out.append("  \"study\": ").append(Json.string(study.studyName())).append(",\n");
        out.append("  \"status\": ").append(Json.string(result.status().name())).append(",\n");
        out.append("  \"outcome\": ").append(Json.string(result.outcome())).append(",\n");
        out.append("  \"message\": ").append(Json.string(result.message())).append(",\n");
        out.append("  \"states\": ").append(strings(study.stateNames())).append(",\n");
        out.append("  \"parameters\": [");
        double[] values = study.parameterValues();
        for (int i = 0; i < values.length; i++) {
            out.append(i > 0 ? ", " : "").append("{\"name\": ").append(Json.string(study.parameterNames().get(i)))
                    .append(", \"value\": ").append(Json.number(values[i])).append('}');
        }
        out.append("],\n");
        out.append(SymmetrySummary.topFields(result.symmetry()));
        out.append("  \"equilibria\": [");
        List<Equilibrium> list = result.equilibria();
        for (int k = 0; k < list.size(); k++) {
            Equilibrium e = list.get(k);
            out.append(k > 0 ? "," : "").append("\n    {\n");
            out.append("      \"name\": ").append(Json.string(e.name())).append(",\n");
            out.append("      \"coordinates\": ").append(numbers(e.coordinates())).append(",\n");
            out.append("      \"eigenvalues\": [");
            double[] re = e.eigenvaluesReal();
            double[] im = e.eigenvaluesImag();
            for (int j = 0; j < re.length; j++) {
                out.append(j > 0 ? ", " : "").append("{\"re\": ").append(Json.number(re[j])).append(", \"im\": ")
                        .append(Json.number(im[j])).append('}');
            }
            out.append("],\n");
            out.append("      \"type\": ").append(Json.string(e.type())).append(",\n");
            out.append("      \"stableDimension\": ").append(e.classification().stableDimension()).append(",\n");
            out.append("      \"unstableDimension\": ").append(e.classification().unstableDimension()).append(",\n");
            out.append("      \"centreDimension\": ").append(e.classification().centreDimension()).append(",\n");
            out.append("      \"residual\": ").append(Json.number(e.residual()))
                    .append(SymmetrySummary.equilibriumFields(result.symmetry(), k, "      ")).append("\n    }");
        }
        out.append(list.isEmpty() ? "]\n" : "\n  ]\n").append("}\n");
        return out.toString();
    }

    private static String strings(List<String> values) {
        StringBuilder out = new StringBuilder("[");
        for (int i = 0; i < values.size(); i++) {
            out.append(i > 0 ? ", " : "").append(Json.string(values.get(i)));
        }
        return out.append(']').toString();
    }

    private static String numbers(double[] values) {
        StringBuilder out = new StringBuilder("[");
        for (int i = 0; i < values.length; i++) {
            out.append(i > 0 ? ", " : "").append(Json.number(values[i]));
        }
        return out.append(']').toString();
    }
}
