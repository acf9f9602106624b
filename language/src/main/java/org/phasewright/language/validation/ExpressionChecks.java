package org.phasewright.language.validation;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.validation.Check;
import org.phasewright.language.ast.DependencyOrder;
import org.phasewright.language.ast.Families;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.BasinsRequest;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.FollowRequest;
import org.phasewright.language.phase.FunctionCall;
import org.phasewright.language.phase.GridSpan;
import org.phasewright.language.phase.IndexDecl;
import org.phasewright.language.phase.LyapunovMapRequest;
import org.phasewright.language.phase.LyapunovRequest;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.SimulateRequest;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StateMap;
import org.phasewright.language.phase.SweepRequest;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.SymbolRef;
import org.phasewright.runtime.model.MathFunction;

/**
 * Expressions call known functions with the right number of arguments, refer only to what their place allows, and
 * params and lets do not depend on themselves.
 */
public class ExpressionChecks extends PhaseCheckBase {

    private static final String KNOWN_FUNCTIONS = Arrays.stream(MathFunction.values())
            .map(MathFunction::notationName).collect(Collectors.joining(", "));

    @Check
    public void knownFunctionWithArity(FunctionCall call) {
        Optional<MathFunction> function = MathFunction.byNotationName(call.getFunction());
        if (function.isEmpty()) {
            error("Unknown function '" + call.getFunction() + "'. Known functions: " + KNOWN_FUNCTIONS + ".", call,
                    PHASE.getFunctionCall_Function(), IssueCodes.UNKNOWN_FUNCTION, call.getFunction());
            return;
        }
        int expected = function.get().arity();
        int actual = call.getArguments().size();
        if (actual != expected) {
            error("Function '" + call.getFunction() + "' takes " + plural(expected, "argument") + ", not " + actual
                    + ".", call, PHASE.getFunctionCall_Function(), IssueCodes.WRONG_ARITY);
        }
    }

    /** Values that must be known before the run starts (params, start values, study settings) use params only. */
    @Check
    public void referenceAllowedHere(SymbolRef ref) {
        Symbol symbol = ref.getSymbol();
        // Index values and subscripts are integers fixed before the run; IndexChecks owns where they may appear.
        if (symbol == null || symbol.eIsProxy() || symbol instanceof IndexDecl || Families.inSubscript(ref)) {
            return;
        }
        EObject owner = ref;
        EObject top = ref;
        while (owner instanceof Expression) {
            top = owner;
            owner = owner.eContainer();
        }
        // The stop condition of a simulation is evaluated along the trajectory, so it may use states and lets.
        boolean stopCondition = top.eContainingFeature() == PHASE.getSimulateRequest_StopSurface()
                || top.eContainingFeature() == PHASE.getSimulateRequest_StopLevel();
        String place = stopCondition ? null : constantPlace(owner);
        if (place != null && !(symbol instanceof ParamDecl)) {
            error(place + " may use only params; '" + symbol.getName() + "' is " + PhaseModels.aKind(symbol)
                    + ".", ref, PHASE.getSymbolRef_Symbol(), IssueCodes.NOT_CONSTANT);
        } else if (owner instanceof StateMap && !(symbol instanceof StateDecl)) {
            error("A symmetry image may use only states; '" + symbol.getName() + "' is "
                    + PhaseModels.aKind(symbol) + ".", ref, PHASE.getSymbolRef_Symbol(), IssueCodes.NOT_CONSTANT);
        }
    }

    private static String constantPlace(EObject owner) {
        if (owner instanceof ParamDecl param) {
            return "The value of param '" + param.getName() + "'";
        }
        if (owner instanceof StateDecl state) {
            return "The initial value of state '" + state.getName() + "'";
        }
        if (owner instanceof SimulateRequest) {
            return "A simulation setting";
        }
        if (owner instanceof LyapunovRequest) {
            return "A Lyapunov setting";
        }
        if (owner instanceof FollowRequest) {
            return "A continuation bound";
        }
        if (owner instanceof SweepRequest) {
            return "A sweep setting";
        }
        if (owner instanceof GridSpan || owner instanceof LyapunovMapRequest || owner instanceof BasinsRequest) {
            return "A grid setting";
        }
        if (owner instanceof IndexDecl index) {
            return "The bounds of index '" + index.getName() + "'";
        }
        return null;
    }

    @Check
    public void noDefinitionCycles(PhaseModel model) {
        reportCycles(DependencyOrder.ofLets(model).cycles(), "let", IssueCodes.LET_CYCLE);
        reportCycles(DependencyOrder.ofParams(model).cycles(), "param", IssueCodes.PARAM_CYCLE);
    }

    private <T extends Symbol> void reportCycles(Map<T, List<T>> cycles, String kind, String code) {
        cycles.forEach((declaration, cycle) -> {
            String path = cycle.stream().map(Symbol::getName).collect(Collectors.joining(" -> "));
            error(capitalised(kind) + " '" + declaration.getName() + "' depends on itself: " + path + ".", declaration,
                    PHASE.getSymbol_Name(), code);
        });
    }

    @Check
    public void unusedParam(ParamDecl param) {
        PhaseModel model = (PhaseModel) param.eContainer();
        for (EObject member : model.getMembers()) {
            if (member != param && PhaseModels.referencedSymbols(member).contains(param)) {
                return;
            }
        }
        warning("Param '" + param.getName() + "' is never used.", param, PHASE.getSymbol_Name(),
                IssueCodes.UNUSED_PARAM, param.getName());
    }

    static String plural(int count, String word) {
        return count + " " + word + (count == 1 ? "" : "s");
    }

    private static String capitalised(String word) {
        return Character.toUpperCase(word.charAt(0)) + word.substring(1);
    }

}
