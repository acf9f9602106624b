package org.phasewright.runtime.compile;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.References;
import org.phasewright.runtime.symbolic.SymbolicJacobian;

/**
 * Java source for a class implementing {@link VectorField} and {@link DerivedValues}. Small scalar models get
 * straight-line methods that compute, once and in declaration order, only the derived quantities they need, as final
 * locals {@code d<k>}; indexed and large models get {@link LoopedSourceGenerator}'s loops and chunked methods.
 */
final class JavaSourceGenerator {
    static final String PACKAGE = "phasewright.generated";
    static final String CLASS_NAME = "GeneratedVectorField";

    private final DynamicalModel model;
    private final SymbolicJacobian jacobian;
    private final List<DerivedQuantity> extended;
    private final JavaExpressionWriter writer = new JavaExpressionWriter();

    /** @param jacobian null when the model is too large for a dense Jacobian */
    JavaSourceGenerator(DynamicalModel model, SymbolicJacobian jacobian) {
        this.model = model;
        this.jacobian = jacobian;
        this.extended = jacobian == null ? null : jacobian.extendedDerived(model);
    }

    String generate() {
        return model.indexed() || large(model, jacobian) ? new LoopedSourceGenerator(model, jacobian).generate()
                : generateScalar();
    }

    /**
     * True when straight-line code with one local per derived quantity could exceed the JVM's method limits (64 KB,
     * and 8000 bytes for the JIT to compile a method at all); such models get the chunked form.
     */
    static boolean large(DynamicalModel model, SymbolicJacobian jacobian) {
        return model.dimension() > 64 || model.derived().size() > 128
                || (jacobian != null && jacobian.auxiliary().size() > 256);
    }

    /** Straight-line code: derived quantities as final locals, one line per rate and Jacobian entry. */
    private String generateScalar() {
        int n = model.dimension();
        int nd = model.derived().size();
        StringBuilder body = new StringBuilder();
        body.append("    public int dimension() { return ").append(n).append("; }\n\n");
        body.append("    public int derivedCount() { return ").append(nd).append("; }\n\n");

        body.append("    public void rates(double t, double[] u, double[] p, double[] dudt) {\n");
        locals(body, model.rates());
        for (int i = 0; i < n; i++) {
            body.append("        dudt[").append(i).append("] = ").append(writer.write(model.rates().get(i)))
                    .append(";").append(comment("d/dt " + model.states().get(i).name())).append('\n');
        }
        body.append("    }\n\n");

        body.append("    public void jacobian(double t, double[] u, double[] p, double[] jac) {\n");
        body.append("        java.util.Arrays.fill(jac, 0, ").append(n * n).append(", 0.0);\n");
        List<Expr> nonZero = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (!org.phasewright.runtime.symbolic.Simplifier.isZero(jacobian.entry(i, j))) {
                    nonZero.add(jacobian.entry(i, j));
                }
            }
        }
        locals(body, nonZero);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                Expr e = jacobian.entry(i, j);
                if (!org.phasewright.runtime.symbolic.Simplifier.isZero(e)) {
                    body.append("        jac[").append(i * n + j).append("] = ").append(writer.write(e)).append(";\n");
                }
            }
        }
        body.append("    }\n\n");

        body.append("    public void derived(double t, double[] u, double[] p, double[] out) {\n");
        List<Expr> all = new ArrayList<>();
        for (int k = 0; k < nd; k++) {
            all.add(new Variable(VariableKind.DERIVED, k, model.derived().get(k).name()));
        }
        locals(body, all);
        for (int k = 0; k < nd; k++) {
            body.append("        out[").append(k).append("] = d").append(k).append(";\n");
        }
        body.append("    }\n");

        writer.writePowerHelpers(body);

        return "package " + PACKAGE + ";\n\n"
                + "// Generated from model " + sanitize(model.name()) + "; identifiers are indices only.\n"
                + "public final class " + CLASS_NAME + " implements " + VectorField.class.getName() + ", "
                + DerivedValues.class.getName() + " {\n" + body + "}\n";
    }

    /** Declares the derived (and auxiliary) quantities the roots need, in index order, which respects dependencies. */
    private void locals(StringBuilder body, List<Expr> roots) {
        boolean[] needed = new boolean[extended.size()];
        for (Expr root : roots) {
            mark(root, needed);
        }
        for (int k = 0; k < needed.length; k++) {
            if (needed[k]) {
                DerivedQuantity q = extended.get(k);
                body.append("        final double d").append(k).append(" = ").append(writer.write(q.definition()))
                        .append(";").append(comment(q.name())).append('\n');
            }
        }
    }

    private void mark(Expr e, boolean[] needed) {
        References.forEach(e, v -> {
            if (v.kind() == VariableKind.DERIVED && !needed[v.index()]) {
                needed[v.index()] = true;
                mark(extended.get(v.index()).definition(), needed);
            }
        });
    }

    private static String comment(String text) {
        return " // " + sanitize(text);
    }

    /** Keeps letters, digits and a little punctuation; no backslash, slash-star or newline can reach the source. */
    static String sanitize(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < text.length() && out.length() < 60; i++) {
            char c = text.charAt(i);
            boolean safe = (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9')
                    || c == '_' || c == ' ' || c == '(' || c == ')' || c == '.';
            out.append(safe ? c : '_');
        }
        return out.toString();
    }
}
