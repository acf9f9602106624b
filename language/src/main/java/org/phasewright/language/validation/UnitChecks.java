package org.phasewright.language.validation;

import java.util.Optional;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.validation.Check;
import org.phasewright.language.ast.Families;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.lowering.FlatLayout;
import org.phasewright.language.lowering.LoweringException;
import org.phasewright.language.phase.BasinsRequest;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.GridSpan;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.LyapunovMapRequest;
import org.phasewright.language.phase.LyapunovRequest;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.RateDecl;
import org.phasewright.language.phase.SectionRequest;
import org.phasewright.language.phase.SimulateRequest;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StateMap;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.UnitFactor;
import org.phasewright.language.units.DimensionInference.Inferred;
import org.phasewright.language.units.DimensionInference;
import org.phasewright.runtime.units.Dimension;
import org.phasewright.runtime.units.UnitCatalogue;

/**
 * Units name known units, and dimensions agree: terms of sums, function arguments, exponents, rates against
 * (state unit)/(time unit), values and range bounds against their declared unit. Quantities without a unit are not
 * checked; see {@link DimensionInference} for the rules.
 */
public class UnitChecks extends PhaseCheckBase {

    @Check
    public void knownUnit(UnitFactor factor) {
        if (factor.getGroup() != null) {
            return;
        }
        if (factor.getName() == null) {
            if (factor.getOne() != 1) {
                error("Only `1` may stand for a dimensionless unit; write a unit name such as m or s.", factor,
                        PHASE.getUnitFactor_One(), IssueCodes.UNKNOWN_UNIT);
            }
            return;
        }
        if (UnitCatalogue.lookup(factor.getName()).isEmpty()) {
            error("Unknown unit '" + factor.getName() + "'. Known units include " + String.join(", ",
                    UnitCatalogue.examples()) + ".", factor, PHASE.getUnitFactor_Name(), IssueCodes.UNKNOWN_UNIT,
                    factor.getName());
        }
    }

    @Check
    public void paramValueAndRange(ParamDecl param) {
        Optional<Dimension> declared = declared(param);
        value(param.getValue(), declared, "Param '" + param.getName() + "'", IssueCodes.WRONG_VALUE_DIMENSION);
        for (Expression listed : param.getValues()) {
            value(listed, declared, "Table '" + param.getName() + "'", IssueCodes.WRONG_VALUE_DIMENSION);
        }
        for (Expression bound : new Expression[] { param.getLow(), param.getHigh() }) {
            value(bound, declared, "The range of param '" + param.getName() + "'", IssueCodes.WRONG_RANGE_DIMENSION);
        }
    }

    @Check
    public void stateInitialValue(StateDecl state) {
        value(state.getInitial(), declared(state), "State '" + state.getName() + "'", IssueCodes.WRONG_VALUE_DIMENSION);
    }

    @Check
    public void letDefinition(LetDecl let) {
        value(let.getDefinition(), declared(let), "Let '" + let.getName() + "'", IssueCodes.WRONG_VALUE_DIMENSION);
    }

    @Check
    public void rateDimension(RateDecl rate) {
        Inferred law = inferAndReport(rate.getLaw());
        Symbol target = rate.getTarget();
        if (!(target instanceof StateDecl state) || !law.known() || law.numeric()) {
            return;
        }
        Optional<Dimension> stateDimension = inference(rate).ofSymbol(state);
        Optional<Dimension> time = inference(rate).timeDimension();
        if (stateDimension.isEmpty() || time.isEmpty()) {
            return;
        }
        Dimension expected = stateDimension.get().dividedBy(time.get());
        if (!expected.equals(law.dimension())) {
            error("The rate of '" + state.getName() + "' must be in " + expected + " (unit of " + state.getName()
                    + " over unit of " + PhaseModels.timeName(model(rate)) + ") but " + DimensionInference.quote(
                            rate.getLaw()) + " is " + law.dimension() + ".", rate.getLaw(), null,
                    IssueCodes.WRONG_RATE_DIMENSION);
        }
    }

    @Check
    public void simulationSettings(SimulateRequest simulate) {
        value(simulate.getEnd(), inference(simulate).timeDimension(), "The end time",
                IssueCodes.WRONG_VALUE_DIMENSION);
        // Start values are per flat element (a family takes one per index value), so position i is mapped
        // through the flat layout; without a layout (unknown range, let cycle) the start values are not checked.
        FlatLayout layout;
        try {
            layout = FlatLayout.of(model(simulate), constants(simulate));
        } catch (LoweringException unknown) {
            layout = null;
        }
        for (int i = 0; i < simulate.getStart().size(); i++) {
            StateDecl state = layout != null && i < layout.dimension() ? layout.stateAt(i) : null;
            Optional<Dimension> expected = state != null ? inference(simulate).ofSymbol(state) : Optional.empty();
            value(simulate.getStart().get(i), expected, "The start value of '" + (state != null ? state.getName()
                    : "?") + "'", IssueCodes.WRONG_VALUE_DIMENSION);
        }
        value(simulate.getTolerance(), Optional.of(Dimension.NONE), "The tolerance", IssueCodes.WRONG_VALUE_DIMENSION);
    }

    /** A Poincaré section compares two quantities of one dimension; its end time is in the time unit. */
    @Check
    public void sectionSettings(SectionRequest section) {
        Inferred surface = inferAndReport(section.getSurface());
        value(section.getLevel(), Optional.ofNullable(surface.numeric() ? null : surface.dimension()),
                "The section surface " + (section.getSurface() == null ? "" : DimensionInference.quote(
                        section.getSurface())), IssueCodes.WRONG_VALUE_DIMENSION);
        value(section.getEnd(), inference(section).timeDimension(), "The end time", IssueCodes.WRONG_VALUE_DIMENSION);
        value(section.getTolerance(), Optional.of(Dimension.NONE), "The tolerance", IssueCodes.WRONG_VALUE_DIMENSION);
    }

    @Check
    public void lyapunovSettings(LyapunovRequest lyapunov) {
        value(lyapunov.getEnd(), inference(lyapunov).timeDimension(), "The end time",
                IssueCodes.WRONG_VALUE_DIMENSION);
        value(lyapunov.getTolerance(), Optional.of(Dimension.NONE), "The tolerance",
                IssueCodes.WRONG_VALUE_DIMENSION);
    }

    @Check
    public void lyapunovMapSettings(LyapunovMapRequest map) {
        grid(map.getFirst(), map.getSecond(), map.getEnd(), map.getTolerance());
    }

    @Check
    public void basinsSettings(BasinsRequest basins) {
        grid(basins.getFirst(), basins.getSecond(), basins.getEnd(), basins.getTolerance());
    }

    /** Grid ends are values of the quantity varied; the end time is in the time unit. */
    private void grid(GridSpan first, GridSpan second, Expression end, Expression tolerance) {
        for (GridSpan span : new GridSpan[] { first, second }) {
            if (span == null || span.getVariable() == null) {
                continue;
            }
            Optional<Dimension> expected = inference(span).ofSymbol(span.getVariable());
            String what = "The grid of '" + span.getVariable().getName() + "'";
            value(span.getFrom(), expected, what, IssueCodes.WRONG_VALUE_DIMENSION);
            value(span.getTo(), expected, what, IssueCodes.WRONG_VALUE_DIMENSION);
        }
        if (end != null) {
            value(end, inference(end).timeDimension(), "The end time", IssueCodes.WRONG_VALUE_DIMENSION);
        }
        value(tolerance, Optional.of(Dimension.NONE), "The tolerance", IssueCodes.WRONG_VALUE_DIMENSION);
    }

    /** The image of a state under a symmetry has that state's dimension. */
    @Check
    public void symmetryImage(StateMap map) {
        Optional<Dimension> expected = map.getState() instanceof StateDecl state ? inference(map).ofSymbol(state)
                : Optional.empty();
        value(map.getImage(), expected, "The image of '" + (map.getState() == null ? "?" : map.getState().getName())
                + "'", IssueCodes.WRONG_VALUE_DIMENSION);
    }

    /** Checks inside {@code value}, then that a known, non-numeric dimension matches the declared one. */
    private void value(Expression value, Optional<Dimension> declared, String what, String code) {
        if (value == null) {
            return;
        }
        Inferred inferred = inferAndReport(value);
        if (declared.isPresent() && inferred.known() && !inferred.numeric()
                && !declared.get().equals(inferred.dimension())) {
            error(what + " is in " + declared.get() + " but " + DimensionInference.quote(value) + " is "
                    + inferred.dimension() + ".", value, null, code);
        }
    }

    private Inferred inferAndReport(Expression expression) {
        return inference(expression).infer(expression, problem -> error(problem.message(), problem.node(),
                (EStructuralFeature) null, switch (problem.kind()) {
                    case UNLIKE_SUM -> IssueCodes.UNLIKE_DIMENSIONS;
                    case DIMENSIONED_ARGUMENT -> IssueCodes.DIMENSIONED_ARGUMENT;
                    case BAD_EXPONENT -> IssueCodes.BAD_EXPONENT;
                }));
    }

    private Optional<Dimension> declared(Symbol symbol) {
        return Families.unitOf(symbol) == null ? Optional.empty() : inference(symbol).ofSymbol(symbol);
    }

    private static PhaseModel model(EObject inside) {
        return EcoreUtil2.getContainerOfType(inside, PhaseModel.class);
    }

    private DimensionInference inference(EObject inside) {
        PhaseModel model = model(inside);
        // One inference per validation run: it caches the dimensions of lets.
        return (DimensionInference) getContext().computeIfAbsent(DimensionInference.class,
                key -> DimensionInference.of(model));
    }
}
