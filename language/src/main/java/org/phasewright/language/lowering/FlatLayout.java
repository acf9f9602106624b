package org.phasewright.language.lowering;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.phasewright.language.ast.DependencyOrder;
import org.phasewright.language.ast.Families;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.IndexDecl;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.Symbol;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.VariableKind;

/**
 * Where every declaration lands in the runtime model's flat lists, computed before anything is lowered so that a
 * formula may refer to a family declared further down: states and params in declaration order, lets in dependency
 * order, each family taking as many places as its index has values. The same order {@link ModelLowering} declares
 * them to the model assembler in.
 */
public final class FlatLayout {
    /** A declaration's place: first flat position and kind; {@code range} is null for a scalar. */
    public record Place(VariableKind kind, int offset, IndexRange range) {
    }

    private final Map<IndexDecl, IndexRange> ranges = new HashMap<>();
    private final Map<Symbol, Place> places = new HashMap<>();
    private final List<StateDecl> states;
    private final List<LetDecl> lets;
    private int dimension;

    private FlatLayout(PhaseModel model, ConstantValues constants) {
        for (IndexDecl index : PhaseModels.membersOf(model, IndexDecl.class)) {
            ranges.put(index, IndexRanges.of(index, constants));
        }
        states = PhaseModels.states(model);
        dimension = place(states, VariableKind.STATE);
        place(PhaseModels.params(model), VariableKind.PARAMETER);
        DependencyOrder<LetDecl> order = DependencyOrder.ofLets(model);
        if (!order.cycles().isEmpty()) {
            throw new LoweringException("the let quantities depend on each other in a cycle");
        }
        lets = order.ordered();
        place(lets, VariableKind.DERIVED);
    }

    /** Throws {@link LoweringException} when an index range cannot be evaluated or lets form a cycle. */
    public static FlatLayout of(PhaseModel model) {
        return of(model, ConstantValues.of(model));
    }

    /** As {@link #of(PhaseModel)}, with the model's constants already evaluated by the caller. */
    public static FlatLayout of(PhaseModel model, ConstantValues constants) {
        return new FlatLayout(model, constants);
    }

    private int place(List<? extends Symbol> declarations, VariableKind kind) {
        long next = 0;
        for (Symbol declaration : declarations) {
            IndexDecl index = Families.indexOf(declaration);
            IndexRange range = index == null ? null : range(index);
            places.put(declaration, new Place(kind, (int) next, range));
            next += range == null ? 1 : range.size();
            if (next > Integer.MAX_VALUE - 8) {
                throw new LoweringException("the model has more than " + Integer.MAX_VALUE + " " + kind + " values");
            }
        }
        return (int) next;
    }

    public IndexRange range(IndexDecl index) {
        IndexRange range = ranges.get(index);
        if (range == null) {
            throw new LoweringException("unknown index " + (index == null ? "?" : index.getName()));
        }
        return range;
    }

    /** The place of a state, param or let; null for anything else. */
    public Place place(Symbol symbol) {
        return places.get(symbol);
    }

    /** The number of flat states. */
    public int dimension() {
        return dimension;
    }

    /** Lets in the order they are declared to the model (each after those it uses). */
    public List<LetDecl> orderedLets() {
        return lets;
    }

    /** The state declaration (scalar or family) that holds flat state {@code flatIndex}. */
    public StateDecl stateAt(int flatIndex) {
        StateDecl found = null;
        for (StateDecl state : states) {
            if (places.get(state).offset() <= flatIndex) {
                found = state;
            } else {
                break;
            }
        }
        return found;
    }
}
