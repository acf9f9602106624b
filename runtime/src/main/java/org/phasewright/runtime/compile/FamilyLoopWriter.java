package org.phasewright.runtime.compile;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Variable;

/**
 * Java for one family: a loop over its index that writes {@code target[offset + position]}. Stencil reads
 * {@code x[i + c]} index the array directly in the interior, where no read leaves its range; the few edge
 * iterations before and after go through the helpers {@code cyc} (wrap around) and {@code bnd} (0 outside), as do
 * index expressions that are not a shift of one index. Edge and interior iterations run in ascending order, so a
 * derived family may read its own earlier elements.
 * <p>
 * Sums accumulate left to right into a local declared just before the statement that uses it, at the outermost
 * level where every index their body uses is bound: a sum that does not use the family's index is computed once
 * before the loop, not once per element.
 */
final class FamilyLoopWriter implements JavaExpressionWriter.Indexed {
    /** One enclosing loop: the index it binds, its Java variable, whether it runs its interior now, and the code
     * to run at the top of each of its iterations (sums hoisted to this level). */
    private record Level(String index, String javaName, boolean interior, StringBuilder preamble, String indent) {
    }

    /** Helpers the generated class must define when any element read needs them. */
    static final String HELPERS = """

                private static double cyc(double[] a, int offset, int size, long position) {
                    return a[offset + (int) Math.floorMod(position, (long) size)];
                }

                private static double bnd(double[] a, int offset, int size, long position) {
                    return position >= 0 && position < size ? a[offset + (int) position] : 0.0;
                }
            """;

    private final JavaExpressionWriter writer;
    private List<Level> levels = new ArrayList<>();
    private final Map<Sum, String> hoistedToTop = new HashMap<>();
    private final Map<Integer, String> parameterLocals = new HashMap<>();
    private int counter;

    FamilyLoopWriter(JavaExpressionWriter writer) {
        this.writer = writer;
    }

    /**
     * A block computing every element of {@code family}'s formula into {@code target[offset + position]}.
     *
     * @param indent indentation of the block's braces
     */
    String family(Family family, String target, String indent) {
        levels = new ArrayList<>();
        hoistedToTop.clear();
        parameterLocals.clear();
        Level top = new Level(null, null, false, new StringBuilder(), indent + "    ");
        levels.add(top);
        IndexRange r = family.range();
        String loops;
        if (family.scalar()) { // a scalar with sums: no index of its own
            loops = top.indent() + target + "[" + family.offset() + "] = " + writer.write(family.formula(), this)
                    + ";\n";
        } else {
            String i = "i" + counter++;
            String store = target + "[" + i + plus(family.offset() - (long) r.lower()) + "]";
            loops = loops(r, i, top.indent(), body -> store + " = " + writer.write(family.formula(), this) + ";",
                    family.formula());
        }
        return indent + "{\n" + top.preamble() + loops + indent + "}\n";
    }

    /** A statement of the body, written with the current levels; returns the line without indentation. */
    private interface Body {
        String write(Level level);
    }

    /**
     * The loops of index {@code javaName} over {@code range}: lower edge, interior and upper edge, each with its
     * own copy of the body (the interior one reading stencils directly).
     */
    private String loops(IndexRange range, String javaName, String indent, Body body, Expr scanned) {
        long[] interior = interior(range, scanned);
        StringBuilder out = new StringBuilder();
        if (interior == null) {
            loop(out, range.lower(), range.upper(), range, javaName, false, indent, body);
        } else {
            loop(out, range.lower(), interior[0] - 1, range, javaName, false, indent, body);
            loop(out, interior[0], interior[1], range, javaName, true, indent, body);
            loop(out, interior[1] + 1, range.upper(), range, javaName, false, indent, body);
        }
        return out.toString();
    }

    private void loop(StringBuilder out, long from, long to, IndexRange range, String javaName, boolean interior,
            String indent, Body body) {
        if (from > to) {
            return;
        }
        Level level = new Level(range.name(), javaName, interior, new StringBuilder(), indent + "    ");
        levels.add(level);
        String statement = body.write(level);
        levels.remove(levels.size() - 1);
        out.append(indent).append("for (int ").append(javaName).append(" = ").append(from).append("; ")
                .append(javaName).append(" <= ").append(to).append("; ").append(javaName).append("++) {\n")
                .append(level.preamble()).append(level.indent()).append(statement).append('\n')
                .append(indent).append("}\n");
    }

    /**
     * The values of {@code range}'s index for which every read {@code x[index + c]} in {@code e} stays inside x's
     * range, as {lo, hi}; null when there is none or no such read (then every iteration takes the checked path,
     * which is also right when there are no reads at all).
     */
    private static long[] interior(IndexRange range, Expr e) {
        long lo = range.lower(), hi = range.upper();
        List<Element> reads = new ArrayList<>();
        collectElements(e, reads);
        boolean any = false;
        for (Element el : reads) {
            LinearIndex li = LinearIndex.of(el.index());
            if (li != null && range.name().equals(li.unitShiftOf())) {
                any = true;
                lo = Math.max(lo, el.range().lower() - li.constant());
                hi = Math.min(hi, el.range().upper() - li.constant());
            }
        }
        return any && lo <= hi ? new long[] {lo, hi} : null;
    }

    private static void collectElements(Expr e, List<Element> out) {
        ModelLayout.leaves(e, leaf -> {
            if (leaf instanceof Element el) {
                out.add(el);
            }
        });
    }

    // ---- callbacks of the expression writer

    /** Parameters are read once before the loops: fewer loads, and loops the JIT can vectorise. */
    @Override
    public boolean variable(Variable v, StringBuilder out) {
        if (v.kind() != org.phasewright.runtime.model.VariableKind.PARAMETER) {
            return false;
        }
        String local = parameterLocals.get(v.index());
        if (local == null) {
            local = "q" + counter++;
            parameterLocals.put(v.index(), local);
            Level top = levels.get(0);
            top.preamble().insert(0, top.indent() + "final double " + local + " = p[" + v.index() + "];\n");
        }
        out.append(local);
        return true;
    }

    @Override
    public void indexValue(IndexValue i, StringBuilder out) {
        out.append("((double) ").append(level(i.name()).javaName()).append(')');
    }

    @Override
    public void element(Element el, StringBuilder out) {
        String array = switch (el.kind()) {
            case STATE -> "u";
            case PARAMETER -> "p";
            case DERIVED -> "dv";
            case TIME -> throw new IllegalArgumentException("time has no elements");
        };
        IndexRange r = el.range();
        LinearIndex li = LinearIndex.of(el.index());
        if (li != null && li.coefficients().isEmpty()) { // a fixed element: resolve it now
            int position = r.position(li.constant());
            out.append(position < 0 ? "0.0" : array + "[" + (el.offset() + position) + "]");
            return;
        }
        String shifted = li == null ? null : li.unitShiftOf();
        if (shifted != null && level(shifted).interior()) {
            out.append(array).append('[').append(level(shifted).javaName())
                    .append(plus(el.offset() - (long) r.lower() + li.constant())).append(']');
            return;
        }
        out.append(r.cyclic() ? "cyc(" : "bnd(").append(array).append(", ").append(el.offset()).append(", ")
                .append(r.size()).append(", ");
        indexExpression(el.index(), out);
        out.append(" - ").append(r.lower()).append("L)");
    }

    @Override
    public void sum(Sum s, StringBuilder out) {
        Set<String> free = new HashSet<>();
        freeIndices(s, new HashSet<>(), free);
        int depth = 0; // the innermost level binding an index the sum uses
        for (int k = levels.size() - 1; k > 0; k--) {
            if (free.contains(levels.get(k).index())) {
                depth = k;
                break;
            }
        }
        if (depth == 0 && hoistedToTop.containsKey(s)) {
            out.append(hoistedToTop.get(s));
            return;
        }
        String name = "s" + counter++;
        List<Level> saved = levels;
        levels = new ArrayList<>(saved.subList(0, depth + 1));
        Level home = levels.get(depth);
        String i = "i" + counter++;
        String code = loops(s.range(), i, home.indent(), body -> name + " += " + writer.write(s.body(), this) + ";",
                s.body());
        home.preamble().append(home.indent()).append("double ").append(name).append(" = 0.0;\n").append(code);
        levels = saved;
        if (depth == 0) {
            hoistedToTop.put(s, name);
        }
        out.append(name);
    }

    private Level level(String index) {
        for (int k = levels.size() - 1; k > 0; k--) {
            if (levels.get(k).index().equals(index)) {
                return levels.get(k);
            }
        }
        throw new IllegalArgumentException("index " + index + " is not bound here");
    }

    /** Integer arithmetic on long, as {@code IndexExpansion} does. */
    private void indexExpression(Expr e, StringBuilder out) {
        switch (e) {
            case Constant c -> out.append("(").append((long) c.value()).append("L)");
            case IndexValue i -> out.append("((long) ").append(level(i.name()).javaName()).append(')');
            case Negation n -> {
                out.append("(-");
                indexExpression(n.operand(), out);
                out.append(')');
            }
            case Binary b -> {
                out.append('(');
                indexExpression(b.left(), out);
                out.append(' ').append(switch (b.operator()) {
                    case ADD -> "+";
                    case SUBTRACT -> "-";
                    case MULTIPLY -> "*";
                    default -> throw new IllegalArgumentException("index arithmetic allows +, - and * only");
                }).append(' ');
                indexExpression(b.right(), out);
                out.append(')');
            }
            default -> throw new IllegalArgumentException("not an index expression: " + e);
        }
    }

    /** Indices {@code e} uses that it does not bind itself. */
    private static void freeIndices(Expr e, Set<String> bound, Set<String> out) {
        switch (e) {
            case Constant c -> { }
            case Variable v -> { }
            case IndexValue i -> {
                if (!bound.contains(i.name())) {
                    out.add(i.name());
                }
            }
            case Element el -> freeIndices(el.index(), bound, out);
            case Sum s -> {
                Set<String> inner = new HashSet<>(bound);
                inner.add(s.range().name());
                freeIndices(s.body(), inner, out);
            }
            case Negation n -> freeIndices(n.operand(), bound, out);
            case Binary b -> {
                freeIndices(b.left(), bound, out);
                freeIndices(b.right(), bound, out);
            }
            case Call c -> c.arguments().forEach(a -> freeIndices(a, bound, out));
        }
    }

    private static String plus(long c) {
        return c == 0 ? "" : c > 0 ? " + " + c : " - " + (-c);
    }
}
