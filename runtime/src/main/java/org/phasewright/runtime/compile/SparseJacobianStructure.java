package org.phasewright.runtime.compile;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.phasewright.runtime.linalg.SparsePattern;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/**
 * Which states each rate depends on (through derived quantities too), read from the model's declarations rather
 * than from n expanded expression trees. A state family's law is one {@link Block}: its distinct state references
 * ({@code x[i+1]}, {@code x[i-2]}, a scalar {@code c}) give, row by row, the columns of the pattern and the slot
 * each reference's derivative goes to. A Lorenz-96 ring of 10^6 states is four integer evaluations per row.
 * <p>
 * A sum in a law contributes, per row, one entry per term and body reference, so a row that sums over a family
 * depends on all of it. Laws with nested sums, or with elements of bounded derived families that may fall outside
 * their range, are not reduced to blocks; their pattern comes from the expanded rows instead
 * ({@link ExpandedPattern}), which suits the finite difference Jacobian. Either way the pattern is refused (null)
 * beyond {@link #MAX_NONZEROS}.
 */
final class SparseJacobianStructure {
    /**
     * Nonzeros beyond which no sparse Jacobian is offered: 12 bytes each in the matrix and typically a few times
     * that in its LU factors; 10^6 states with 20 neighbours each still fit.
     */
    static final long MAX_NONZEROS = 20_000_000L;
    /** Distinct references of one law beyond which code is not generated. */
    static final int MAX_REFERENCES = 256;

    /**
     * One group of rows sharing a law: a state family (range non-null, index named range.name()) or a scalar state.
     * {@code stateRefs} are Elements of state families or scalar state Variables outside sums; {@code parameterRefs}
     * are Elements of parameter families outside sums; {@code sums} the distinct sums of the law, each with the
     * references of its body. Row k owns {@link #perRow()} slot entries from {@code slotBase + k * perRow()}: one
     * per outside reference, then per sum one per term and body reference ({@link #sumOffset}); each holds the
     * slot of the pattern that reference's derivative goes to, or -1 where it reads a zero outside a bounded range.
     */
    record Block(int rowOffset, int rows, IndexRange range, Expr law, List<Expr> stateRefs,
            List<Element> parameterRefs, List<SumTerm> sums, long slotBase) {
        long perRow() {
            return sumOffset(sums.size());
        }

        /** Offset within a row's entries of sum s's first term (s = sums.size(): the row's entry count). */
        long sumOffset(int s) {
            long offset = stateRefs.size();
            for (int k = 0; k < s; k++) {
                offset += (long) sums.get(k).sum().range().size() * sums.get(k).stateRefs().size();
            }
            return offset;
        }
    }

    /** A sum in a law, with the state and parameter references of its body (which may use both indices). */
    record SumTerm(Sum sum, List<Expr> stateRefs, List<Element> parameterRefs) {
    }

    final SparsePattern pattern;
    /** Null when the pattern came from expanded rows. */
    final List<Block> blocks;
    /** Per block, from {@code slotBase}: see {@link Block}. */
    final int[] slots;

    private SparseJacobianStructure(SparsePattern pattern, List<Block> blocks, int[] slots) {
        this.pattern = pattern;
        this.blocks = blocks;
        this.slots = slots;
    }

    /** The structure by blocks, or by expanded rows when some law cannot be reduced; null when too large. */
    static SparseJacobianStructure of(DynamicalModel model) {
        List<Block> blocks;
        try {
            blocks = blocks(model);
        } catch (NotReducible e) {
            SparsePattern expanded = ExpandedPattern.of(model);
            return expanded == null ? null : new SparseJacobianStructure(expanded, null, null);
        }
        return fromBlocks(model.dimension(), blocks);
    }

    static final class NotReducible extends Exception {
        NotReducible(String why) {
            super(why, null, false, false);
        }
    }

    private static List<Block> blocks(DynamicalModel model) throws NotReducible {
        LawInliner inliner = new LawInliner(model);
        List<Block> out = new ArrayList<>();
        int n = model.dimension();
        List<Family> families = new ArrayList<>(model.families(VariableKind.STATE));
        families.sort((a, b) -> Integer.compare(a.offset(), b.offset()));
        int next = 0;
        long slotBase = 0;
        for (Family f : families) {
            for (; next < f.offset(); next++) {
                Block b = scalar(model, next, inliner, slotBase);
                slotBase += b.perRow();
                out.add(b);
            }
            Expr law = inliner.inline(f.formula(), f.range());
            Block b = block(f.name(), f.offset(), f.size(), f.range(), law, slotBase);
            slotBase += b.rows() * b.perRow();
            out.add(b);
            next = f.offset() + f.size();
        }
        for (; next < n; next++) {
            Block b = scalar(model, next, inliner, slotBase);
            slotBase += b.perRow();
            out.add(b);
        }
        return out;
    }

    private static Block scalar(DynamicalModel model, int row, LawInliner inliner, long slotBase)
            throws NotReducible {
        Expr law = inliner.inline(model.rates().get(row), null);
        return block(model.states().get(row).name(), row, 1, null, law, slotBase);
    }

    private static Block block(String name, int offset, int rows, IndexRange range, Expr law, long slotBase)
            throws NotReducible {
        Map<Expr, Boolean> states = new LinkedHashMap<>();
        Map<Element, Boolean> parameters = new LinkedHashMap<>();
        Map<Sum, SumTerm> sums = new LinkedHashMap<>();
        collect(law, states, parameters, sums);
        if (states.size() > MAX_REFERENCES) {
            throw new NotReducible("law of " + name + " has " + states.size() + " state references");
        }
        return new Block(offset, rows, range, law, List.copyOf(states.keySet()),
                List.copyOf(parameters.keySet()), List.copyOf(sums.values()), slotBase);
    }

    /** References outside sums go to the maps; each distinct sum becomes a term with its body's references. */
    private static void collect(Expr e, Map<Expr, Boolean> states, Map<Element, Boolean> parameters,
            Map<Sum, SumTerm> sums) throws NotReducible {
        if (e instanceof Sum sum) {
            if (sums == null) {
                throw new NotReducible("nested sums");
            }
            if (!sums.containsKey(sum)) {
                Map<Expr, Boolean> bodyStates = new LinkedHashMap<>();
                Map<Element, Boolean> bodyParameters = new LinkedHashMap<>();
                collect(sum.body(), bodyStates, bodyParameters, null);
                if (bodyStates.size() > MAX_REFERENCES) {
                    throw new NotReducible("sum with " + bodyStates.size() + " state references");
                }
                sums.put(sum, new SumTerm(sum, List.copyOf(bodyStates.keySet()),
                        List.copyOf(bodyParameters.keySet())));
            }
            return;
        }
        collectOutside(e, states, parameters, sums);
    }

    private static void collectOutside(Expr e, Map<Expr, Boolean> states, Map<Element, Boolean> parameters,
            Map<Sum, SumTerm> sums) throws NotReducible {
        switch (e) {
            case Constant c -> { }
            case IndexValue i -> { }
            case Variable v -> {
                if (v.kind() == VariableKind.STATE) {
                    states.put(v, true);
                } else if (v.kind() == VariableKind.DERIVED) {
                    throw new IllegalStateException("derived quantity left after inlining: " + v.name());
                }
            }
            case Element el -> {
                if (el.kind() == VariableKind.STATE) {
                    states.put(el, true);
                } else if (el.kind() == VariableKind.PARAMETER) {
                    parameters.put(el, true);
                } else {
                    throw new IllegalStateException("derived element left after inlining: " + el.family());
                }
            }
            case Sum s -> collect(s, states, parameters, sums);
            case Negation n -> collect(n.operand(), states, parameters, sums);
            case Binary b -> {
                collect(b.left(), states, parameters, sums);
                collect(b.right(), states, parameters, sums);
            }
            case Call c -> {
                for (Expr a : c.arguments()) {
                    collect(a, states, parameters, sums);
                }
            }
        }
    }

    private static SparseJacobianStructure fromBlocks(int n, List<Block> blocks) {
        long slotCount = 0;
        long widest = 1;
        for (Block b : blocks) {
            slotCount += b.rows() * b.perRow();
            widest = Math.max(widest, b.perRow());
        }
        if (slotCount > MAX_NONZEROS) {
            return null;
        }
        int[] slots = new int[(int) slotCount];
        int[] rowStart = new int[n + 1];
        int[] columns = new int[(int) slotCount];
        int nnz = 0;
        long[] keyed = new long[(int) widest];
        for (Block b : blocks) {
            int refs = b.stateRefs().size();
            IndexStencil[] stencils = new IndexStencil[refs];
            for (int r = 0; r < refs; r++) {
                stencils[r] = IndexStencil.of(b.stateRefs().get(r), b.range());
            }
            for (int k = 0; k < b.rows(); k++) {
                rowStart[b.rowOffset() + k] = nnz;
                nnz = row(b, stencils, k, slots, columns, nnz, keyed);
            }
        }
        rowStart[n] = nnz;
        return new SparseJacobianStructure(new SparsePattern(n, rowStart, Arrays.copyOf(columns, nnz)), blocks,
                slots);
    }

    /** Fills row k of block b: its sorted distinct columns from {@code nnz} on, and each reference's slot. */
    private static int row(Block b, IndexStencil[] stencils, int k, int[] slots, int[] columns, int nnz,
            long[] keyed) {
        int base = (int) (b.slotBase() + k * b.perRow());
        long value = b.range() == null ? 0 : b.range().valueAt(k);
        String name = b.range() == null ? "" : b.range().name();
        int count = 0;
        for (int r = 0; r < stencils.length; r++) {
            int col = stencils[r] != null ? stencils[r].column(value)
                    : IndexStencil.column(b.stateRefs().get(r), name, value, null, 0);
            slots[base + r] = -1;
            if (col >= 0) {
                keyed[count++] = ((long) col << 32) | r;
            }
        }
        for (int s = 0; s < b.sums().size(); s++) {
            SumTerm term = b.sums().get(s);
            IndexRange over = term.sum().range();
            int refs = term.stateRefs().size();
            int offset = (int) b.sumOffset(s);
            for (int m = 0; m < over.size(); m++) {
                for (int r = 0; r < refs; r++) {
                    int entry = offset + m * refs + r;
                    int col = IndexStencil.column(term.stateRefs().get(r), name, value, over.name(), over.valueAt(m));
                    slots[base + entry] = -1;
                    if (col >= 0) {
                        keyed[count++] = ((long) col << 32) | entry;
                    }
                }
            }
        }
        if (count > 32) {
            Arrays.sort(keyed, 0, count);
        } else {
            for (int m = 1; m < count; m++) { // rows are short: insertion sort
                long key = keyed[m];
                int j = m - 1;
                while (j >= 0 && keyed[j] > key) {
                    keyed[j + 1] = keyed[j];
                    j--;
                }
                keyed[j + 1] = key;
            }
        }
        for (int m = 0; m < count; m++) {
            int col = (int) (keyed[m] >>> 32);
            int entry = (int) keyed[m];
            if (m == 0 || col != columns[nnz - 1]) {
                columns[nnz++] = col;
            }
            slots[base + entry] = nnz - 1;
        }
        return nnz;
    }
}
