package org.phasewright.runtime.report;

import java.util.List;

import org.phasewright.runtime.continuation.Branch;
import org.phasewright.runtime.continuation.ContinuationOutcome;
import org.phasewright.runtime.continuation.ContinuationPoint;
import org.phasewright.runtime.continuation.SpecialPoint;
import org.phasewright.runtime.study.ContinuationResult;
import org.phasewright.runtime.study.StudyResult;

/**
 * branches.json: the parameter and its interval, the states, "specialPoints" (kind in words, branch, parameter,
 * state, and at Hopf points frequency, firstLyapunovCoefficient and criticality) and "branches" (number, origin,
 * ending, points with parameter, state, stable, unstableDimension, type, eigenvalues and special).
 */
public final class BranchesJson {
    private BranchesJson() {
    }

    public static String render(StudyResult study, ContinuationResult result) {
        ContinuationOutcome o = result.continuation();
        StringBuilder out = new StringBuilder("{\n");
        out.append("  \"model\": ").append(Json.string(study.modelName())).append(",\n");
        out.append("  \"study\": ").append(Json.string(study.studyName())).append(",\n");
        out.append("  \"status\": ").append(Json.string(result.status().name())).append(",\n");
        out.append("  \"outcome\": ").append(Json.string(result.outcome())).append(",\n");
        out.append("  \"message\": ").append(Json.string(result.message())).append(",\n");
        out.append("  \"parameter\": ").append(Json.string(o.parameterName())).append(",\n");
        out.append("  \"from\": ").append(Json.number(o.from())).append(",\n");
        out.append("  \"to\": ").append(Json.number(o.to())).append(",\n");
        out.append("  \"states\": [");
        for (int i = 0; i < study.stateNames().size(); i++) {
            out.append(i > 0 ? ", " : "").append(Json.string(study.stateNames().get(i)));
        }
        out.append("],\n  \"specialPoints\": [");
        List<SpecialPoint> specials = o.specialPoints();
        for (int k = 0; k < specials.size(); k++) {
            SpecialPoint s = specials.get(k);
            out.append(k > 0 ? "," : "").append("\n    {\"kind\": ").append(Json.string(s.kind().word()))
                    .append(", \"branch\": ").append(s.branch())
                    .append(", \"parameter\": ").append(Json.number(s.parameter()))
                    .append(", \"state\": ").append(numbers(s.state()));
            if (s.kind() == SpecialPoint.Kind.HOPF) {
                out.append(", \"frequency\": ").append(Json.number(s.frequency()))
                        .append(", \"firstLyapunovCoefficient\": ").append(Json.number(s.firstLyapunovCoefficient()))
                        .append(", \"criticality\": ").append(Json.string(s.criticality()));
            }
            out.append('}');
        }
        out.append(specials.isEmpty() ? "],\n" : "\n  ],\n");
        out.append("  \"branches\": [");
        for (int b = 0; b < o.branches().size(); b++) {
            Branch branch = o.branches().get(b);
            out.append(b > 0 ? "," : "").append("\n    {\n      \"number\": ").append(branch.number())
                    .append(",\n      \"origin\": ").append(Json.string(branch.origin()))
                    .append(",\n      \"ending\": ").append(Json.string(branch.ending()))
                    .append(",\n      \"points\": [");
            List<ContinuationPoint> points = branch.points();
            for (int k = 0; k < points.size(); k++) {
                ContinuationPoint p = points.get(k);
                out.append(k > 0 ? "," : "").append("\n        {\"parameter\": ").append(Json.number(p.parameter()))
                        .append(", \"state\": ").append(numbers(p.state()))
                        .append(", \"stable\": ").append(p.stable())
                        .append(", \"unstableDimension\": ").append(p.classification().classified()
                                ? Integer.toString(p.classification().unstableDimension()) : "null") // unknown
                        .append(", \"type\": ").append(Json.string(p.classification().type()))
                        .append(", \"eigenvalues\": [");
                double[] re = p.eigenvaluesReal(), im = p.eigenvaluesImag();
                for (int j = 0; j < re.length; j++) {
                    out.append(j > 0 ? ", " : "").append("{\"re\": ").append(Json.number(re[j]))
                            .append(", \"im\": ").append(Json.number(im[j])).append('}');
                }
                out.append("], \"special\": ").append(Json.string(p.special() == null ? null : p.special().word()))
                        .append('}');
            }
            out.append(points.isEmpty() ? "]\n    }" : "\n      ]\n    }");
        }
        out.append(o.branches().isEmpty() ? "]\n" : "\n  ]\n").append("}\n");
        return out.toString();
    }

    private static String numbers(double[] values) {
        StringBuilder out = new StringBuilder("[");
        for (int i = 0; i < values.length; i++) {
            out.append(i > 0 ? ", " : "").append(Json.number(values[i]));
        }
        return out.append(']').toString();
    }
}
