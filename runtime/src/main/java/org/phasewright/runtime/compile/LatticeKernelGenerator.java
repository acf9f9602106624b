package org.phasewright.runtime.compile;

import java.util.HashMap;
import java.util.Map;

import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/**
 * Java for a model's {@link LatticeRates}: one loop per state family over the window, reading state shifts as
 * {@code in<g>[q + reachBelow + c]} (constant offsets, so the loops vectorise). Rate formulas are written by the same
 * {@link JavaExpressionWriter} as the whole-state code, so both evaluate every rate with the same operations in the
 * same order.
 */
final class LatticeKernelGenerator implements JavaExpressionWriter.Indexed {
    static final String CLASS_NAME = "GeneratedLatticeRates";

    private final LatticeShape shape;
    private final JavaExpressionWriter writer = new JavaExpressionWriter();
    private final Map<Integer, Integer> componentAtOffset = new HashMap<>();
    private final Map<Integer, String> parameterLocals = new HashMap<>();
    private final StringBuilder preamble = new StringBuilder();

    LatticeKernelGenerator(LatticeShape shape) {
        this.shape = shape;
        for (int f = 0; f < shape.components().size(); f++) {
            componentAtOffset.put(shape.components().get(f).offset(), f);
        }
    }

    String generate() {
        StringBuilder loops = new StringBuilder();
        for (int f = 0; f < shape.components().size(); f++) {
            Family family = shape.components().get(f);
            String formula = writer.write(family.formula(), this);
            loops.append("        {\n            final double[] o = out[").append(f).append("];\n")
                    .append("            for (int q = from; q < to; q++) {\n")
                    .append("                o[q] = ").append(formula).append(";\n")
                    .append("            }\n        }\n");
        }
        StringBuilder body = new StringBuilder();
        body.append("    public int cells() { return ").append(shape.range().size()).append("; }\n\n")
                .append("    public int components() { return ").append(shape.components().size()).append("; }\n\n")
                .append("    public int reachBelow() { return ").append(shape.reachBelow()).append("; }\n\n")
                .append("    public int reachAbove() { return ").append(shape.reachAbove()).append("; }\n\n")
                .append("    public void rates(double t, double[][] in, double[] p, double[][] out, long first,")
                .append(" int from, int to) {\n");
        for (int g = 0; g < shape.components().size(); g++) {
            body.append("        final double[] in").append(g).append(" = in[").append(g).append("];\n");
        }
        body.append(preamble).append(loops).append("    }\n");
        writer.writePowerHelpers(body);
        return "package " + JavaSourceGenerator.PACKAGE + ";\n\n"
                + "// Lattice rates generated from a model; identifiers are indices only.\n"
                + "public final class " + CLASS_NAME + " implements " + LatticeRates.class.getName() + " {\n"
                + body + "}\n";
    }

    /** Parameters are read once before the loops, as in {@link FamilyLoopWriter}. */
    @Override
    public boolean variable(Variable v, StringBuilder out) {
        if (v.kind() != VariableKind.PARAMETER) {
            return false;
        }
        out.append(parameterLocals.computeIfAbsent(v.index(), k -> {
            String local = "q" + k;
            preamble.append("        final double ").append(local).append(" = p[").append(k).append("];\n");
            return local;
        }));
        return true;
    }

    @Override
    public void indexValue(IndexValue i, StringBuilder out) {
        out.append("((double) (").append(shape.range().lower()).append("L + ").append(cell(0)).append("))");
    }

    @Override
    public void element(Element el, StringBuilder out) {
        long c = LinearIndex.of(el.index()).constant();
        if (el.kind() == VariableKind.STATE) {
            out.append("in").append(componentAtOffset.get(el.offset())).append("[q + ")
                    .append(shape.reachBelow() + c).append(']');
        } else { // a parameter table over the same range
            out.append("p[").append(el.offset()).append(" + (int) ").append(cell(c)).append(']');
        }
    }

    @Override
    public void sum(Sum s, StringBuilder out) {
        throw new IllegalArgumentException("a lattice has no sums");
    }

    /** The position in the range of the cell {@code c} away from iteration q's, wrapped around. */
    private String cell(long c) {
        return "Math.floorMod(first + q + " + c + "L, " + shape.range().size() + "L)";
    }
}
