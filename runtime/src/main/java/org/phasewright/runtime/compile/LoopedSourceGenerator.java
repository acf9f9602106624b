package org.phasewright.runtime.compile;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.symbolic.Simplifier;
import org.phasewright.runtime.symbolic.SymbolicJacobian;

/**
 * Java source for indexed and large models: one loop per family, scalars in straight lines, and every piece in a
 * static method small enough for the JIT (HotSpot does not compile methods above 8000 bytes of bytecode) and far
 * below the JVM's 64 KB limit. Derived quantities live in an array {@code dv}: the caller's {@code out} for
 * {@code derived}, otherwise a per-thread scratch array, so instances stay stateless and thread-safe and
 * {@code rates} allocates nothing after the first call on a thread.
 */
final class LoopedSourceGenerator {
    /** Characters of straight-line code per method; well under 8000 bytes of bytecode. */
    private static final int CHUNK_CHARS = 6000;
    private static final String SIGNATURE = "(double t, double[] u, double[] p, double[] dv, double[] out)";
    private static final String INDENT = "        ";

    private final DynamicalModel model;
    private final SymbolicJacobian jacobian;
    private final ModelLayout layout;
    private final JavaExpressionWriter writer = new JavaExpressionWriter(true);
    private final FamilyLoopWriter loops = new FamilyLoopWriter(writer);
    private final StringBuilder methods = new StringBuilder();
    private int methodCount;

    /** @param jacobian null when the model is too large for a dense Jacobian */
    LoopedSourceGenerator(DynamicalModel model, SymbolicJacobian jacobian) {
        this.model = model;
        this.jacobian = jacobian;
        this.layout = ModelLayout.of(model);
    }

    /** Straight-line statements packed into methods; a family's loop gets a method of its own. */
    private final class Chunks {
        final List<String> names = new ArrayList<>();
        final List<boolean[]> covers = new ArrayList<>(); // per method: which units it computes
        private final StringBuilder current = new StringBuilder();
        private final List<Integer> currentUnits = new ArrayList<>();
        private final int unitCount;

        Chunks(int unitCount) {
            this.unitCount = unitCount;
        }

        void add(int unit, String code, boolean alone) {
            if (alone || current.length() + code.length() > CHUNK_CHARS) {
                flush();
            }
            current.append(code);
            currentUnits.add(unit);
            if (alone) {
                flush();
            }
        }

        void flush() {
            if (current.isEmpty()) {
                return;
            }
            String name = "m" + methodCount++;
            methods.append("\n    private static void ").append(name).append(SIGNATURE).append(" {\n")
                    .append(current).append("    }\n");
            boolean[] cover = new boolean[unitCount];
            currentUnits.forEach(u -> cover[u] = true);
            names.add(name);
            covers.add(cover);
            current.setLength(0);
            currentUnits.clear();
        }
    }

    String generate() {
        int n = model.dimension();
        int nd = model.derived().size();
        int scratchSize = nd + (jacobian == null ? 0 : jacobian.auxiliary().size());

        Chunks derived = chunks(layout.derived(), "dv");
        Chunks rates = chunks(layout.rates(), "out");

        StringBuilder body = new StringBuilder();
        body.append("    public int dimension() { return ").append(n).append("; }\n\n");
        body.append("    public int derivedCount() { return ").append(nd).append("; }\n\n");
        if (scratchSize > 0) {
            body.append("    private final ThreadLocal local = new ThreadLocal();\n\n");
            body.append("    private double[] scratch() {\n");
            body.append("        double[] a = (double[]) local.get();\n");
            body.append("        if (a == null) {\n");
            body.append("            a = new double[").append(scratchSize).append("];\n");
            body.append("            local.set(a);\n");
            body.append("        }\n");
            body.append("        return a;\n");
            body.append("    }\n\n");
        }
        String dv = INDENT + "double[] dv = " + (scratchSize > 0 ? "scratch();\n" : "null;\n");

        body.append("    public void rates(double t, double[] u, double[] p, double[] dudt) {\n").append(dv);
        boolean[] needed = layout.derivedNeededByRates();
        for (int m = 0; m < derived.names.size(); m++) {
            if (anyOf(derived.covers.get(m), needed)) {
                call(body, derived.names.get(m), "null");
            }
        }
        rates.names.forEach(name -> call(body, name, "dudt"));
        body.append("    }\n\n");

        body.append("    public void derived(double t, double[] u, double[] p, double[] out) {\n");
        derived.names.forEach(name -> body.append(INDENT).append(name).append("(t, u, p, out, null);\n"));
        body.append("    }\n\n");

        body.append("    public void jacobian(double t, double[] u, double[] p, double[] jac) {\n");
        if (jacobian == null) {
            body.append(INDENT).append("throw new UnsupportedOperationException(\"no dense Jacobian for ").append(n)
                    .append(" states\");\n");
        } else {
            body.append(INDENT).append("java.util.Arrays.fill(jac, 0, ").append((long) n * n).append(", 0.0);\n")
                    .append(dv);
            derived.names.forEach(name -> call(body, name, "null"));
            jacobianChunks(n, nd).forEach(name -> call(body, name, "jac"));
        }
        body.append("    }\n");

        writer.writePowerHelpers(body);
        body.append(FamilyLoopWriter.HELPERS).append(methods);

        return "package " + JavaSourceGenerator.PACKAGE + ";\n\n"
                + "// Generated from model " + JavaSourceGenerator.sanitize(model.name())
                + "; identifiers are indices only.\n"
                + "public final class " + JavaSourceGenerator.CLASS_NAME + " implements "
                + VectorField.class.getName() + ", " + DerivedValues.class.getName() + " {\n" + body + "}\n";
    }

    /** The units cut into methods; each writes its values into the array named {@code target}. */
    private Chunks chunks(List<ModelLayout.Unit> units, String target) {
        Chunks chunks = new Chunks(units.size());
        for (int u = 0; u < units.size(); u++) {
            ModelLayout.Unit unit = units.get(u);
            chunks.add(u, unit.loop() ? loops.family(unit.family(), target, INDENT)
                    : statement(target + "[" + unit.index() + "]", unit.formula(), unit.name()), unit.loop());
        }
        chunks.flush();
        return chunks;
    }

    /** Auxiliary derivatives into dv[nd + m], then the non-zero entries. */
    private List<String> jacobianChunks(int n, int nd) {
        Chunks chunks = new Chunks(1);
        List<DerivedQuantity> aux = jacobian.auxiliary();
        for (int m = 0; m < aux.size(); m++) {
            chunks.add(0, statement("dv[" + (nd + m) + "]", aux.get(m).definition(), aux.get(m).name()), false);
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                Expr e = jacobian.entry(i, j);
                if (!Simplifier.isZero(e)) {
                    chunks.add(0, statement("out[" + ((long) i * n + j) + "]", e, null), false);
                }
            }
        }
        chunks.flush();
        return chunks.names;
    }

    private String statement(String target, Expr formula, String name) {
        return INDENT + target + " = " + writer.write(formula) + ";"
                + (name == null ? "" : " // " + JavaSourceGenerator.sanitize(name)) + "\n";
    }

    private static void call(StringBuilder body, String method, String out) {
        body.append(INDENT).append(method).append("(t, u, p, dv, ").append(out).append(");\n");
    }

    private static boolean anyOf(boolean[] cover, boolean[] needed) {
        for (int k = 0; k < cover.length; k++) {
            if (cover[k] && needed[k]) {
                return true;
            }
        }
        return false;
    }
}
