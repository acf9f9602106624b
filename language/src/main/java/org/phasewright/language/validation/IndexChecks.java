package org.phasewright.language.validation;

import java.util.OptionalDouble;

import org.eclipse.emf.common.util.TreeIterator;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.validation.Check;
import org.phasewright.language.ast.Families;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.lowering.ConstantValues;
import org.phasewright.language.lowering.IndexRanges;
import org.phasewright.language.phase.BinaryExpr;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.FunctionCall;
import org.phasewright.language.phase.IndexDecl;
import org.phasewright.language.phase.Negation;
import org.phasewright.language.phase.NumberLiteral;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.RateDecl;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StateMap;
import org.phasewright.language.phase.SumExpr;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.SymbolRef;
import org.phasewright.language.units.DimensionInference;

/**
 * Indexed families are well formed: index ranges are non-empty integer constants of sensible size, families are
 * used element by element and scalars without subscripts, an index has a value only where a family formula or a
 * sum binds it, subscripts are integer arithmetic, a family's rate and symmetry map use its own index, and listed
 * tables have one value per index value.
 */
public class IndexChecks extends PhaseCheckBase {

    private static final String ALLOWED = "an index may use only indices, whole numbers and integer params, "
            + "combined with +, - and * (and parentheses)";

    @Check
    public void indexRange(IndexDecl index) {
        if (!index.isCyclic() && !index.isBounded()) {
            error("Say how index '" + index.getName() + "' treats its ends: `cyclic` (wraps around) or `bounded` "
                    + "(elements outside read as 0), e.g. `index " + index.getName() + " in 1 .. N cyclic`.", index,
                    PHASE.getSymbol_Name(), IssueCodes.INDEX_KIND_MISSING);
        }
        ConstantValues constants = constants(index);
        OptionalDouble lower = bound(index.getLower(), constants);
        OptionalDouble upper = bound(index.getUpper(), constants);
        if (lower.isEmpty() || upper.isEmpty()) {
            return;
        }
        long size = IndexRanges.size(index, constants).getAsLong();
        if (size < 1) {
            error("Index '" + index.getName() + "' runs from " + (long) lower.getAsDouble() + " to "
                    + (long) upper.getAsDouble() + " and has no values; the upper bound must be at least the lower.",
                    index, PHASE.getIndexDecl_Upper(), IssueCodes.EMPTY_INDEX);
        } else if (size > IndexRanges.MAX_SIZE) {
            error("Index '" + index.getName() + "' has " + size + " values; at most " + IndexRanges.MAX_SIZE
                    + " are allowed.", index, PHASE.getSymbol_Name(), IssueCodes.INDEX_TOO_LARGE);
        }
    }

    /** A bound's whole-number value; reports a bound that evaluates to something else. */
    private OptionalDouble bound(Expression bound, ConstantValues constants) {
        if (bound == null) {
            return OptionalDouble.empty();
        }
        OptionalDouble whole = IndexRanges.bound(bound, constants);
        if (whole.isPresent()) {
            return whole;
        }
        OptionalDouble value = constants.evaluate(bound);
        boolean paramsOnly = PhaseModels.referencedSymbols(bound).stream().allMatch(s -> s instanceof ParamDecl);
        if (value.isPresent() || paramsOnly) { // other names are reported as not constant
            error("The bounds of an index must be whole numbers known before the run (literals and params); "
                    + DimensionInference.quote(bound) + (value.isPresent() ? " is " + ValueChecks.format(
                            value.getAsDouble()) : " cannot be evaluated") + ".", bound, null,
                    IssueCodes.BAD_INDEX_BOUND);
        }
        return OptionalDouble.empty();
    }

    @Check
    public void reference(SymbolRef ref) {
        Symbol symbol = ref.getSymbol();
        if (symbol == null || symbol.eIsProxy()) {
            return;
        }
        if (symbol instanceof IndexDecl index) {
            if (ref.getSubscript() != null) {
                error("'" + index.getName() + "' is an index; it has no elements, so write it without `[...]`.", ref,
                        PHASE.getSymbolRef_Subscript(), IssueCodes.SCALAR_WITH_INDEX);
            } else if (Families.binder(ref, index) == null) {
                error("Index '" + index.getName() + "' has a value only inside a formula over it: a family "
                        + "declaration such as `state x[" + index.getName() + "] = ...`, its rate `rate x["
                        + index.getName() + "] = ...`, a symmetry map `x[" + index.getName() + "] -> ...` or `sum("
                        + index.getName() + ", ...)`.", ref, PHASE.getSymbolRef_Symbol(), IssueCodes.INDEX_NOT_BOUND);
            }
            return;
        }
        IndexDecl family = Families.indexOf(symbol);
        if (family != null && ref.getSubscript() == null) {
            String name = family.eIsProxy() ? "i" : family.getName();
            error("'" + symbol.getName() + "' is a family over index " + name + "; write one element, such as `"
                    + symbol.getName() + "[" + name + "]`, or sum them with `sum(" + name + ", " + symbol.getName()
                    + "[" + name + "])`.", ref, PHASE.getSymbolRef_Symbol(), IssueCodes.FAMILY_WITHOUT_INDEX);
        } else if (family == null && ref.getSubscript() != null) {
            error("'" + symbol.getName() + "' is a single " + PhaseModels.kindWord(symbol) + ", not a family; write `"
                    + symbol.getName() + "` without `[...]`.", ref, PHASE.getSymbolRef_Subscript(),
                    IssueCodes.SCALAR_WITH_INDEX);
        } else if (family != null) {
            subscript(ref.getSubscript());
        }
    }

    /** Index arithmetic only; the first part that is not is marked. */
    private void subscript(Expression subscript) {
        TreeIterator<EObject> parts = EcoreUtil2.eAll(subscript);
        while (parts.hasNext()) {
            EObject part = parts.next();
            String problem = problem(part, constants(subscript));
            if (problem != null) {
                boolean operator = part instanceof BinaryExpr;
                error(capitalised(ALLOWED) + "; " + problem + ".", part,
                        operator ? PHASE.getBinaryExpr_Op() : null, IssueCodes.BAD_INDEX_EXPRESSION);
                return;
            }
        }
    }

    private static String problem(EObject part, ConstantValues constants) {
        if (part instanceof BinaryExpr binary) {
            String op = binary.getOp();
            return "+".equals(op) || "-".equals(op) || "*".equals(op) ? null : "'" + op + "' is not allowed";
        }
        if (part instanceof Negation) {
            return null;
        }
        if (part instanceof NumberLiteral number) {
            return number.getValue() == Math.rint(number.getValue()) ? null
                    : DimensionInference.quote(part) + " is not a whole number";
        }
        if (part instanceof SymbolRef ref) {
            Symbol symbol = ref.getSymbol();
            if (symbol == null || symbol.eIsProxy()) {
                return null; // the linker reports it
            }
            if (ref.getSubscript() != null) {
                return "'" + symbol.getName() + "[...]' is an element of a family";
            }
            if (symbol instanceof IndexDecl) {
                return null;
            }
            if (symbol instanceof ParamDecl param && param.getIndex() == null) {
                OptionalDouble value = constants.evaluate(ref);
                return value.isEmpty() || value.getAsDouble() == Math.rint(value.getAsDouble()) ? null
                        : "param '" + param.getName() + "' = " + ValueChecks.format(value.getAsDouble())
                                + " is not a whole number";
            }
            return "'" + symbol.getName() + "' is " + PhaseModels.aKind(symbol);
        }
        if (part instanceof FunctionCall call) {
            return "'" + call.getFunction() + "(...)' is a function";
        }
        if (part instanceof SumExpr) {
            return "a sum is not";
        }
        return DimensionInference.quote(part) + " is not";
    }

    @Check
    public void sumBindsAFreshIndex(SumExpr sum) {
        IndexDecl index = sum.getIndex();
        if (index == null || index.eIsProxy()) {
            return;
        }
        EObject outer = Families.binder(sum.eContainer(), index);
        if (outer != null) {
            error("Index '" + index.getName() + "' is already bound here by the " + (outer instanceof SumExpr
                    ? "enclosing sum" : "family formula on line " + NameChecks.line(outer)) + "; sum over another "
                    + "index (declare one with the same range, e.g. `index j in ...`).", sum,
                    PHASE.getSumExpr_Index(), IssueCodes.SUM_REBINDS_INDEX);
        }
    }

    @Check
    public void rateUsesTheFamilyIndex(RateDecl rate) {
        if (!(rate.getTarget() instanceof StateDecl state) || rate.getTarget().eIsProxy()) {
            return;
        }
        IndexDecl own = state.getIndex();
        if (own == null) {
            if (rate.getIndex() != null) {
                error("'" + state.getName() + "' is a single state, not a family; write `rate " + state.getName()
                        + " = ...`.", rate, PHASE.getRateDecl_Index(), IssueCodes.SCALAR_WITH_INDEX);
            }
        } else if (rate.getIndex() == null) {
            error("'" + state.getName() + "' is a family over index " + own.getName() + "; write `rate "
                    + state.getName() + "[" + own.getName() + "] = ...`.", rate, PHASE.getRateDecl_Target(),
                    IssueCodes.RATE_INDEX_MISMATCH, state.getName() + "[" + own.getName() + "]");
        } else if (rate.getIndex() != own && !rate.getIndex().eIsProxy()) {
            error("The rate of family '" + state.getName() + "' is written over the index it is declared with: `rate "
                    + state.getName() + "[" + own.getName() + "] = ...`, not over '" + rate.getIndex().getName()
                    + "'.", rate, PHASE.getRateDecl_Index(), IssueCodes.RATE_INDEX_MISMATCH,
                    state.getName() + "[" + own.getName() + "]");
        }
    }

    @Check
    public void mapUsesTheFamilyIndex(StateMap map) {
        if (!(map.getState() instanceof StateDecl state) || map.getState().eIsProxy()) {
            return;
        }
        IndexDecl own = state.getIndex();
        if (own == null) {
            if (map.getIndex() != null) {
                error("'" + state.getName() + "' is a single state, not a family; write `" + state.getName()
                        + " -> ...`.", map, PHASE.getStateMap_Index(), IssueCodes.SCALAR_WITH_INDEX);
            }
        } else if (map.getIndex() == null) {
            error("'" + state.getName() + "' is a family over index " + own.getName() + "; map its elements with `"
                    + state.getName() + "[" + own.getName() + "] -> ...`, e.g. `" + state.getName() + "["
                    + own.getName() + "] -> " + state.getName() + "[" + own.getName() + "+1]`.", map,
                    PHASE.getStateMap_State(), IssueCodes.MAP_INDEX_MISMATCH);
        } else if (map.getIndex() != own && !map.getIndex().eIsProxy()) {
            error("A symmetry maps family '" + state.getName() + "' over the index it is declared with: `"
                    + state.getName() + "[" + own.getName() + "] -> ...`, not over '" + map.getIndex().getName() + "'.",
                    map, PHASE.getStateMap_Index(), IssueCodes.MAP_INDEX_MISMATCH);
        }
    }

    @Check
    public void table(ParamDecl param) {
        IndexDecl index = param.getIndex();
        if (param.isListed() && index == null) {
            error("A listed table needs an index: `param " + param.getName() + "[i] = [...]` over a declared index i.",
                    param, PHASE.getParamDecl_Listed(), IssueCodes.LISTED_WITHOUT_INDEX);
            return;
        }
        if (index != null && param.getLow() != null) {
            error("A range belongs to a single param; table '" + param.getName() + "' cannot have one.", param,
                    PHASE.getParamDecl_Low(), IssueCodes.TABLE_WITH_RANGE);
        }
        if (!param.isListed() || index == null || index.eIsProxy()) {
            return;
        }
        ConstantValues constants = constants(param);
        OptionalDouble lower = IndexRanges.bound(index.getLower(), constants);
        OptionalDouble upper = IndexRanges.bound(index.getUpper(), constants);
        if (lower.isEmpty() || upper.isEmpty()) {
            return;
        }
        long size = IndexRanges.size(index, constants).getAsLong();
        int listed = param.getValues().size();
        if (size >= 1 && listed != size) {
            error("Table '" + param.getName() + "' lists " + ExpressionChecks.plural(listed, "value") + " but index "
                    + index.getName() + " has " + size + " (" + (long) lower.getAsDouble() + " .. "
                    + (long) upper.getAsDouble() + "); give exactly one value per index value.", param,
                    PHASE.getParamDecl_Listed(), IssueCodes.TABLE_SIZE_MISMATCH);
        }
    }

    private static String capitalised(String text) {
        return Character.toUpperCase(text.charAt(0)) + text.substring(1);
    }
}
