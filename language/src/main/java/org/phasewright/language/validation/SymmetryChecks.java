package org.phasewright.language.validation;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;

import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.validation.Check;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.lowering.ConstantValues;
import org.phasewright.language.lowering.FlatLayout;
import org.phasewright.language.lowering.IndexRanges;
import org.phasewright.language.lowering.ModelLowering;
import org.phasewright.language.phase.IndexDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.RateDecl;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StateMap;
import org.phasewright.language.phase.SymmetryDecl;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.symmetry.EquivarianceCheck;
import org.phasewright.runtime.symmetry.EquivarianceVerdict;
import org.phasewright.runtime.symmetry.LinearMap;
import org.phasewright.runtime.symmetry.PreparedField;
import org.phasewright.runtime.symmetry.SymmetryDiscovery;

/**
 * Declared symmetries are invertible linear maps under which the rates are equivariant (or reversing); undeclared
 * signed-permutation symmetries are pointed out with the declaration to add. Needs a model that lowers; a model
 * with structural errors gets those first.
 */
public class SymmetryChecks extends PhaseCheckBase {
    /**
     * Above this many states a declared symmetry is not checked: the check expands every rate and samples the
     * field, which for a lattice of 10^6 cells would stall the editor. Checking a smaller copy of the lattice is
     * not sound in general (tables and formulas may depend on the size), so the user is told instead.
     */
    static final int MAX_CHECKED_DIMENSION = 500;
    /** Discovery searches signed permutations; on indexed models it is kept to small lattices. */
    static final int MAX_DISCOVERY_DIMENSION_INDEXED = 200;

    /** The lowered model and the prepared check, shared by all checks of one validation run. */
    private record Prepared(DynamicalModel model, FlatLayout layout, PreparedField field, EquivarianceCheck check,
            Map<Integer, EquivarianceVerdict> verdicts) {
        /** The verdict on declared symmetry {@code index}, computed once for both checks below. */
        EquivarianceVerdict verdict(int index, LinearMap g) {
            return verdicts.computeIfAbsent(index, i -> check.check(g));
        }
    }

    @Check
    public void declaredSymmetryHolds(SymmetryDecl decl) {
        try {
            checkDeclared(decl);
        } catch (RuntimeException unexpected) { // a numerical corner must not become a stack trace for the user
            warning("Symmetry '" + decl.getName() + "' could not be checked (" + unexpected.getClass().getSimpleName()
                    + ").", decl, PHASE.getSymmetryDecl_Name(), IssueCodes.SYMMETRY_UNVERIFIED);
        }
    }

    private void checkDeclared(SymmetryDecl decl) {
        PhaseModel phase = EcoreUtil2.getContainerOfType(decl, PhaseModel.class);
        OptionalLong size = expandedSize(phase);
        if (size.isPresent() && size.getAsLong() > MAX_CHECKED_DIMENSION) {
            info("Symmetry '" + decl.getName() + "' is not checked: the model expands to " + size.getAsLong()
                    + " states (or terms of a sum) and symmetries are checked element by element only up to "
                    + MAX_CHECKED_DIMENSION + "; declare the same model with a smaller index range to check it.",
                    decl, PHASE.getSymmetryDecl_Name(), IssueCodes.SYMMETRY_NOT_CHECKED);
            return;
        }
        Prepared prepared = prepared(phase);
        int index = PhaseModels.symmetries(phase).indexOf(decl);
        if (prepared == null || index < 0 || index >= prepared.model().symmetries().size()) {
            return;
        }
        var symmetry = prepared.model().symmetries().get(index);
        int states = prepared.model().dimension();
        Optional<Integer> nonlinear = LinearMap.nonlinearImage(symmetry, states);
        if (nonlinear.isPresent()) {
            StateMap map = mapOf(decl, prepared.layout().stateAt(nonlinear.get()));
            String state = prepared.model().states().get(nonlinear.get()).name();
            error("A symmetry is a linear map: the image of '" + state + "' must be a combination of states with "
                    + "constant factors, such as `" + state + " -> -" + state + "`.", map == null ? decl : map,
                    map == null ? PHASE.getSymmetryDecl_Name() : PHASE.getStateMap_Image(),
                    IssueCodes.NONLINEAR_SYMMETRY);
            return;
        }
        LinearMap g = LinearMap.of(symmetry, states).orElseThrow();
        if (!g.invertible()) {
            error("Symmetry '" + decl.getName() + "' is not invertible: it sends some non-zero state to zero, so it "
                    + "cannot be a symmetry.", decl, PHASE.getSymmetryDecl_Name(), IssueCodes.SINGULAR_SYMMETRY);
            return;
        }
        EquivarianceVerdict verdict = prepared.verdict(index, g);
        String law = decl.isReversesTime() ? "f(g·u) = −g·f(u)" : "f(g·u) = g·f(u)";
        switch (verdict.outcome()) {
            case HOLDS -> info("Symmetry '" + decl.getName() + "' holds: " + law + ", checked " + verdict.methodText()
                    + ".", decl, PHASE.getSymmetryDecl_Name(), IssueCodes.SYMMETRY_VERIFIED);
            case UNDECIDED -> warning("Symmetry '" + decl.getName() + "' could not be checked: the rates are "
                    + "undefined at most sample points.", decl, PHASE.getSymmetryDecl_Name(),
                    IssueCodes.SYMMETRY_UNVERIFIED);
            case BROKEN -> {
                String state = prepared.model().states().get(verdict.brokenRate()).name();
                RateDecl rate = rateOf(phase, prepared.layout().stateAt(verdict.brokenRate()));
                String message = "This rate breaks symmetry '" + decl.getName() + "' (" + law + "): for the rate of "
                        + state + ", f(g·u) = " + verdict.leftSide() + " but " + (decl.isReversesTime() ? "−" : "")
                        + "g·f(u) = " + verdict.rightSide() + "; checked " + verdict.methodText() + ".";
                if (rate != null && rate.getLaw() != null) {
                    error(message, rate.getLaw(), null, IssueCodes.BROKEN_SYMMETRY, decl.getName());
                } else {
                    error(message, decl, PHASE.getSymmetryDecl_Name(), IssueCodes.BROKEN_SYMMETRY, decl.getName());
                }
            }
        }
    }

    @Check
    public void undeclaredSymmetries(PhaseModel phase) {
        try {
            discover(phase);
        } catch (RuntimeException unexpected) { // discovery is a courtesy; never fail validation over it
        }
    }

    private void discover(PhaseModel phase) {
        boolean indexed = !PhaseModels.membersOf(phase, IndexDecl.class).isEmpty();
        OptionalLong size = expandedSize(phase);
        if (size.isEmpty() || size.getAsLong() > MAX_CHECKED_DIMENSION
                || (indexed && size.getAsLong() > MAX_DISCOVERY_DIMENSION_INDEXED)) {
            return;
        }
        Prepared prepared = prepared(phase);
        if (prepared == null) {
            return;
        }
        List<LinearMap> declared = new ArrayList<>();
        for (int i = 0; i < prepared.model().symmetries().size(); i++) {
            int index = i;
            LinearMap.of(prepared.model().symmetries().get(i), prepared.model().dimension())
                    .filter(LinearMap::invertible).filter(g -> prepared.verdict(index, g).holds())
                    .ifPresent(declared::add);
        }
        Set<String> taken = new HashSet<>();
        PhaseModels.symmetries(phase).forEach(s -> taken.add(s.getName()));
        int counter = 0;
        for (SymmetryDiscovery.Found found : new SymmetryDiscovery(prepared.field(), prepared.check())
                .discover(declared)) {
            String name;
            do {
                name = "s" + ++counter;
            } while (taken.contains(name));
            String declaration = found.symmetry().declaration(name, prepared.field().stateNames());
            info("Undeclared symmetry: declare it with `" + declaration + "` (checked " + found.verdict().methodText()
                    + ").", phase, PHASE.getPhaseModel_Name(), IssueCodes.SYMMETRY_DISCOVERED, declaration);
        }
    }

    private Prepared prepared(PhaseModel phase) {
        // get/put: prepare reads the context too, which a computeIfAbsent on it would not allow.
        @SuppressWarnings("unchecked")
        Optional<Prepared> prepared = (Optional<Prepared>) getContext().get(Prepared.class);
        if (prepared == null) {
            prepared = prepare(phase);
            getContext().put(Prepared.class, prepared);
        }
        return prepared.orElse(null);
    }

    private Optional<Prepared> prepare(PhaseModel phase) {
        try {
            OptionalLong size = expandedSize(phase);
            if (size.isEmpty() || size.getAsLong() > MAX_CHECKED_DIMENSION) {
                return Optional.empty();
            }
            ConstantValues constants = constants(phase);
            FlatLayout layout = FlatLayout.of(phase, constants);
            DynamicalModel model = new ModelLowering().lower(phase, constants, layout);
            PreparedField field = PreparedField.of(model);
            return Optional.of(new Prepared(model, layout, field,
                    new EquivarianceCheck(field, model.time().name()), new HashMap<>()));
        } catch (RuntimeException notReady) { // errors elsewhere in the model, reported by their own checks
            return Optional.empty();
        }
    }

    /**
     * What the element-by-element check has to expand: the number of states, or the largest index range when that
     * is larger (a sum over it becomes one term per value). Empty when a range is not known.
     */
    private OptionalLong expandedSize(PhaseModel phase) {
        // Asked by every symmetry declaration and by discovery: once per validation run.
        OptionalLong cached = (OptionalLong) getContext().get(ExpandedSize.class);
        if (cached == null) {
            cached = expandedSize(phase, constants(phase));
            getContext().put(ExpandedSize.class, cached);
        }
        return cached;
    }

    /** Key of {@link #expandedSize(PhaseModel)} in the validation context. */
    private record ExpandedSize() {
    }

    private static OptionalLong expandedSize(PhaseModel phase, ConstantValues constants) {
        OptionalLong dimension = StudyChecks.dimension(phase, constants);
        if (dimension.isEmpty()) {
            return dimension;
        }
        long largest = dimension.getAsLong();
        for (IndexDecl index : PhaseModels.membersOf(phase, IndexDecl.class)) {
            OptionalLong size = IndexRanges.size(index, constants);
            if (size.isEmpty()) {
                return OptionalLong.empty();
            }
            largest = Math.max(largest, size.getAsLong());
        }
        return OptionalLong.of(largest);
    }

    private static StateMap mapOf(SymmetryDecl decl, StateDecl state) {
        return decl.getMaps().stream().filter(m -> m.getState() == state).findFirst().orElse(null);
    }

    private static RateDecl rateOf(PhaseModel phase, StateDecl state) {
        return PhaseModels.rates(phase).stream().filter(r -> r.getTarget() == state).findFirst().orElse(null);
    }
}
