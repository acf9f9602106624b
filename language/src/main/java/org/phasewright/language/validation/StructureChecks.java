package org.phasewright.language.validation;

import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;

import org.eclipse.xtext.validation.Check;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.RateDecl;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StateMap;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.SymmetryDecl;

/** The model is a well-posed system: some states, exactly one rate per state, rates and symmetries act on states. */
public class StructureChecks extends PhaseCheckBase {

    @Check
    public void hasStates(PhaseModel model) {
        if (PhaseModels.states(model).isEmpty()) {
            error("Model '" + model.getName() + "' declares no states; add one with `state NAME = VALUE`.", model,
                    PHASE.getPhaseModel_Name(), IssueCodes.NO_STATES);
        }
    }

    @Check
    public void oneRatePerState(PhaseModel model) {
        Map<Symbol, RateDecl> rateOf = new HashMap<>();
        for (RateDecl rate : PhaseModels.rates(model)) {
            Symbol target = rate.getTarget();
            if (target == null || target.eIsProxy()) {
                continue;
            }
            if (!(target instanceof StateDecl)) {
                error("'" + target.getName() + "' is " + PhaseModels.aKind(target)
                        + ", not a state; only states have rates.", rate, PHASE.getRateDecl_Target(),
                        IssueCodes.RATE_OF_NON_STATE);
                continue;
            }
            RateDecl earlier = rateOf.putIfAbsent(target, rate);
            if (earlier != null) {
                error("State '" + target.getName() + "' already has a rate on line " + NameChecks.line(earlier) + ".",
                        rate, PHASE.getRateDecl_Target(), IssueCodes.DUPLICATE_RATE);
            }
        }
        for (StateDecl state : PhaseModels.states(model)) {
            if (!rateOf.containsKey(state) && state.getName() != null) {
                String target = state.getIndex() == null || state.getIndex().eIsProxy() ? state.getName()
                        : state.getName() + "[" + state.getIndex().getName() + "]";
                error("State '" + state.getName() + "' has no rate; add `rate " + target + " = ...`.", state,
                        PHASE.getSymbol_Name(), IssueCodes.MISSING_RATE, state.getName());
            }
        }
    }

    @Check
    public void symmetryMapsStates(SymmetryDecl symmetry) {
        Set<Symbol> mapped = new HashSet<>();
        for (StateMap map : symmetry.getMaps()) {
            Symbol target = map.getState();
            if (target == null || target.eIsProxy()) {
                continue;
            }
            if (!(target instanceof StateDecl)) {
                error("A symmetry maps states; '" + target.getName() + "' is " + PhaseModels.aKind(target) + ".",
                        map, PHASE.getStateMap_State(), IssueCodes.SYMMETRY_OF_NON_STATE);
            } else if (!mapped.add(target)) {
                error("State '" + target.getName() + "' is mapped twice in symmetry '" + symmetry.getName() + "'.", map,
                        PHASE.getStateMap_State(), IssueCodes.SYMMETRY_REPEATS_STATE);
            }
        }
    }
}
