package org.phasewright.language.ast;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import org.eclipse.emf.ecore.EObject;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.Symbol;

/**
 * Orders declarations of one kind (lets, params) so each comes after those of the same kind it uses, or reports the
 * cycles that make this impossible.
 */
public final class DependencyOrder<T extends Symbol> {
    private final Class<T> kind;
    private final Function<T, List<EObject>> definitions;
    private final List<T> ordered = new ArrayList<>();
    private final Map<T, List<T>> cycles = new LinkedHashMap<>();
    private final Map<T, Boolean> finished = new HashMap<>();

    private DependencyOrder(Class<T> kind, Function<T, List<EObject>> definitions) {
        this.kind = kind;
        this.definitions = definitions;
    }

    public static DependencyOrder<LetDecl> ofLets(PhaseModel model) {
        return of(PhaseModels.lets(model), LetDecl.class, let -> List.of(let.getDefinition()));
    }

    /** Params may refer to params in their value and range bounds. */
    public static DependencyOrder<ParamDecl> ofParams(PhaseModel model) {
        return of(PhaseModels.params(model), ParamDecl.class, param -> {
            List<EObject> parts = new ArrayList<>();
            parts.add(param.getValue());
            parts.addAll(param.getValues());
            parts.add(param.getLow());
            parts.add(param.getHigh());
            return parts;
        });
    }

    private static <T extends Symbol> DependencyOrder<T> of(List<T> declarations, Class<T> kind,
            Function<T, List<EObject>> definitions) {
        DependencyOrder<T> order = new DependencyOrder<>(kind, definitions);
        for (T declaration : declarations) {
            order.visit(declaration, new ArrayList<>());
        }
        return order;
    }

    private void visit(T declaration, List<T> path) {
        Boolean done = finished.get(declaration);
        if (Boolean.TRUE.equals(done)) {
            return;
        }
        if (Boolean.FALSE.equals(done)) {
            List<T> cycle = new ArrayList<>(path.subList(path.indexOf(declaration), path.size()));
            cycle.add(declaration);
            for (T member : cycle) {
                cycles.putIfAbsent(member, cycle);
            }
            return;
        }
        finished.put(declaration, Boolean.FALSE);
        path.add(declaration);
        for (EObject definition : definitions.apply(declaration)) {
            for (Symbol used : PhaseModels.referencedSymbols(definition)) {
                if (kind.isInstance(used)) {
                    visit(kind.cast(used), path);
                }
            }
        }
        path.remove(path.size() - 1);
        finished.put(declaration, Boolean.TRUE);
        ordered.add(declaration);
    }

    /** Declarations in an order where each only uses earlier ones (complete only without cycles). */
    public List<T> ordered() {
        return ordered;
    }

    /** For each declaration on a cycle, the cycle as a path that starts and ends at the same declaration. */
    public Map<T, List<T>> cycles() {
        return cycles;
    }
}
