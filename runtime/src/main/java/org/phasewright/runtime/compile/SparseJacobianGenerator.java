package org.phasewright.runtime.compile;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.codehaus.commons.compiler.CompileException;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.Arithmetic;
import org.phasewright.runtime.symbolic.Differentiator;
import org.phasewright.runtime.symbolic.References;
import org.phasewright.runtime.symbolic.Simplifier;

/**
 * Java source for the nonzeros of the Jacobian, one loop per state family (its own class, compiled by Janino).
 * Each law is differentiated once, symbolically, with respect to each distinct state element it references: the
 * references become placeholder states, {@link Differentiator} does the rest, and the generated loop maps the
 * placeholders back to the elements of the current row. The derivative for reference r in row k is added into
 * the slot the structure assigned to it, so two references that meet in one column (a short ring) add up.
 */
final class SparseJacobianGenerator {
    static final String PACKAGE = "phasewright.generated";
    static final String CLASS_NAME = "GeneratedSparseJacobian";
    /** Placeholder parameter indices start here (parameter family elements read in the current row). */
    private static final int PARAMETER_PLACEHOLDERS = 1 << 30;
    /** Scalar blocks grouped per method, to stay far below the JVM's 64 KB method limit. */
    private static final int SCALARS_PER_METHOD = 40;

    private final SparseJacobianStructure structure;

    SparseJacobianGenerator(SparseJacobianStructure structure) {
        if (structure.blocks == null) {
            throw new IllegalArgumentException("structure without blocks");
        }
        this.structure = structure;
    }

    String generate() {
        StringBuilder methods = new StringBuilder();
        StringBuilder calls = new StringBuilder();
        int method = 0, scalarsInMethod = 0;
        StringBuilder scalarBody = null;
        for (SparseJacobianStructure.Block b : structure.blocks) {
            if (b.stateRefs().isEmpty()) {
                continue; // a rate that depends on no state has no nonzeros
            }
            boolean loop = b.rows() > 1;
            if (!loop) {
                if (scalarBody == null) {
                    scalarBody = new StringBuilder();
                    scalarsInMethod = 0;
                }
                scalarBody.append(body(b, "        "));
                if (++scalarsInMethod == SCALARS_PER_METHOD) {
                    method = emit(methods, calls, method, scalarBody);
                    scalarBody = null;
                }
                continue;
            }
            if (scalarBody != null) {
                method = emit(methods, calls, method, scalarBody);
                scalarBody = null;
            }
            StringBuilder loopBody = new StringBuilder();
            loopBody.append("        for (int k = 0; k < ").append(b.rows()).append("; k++) {\n");
            loopBody.append(body(b, "            "));
            loopBody.append("        }\n");
            method = emit(methods, calls, method, loopBody);
        }
        if (scalarBody != null) {
            emit(methods, calls, method, scalarBody);
        }
        return "package " + PACKAGE + ";\n\n"
                + "public final class " + CLASS_NAME + " implements " + SparseJacobianKernel.class.getName() + " {\n"
                + "    public void add(double t, double[] u, double[] p, double[] v, int[] sl) {\n" + calls
                + "    }\n\n"
                + "    private static int pos(long value, long lower, long size, boolean cyclic) {\n"
                + "        long offset = value - lower;\n"
                + "        if (cyclic) { long m = offset % size; return (int) (m < 0 ? m + size : m); }\n"
                + "        return offset < 0 || offset >= size ? -1 : (int) offset;\n"
                + "    }\n" + methods + "}\n";
    }

    private static int emit(StringBuilder methods, StringBuilder calls, int method, StringBuilder body) {
        calls.append("        b").append(method).append("(t, u, p, v, sl);\n");
        methods.append("\n    private static void b").append(method)
                .append("(double t, double[] u, double[] p, double[] v, int[] sl) {\n").append(body).append("    }\n");
        return method + 1;
    }

    /** Statements for one row of block b (row k of a loop, or the single row). */
    private String body(SparseJacobianStructure.Block b, String in) {
        IndexRange range = b.range();
        int refs = b.stateRefs().size();
        StringBuilder out = new StringBuilder();
        String k = b.rows() > 1 ? "k" : "0";
        out.append(in).append("{\n");
        Map<String, String> indices = new HashMap<>();
        if (range != null) {
            indices.put(range.name(), "ix");
            out.append(in).append("final long ix = ").append(range.lower()).append("L + ").append(k).append(";\n");
        }
        out.append(in).append("final int base = ").append(b.slotBase()).append(" + ").append(k).append(" * ")
                .append(b.perRow()).append(";\n");
        out.append(in).append("int c, s;\n");
        Writer writer = new Writer(indices, "s", "q", "g").states(refs);
        references(out, in, b.stateRefs(), b.parameterRefs(), writer);
        List<SparseJacobianStructure.SumTerm> sums = b.sums();
        Expr law = placeholders(b.law(), b.stateRefs(), b.parameterRefs(), sums);
        List<Expr> derivatives = new ArrayList<>(); // with respect to each reference, then each sum
        for (int r = 0; r < refs + sums.size(); r++) {
            derivatives.add(Simplifier.simplify(DIFFERENTIATOR.partial(law, r)));
        }
        for (int t = 0; t < sums.size(); t++) { // the value of each sum the derivatives need
            SparseJacobianStructure.SumTerm term = sums.get(t);
            int placeholder = refs + t;
            if (derivatives.stream().noneMatch(e -> References.usesState(e, placeholder))) {
                continue; // the law is linear in this sum
            }
            Writer inner = sumWriter(indices, t);
            out.append(in).append("double g").append(t).append(" = 0.0;\n");
            sumLoop(out, in, term, inner);
            out.append(in).append("    g").append(t).append(" += ")
                    .append(inner.write(placeholders(term.sum().body(), term.stateRefs(), term.parameterRefs(),
                            List.of())))
                    .append(";\n").append(in).append("}\n");
        }
        for (int r = 0; r < refs; r++) {
            Expr derivative = derivatives.get(r);
            if (!Simplifier.isZero(derivative)) {
                out.append(in).append("s = sl[base + ").append(r).append("]; if (s >= 0) v[s] += ")
                        .append(writer.write(derivative)).append(";\n");
            }
        }
        for (int t = 0; t < sums.size(); t++) { // chain rule: dL/dg_t times d(body)/d(reference) per term
            SparseJacobianStructure.SumTerm term = sums.get(t);
            Expr outer = derivatives.get(refs + t);
            if (Simplifier.isZero(outer)) {
                continue;
            }
            Writer inner = sumWriter(indices, t);
            Expr body = placeholders(term.sum().body(), term.stateRefs(), term.parameterRefs(), List.of());
            out.append(in).append("{\n").append(in).append("final double dg = ").append(writer.write(outer))
                    .append(";\n");
            sumLoop(out, in, term, inner);
            int bodyRefs = term.stateRefs().size();
            for (int r = 0; r < bodyRefs; r++) {
                Expr derivative = Simplifier.simplify(DIFFERENTIATOR.partial(body, r));
                if (!Simplifier.isZero(derivative)) {
                    out.append(in).append("    s = sl[base + ").append(b.sumOffset(t)).append(" + m * ")
                            .append(bodyRefs).append(" + ").append(r).append("]; if (s >= 0) v[s] += dg * ")
                            .append(inner.write(derivative)).append(";\n");
                }
            }
            out.append(in).append("}\n").append(in).append("}\n");
        }
        out.append(in).append("}\n");
        return out.toString();
    }

    private static final Differentiator DIFFERENTIATOR = new Differentiator((kk, j) -> {
        throw new IllegalStateException("derived quantities are inlined");
    });

    /** Names inside sum t: its index is kx (shadowing an outer index of the same name), references b{t}_r. */
    private static Writer sumWriter(Map<String, String> outer, int t) {
        Map<String, String> indices = new HashMap<>(outer);
        return new Writer(indices, "b" + t + "_", "bq" + t + "_", null);
    }

    /** Opens the loop over a sum's terms (left open) and reads its body's references. */
    private static void sumLoop(StringBuilder out, String in, SparseJacobianStructure.SumTerm term, Writer inner) {
        IndexRange over = term.sum().range();
        inner.indices.put(over.name(), "kx");
        out.append(in).append("for (int m = 0; m < ").append(over.size()).append("; m++) {\n");
        out.append(in).append("    final long kx = ").append(over.lower()).append("L + m;\n");
        references(out, in + "    ", term.stateRefs(), term.parameterRefs(), inner);
    }

    /** Local values of the state and parameter references: 0 outside a bounded range. */
    private static void references(StringBuilder out, String in, List<Expr> states, List<Element> parameters,
            Writer writer) {
        for (int r = 0; r < states.size(); r++) {
            Expr ref = states.get(r);
            String name = writer.statePrefix + r;
            if (ref instanceof Variable v) {
                out.append(in).append("final double ").append(name).append(" = u[").append(v.index()).append("];\n");
            } else {
                Element el = (Element) ref;
                out.append(in).append("c = ").append(position(el, writer)).append(";\n");
                out.append(in).append("final double ").append(name).append(" = c < 0 ? 0.0 : u[")
                        .append(el.offset()).append(" + c];\n");
            }
        }
        for (int r = 0; r < parameters.size(); r++) {
            Element el = parameters.get(r);
            out.append(in).append("c = ").append(position(el, writer)).append(";\n");
            out.append(in).append("final double ").append(writer.parameterPrefix).append(r)
                    .append(" = c < 0 ? 0.0 : p[").append(el.offset()).append(" + c];\n");
        }
    }

    private static String position(Element el, Writer writer) {
        IndexRange r = el.range();
        return "pos(" + writer.index(el.index()) + ", " + r.lower() + "L, " + r.size() + "L, " + r.cyclic() + ")";
    }

    /**
     * State references become states 0..R-1 and sums states R.., so that {@link Differentiator} takes partials with
     * respect to them; parameter elements become parameters from PARAMETER_PLACEHOLDERS.
     */
    private static Expr placeholders(Expr e, List<Expr> states, List<Element> parameters,
            List<SparseJacobianStructure.SumTerm> sums) {
        return switch (e) {
            case Constant c -> c;
            case IndexValue i -> i;
            case Variable v -> v.kind() == VariableKind.STATE
                    ? new Variable(VariableKind.STATE, states.indexOf(v), "s")
                    : v;
            case Element el -> el.kind() == VariableKind.STATE
                    ? new Variable(VariableKind.STATE, states.indexOf(el), "s")
                    : new Variable(VariableKind.PARAMETER, PARAMETER_PLACEHOLDERS + parameters.indexOf(el), "q");
            case Sum sum -> {
                for (int t = 0; t < sums.size(); t++) {
                    if (sums.get(t).sum().equals(sum)) {
                        yield new Variable(VariableKind.STATE, states.size() + t, "g");
                    }
                }
                throw new IllegalStateException("nested sums are not reduced to blocks");
            }
            case Negation n -> new Negation(placeholders(n.operand(), states, parameters, sums));
            case Binary bin -> new Binary(bin.operator(), placeholders(bin.left(), states, parameters, sums),
                    placeholders(bin.right(), states, parameters, sums));
            case Call c -> {
                List<Expr> args = new ArrayList<>();
                for (Expr a : c.arguments()) {
                    args.add(placeholders(a, states, parameters, sums));
                }
                yield new Call(c.function(), args);
            }
        };
    }

    /** Prints derivative expressions over placeholders; only indices and numbers reach the source. */
    private static final class Writer {
        final Map<String, String> indices;
        final String statePrefix;
        final String parameterPrefix;
        /** Prefix of sum placeholders (states numbered from the reference count), or null inside a sum. */
        private final String sumPrefix;
        private int stateCount = -1;

        Writer(Map<String, String> indices, String statePrefix, String parameterPrefix, String sumPrefix) {
            this.indices = indices;
            this.statePrefix = statePrefix;
            this.parameterPrefix = parameterPrefix;
            this.sumPrefix = sumPrefix;
        }

        /** Tells the writer how many state placeholders precede the sum placeholders. */
        Writer states(int count) {
            stateCount = count;
            return this;
        }

        String write(Expr e) {
            StringBuilder out = new StringBuilder();
            write(e, out);
            return out.toString();
        }

        private void write(Expr e, StringBuilder out) {
            switch (e) {
                case Constant c -> out.append(JavaExpressionWriter.literal(c.value()));
                case Variable v -> {
                    switch (v.kind()) {
                        case STATE -> {
                            if (sumPrefix != null && stateCount >= 0 && v.index() >= stateCount) {
                                out.append(sumPrefix).append(v.index() - stateCount);
                            } else {
                                out.append(statePrefix).append(v.index());
                            }
                        }
                        case PARAMETER -> {
                            if (v.index() >= PARAMETER_PLACEHOLDERS) {
                                out.append(parameterPrefix).append(v.index() - PARAMETER_PLACEHOLDERS);
                            } else {
                                out.append("p[").append(v.index()).append(']');
                            }
                        }
                        case TIME -> out.append('t');
                        case DERIVED -> throw new IllegalStateException("derived quantities are inlined");
                    }
                }
                case IndexValue i -> out.append("((double) ").append(bound(i)).append(')');
                case Negation n -> {
                    out.append("(-");
                    write(n.operand(), out);
                    out.append(')');
                }
                case Binary b when b.operator() == BinaryOperator.POWER -> {
                    out.append("org.phasewright.runtime.symbolic.Arithmetic.power(");
                    write(b.left(), out);
                    out.append(", ");
                    write(b.right(), out);
                    out.append(')');
                }
                case Binary b -> {
                    out.append('(');
                    write(b.left(), out);
                    out.append(' ').append(b.operator().symbol()).append(' ');
                    write(b.right(), out);
                    out.append(')');
                }
                case Call c -> {
                    out.append(Arithmetic.javaName(c.function())).append('(');
                    for (int i = 0; i < c.arguments().size(); i++) {
                        if (i > 0) {
                            out.append(", ");
                        }
                        write(c.arguments().get(i), out);
                    }
                    out.append(')');
                }
                case Element el -> throw new IllegalStateException("elements are placeholders by now");
                case Sum s -> throw new IllegalStateException("sums are not reduced to blocks");
            }
        }

        /** An integer index expression as Java long arithmetic. */
        String index(Expr e) {
            return switch (e) {
                case Constant c -> ((long) c.value()) + "L";
                case IndexValue i -> bound(i);
                case Negation n -> "(-" + index(n.operand()) + ")";
                case Binary b -> "(" + index(b.left()) + " " + b.operator().symbol() + " " + index(b.right()) + ")";
                default -> throw new IllegalArgumentException("not an index expression: " + e);
            };
        }

        private String bound(IndexValue i) {
            String name = indices.get(i.name());
            if (name == null) {
                throw new IllegalArgumentException("index " + i.name() + " is not bound here");
            }
            return name;
        }
    }

    /** Compiles the source; the kernel is stateless, hence thread-safe. */
    static SparseJacobianKernel compile(String source) throws CompileException, ReflectiveOperationException {
        return (SparseJacobianKernel) ModelCompiler.load(source, PACKAGE + "." + CLASS_NAME);
    }
}
