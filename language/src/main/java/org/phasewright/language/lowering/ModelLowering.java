package org.phasewright.language.lowering;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.Analysis;
import org.phasewright.language.phase.BasinsRequest;
import org.phasewright.language.phase.EquilibriaRequest;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.FollowRequest;
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
import org.phasewright.language.phase.StudyDecl;
import org.phasewright.language.phase.SweepRequest;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.SymmetryDecl;
import org.phasewright.language.phase.TimeDecl;
import org.phasewright.language.phase.UnitExpr;
import org.phasewright.runtime.assemble.ModelAssembler;
import org.phasewright.runtime.model.Basins;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.EquilibriumContinuation;
import org.phasewright.runtime.model.EquilibriumSearch;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.GridAxis;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IntegrationMethod;
import org.phasewright.runtime.model.LyapunovExponents;
import org.phasewright.runtime.model.LyapunovMap;
import org.phasewright.runtime.model.ParameterRange;
import org.phasewright.runtime.model.ParameterSweep;
import org.phasewright.runtime.model.Section;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.model.StopCondition;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.model.Symmetry;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.IndexExpansion;

/**
 * Lowers a checked AST into the runtime {@link DynamicalModel}. Call it only on a model without validation errors;
 * otherwise it throws {@link LoweringException}.
 */
public final class ModelLowering {

    public DynamicalModel lower(PhaseModel model) {
        ConstantValues constants;
        FlatLayout layout;
        try {
            constants = ConstantValues.of(model);
            layout = FlatLayout.of(model, constants);
        } catch (IllegalArgumentException | IndexOutOfBoundsException | NullPointerException broken) {
            throw new LoweringException("the model cannot be lowered: " + broken.getMessage());
        }
        return lower(model, constants, layout);
    }

    /** As {@link #lower(PhaseModel)}, with the constants and layout the caller already built from {@code model}. */
    public DynamicalModel lower(PhaseModel model, ConstantValues constants, FlatLayout layout) {
        try {
            return assemble(model, constants, layout);
        } catch (IllegalArgumentException | IndexOutOfBoundsException | NullPointerException broken) {
            // Only a model with validation errors gets here (the assembler refuses what the validator rejects).
            throw new LoweringException("the model cannot be lowered: " + broken.getMessage());
        }
    }

    private DynamicalModel assemble(PhaseModel model, ConstantValues constants, FlatLayout layout) {
        Map<Symbol, Variable> variables = new HashMap<>();
        Map<Symbol, Family> families = new HashMap<>();
        List<StateDecl> stateDecls = PhaseModels.states(model);
        List<ParamDecl> paramDecls = PhaseModels.params(model);
        List<LetDecl> letDecls = layout.orderedLets();
        List<Symbol> declared = new ArrayList<>(stateDecls);
        declared.addAll(paramDecls);
        declared.addAll(letDecls);
        for (Symbol symbol : declared) {
            FlatLayout.Place place = layout.place(symbol);
            if (place.range() == null) {
                variables.put(symbol, new Variable(place.kind(), place.offset(), symbol.getName()));
            } else {
                families.put(symbol, new Family(place.kind(), symbol.getName(), place.range(), place.offset(), null));
            }
        }
        TimeAxis time = TimeAxis.DEFAULT;
        List<TimeDecl> timeDecls = PhaseModels.timeDecls(model);
        if (!timeDecls.isEmpty()) {
            TimeDecl decl = timeDecls.get(0);
            time = new TimeAxis(decl.getName(), unitText(decl.getUnit()));
            variables.put(decl, new Variable(VariableKind.TIME, 0, decl.getName()));
        }
        ExpressionLowering expressions = new ExpressionLowering(variables, families, layout::range,
                constants::evaluate);

        ModelAssembler assembler = new ModelAssembler(model.getName(), model.getTitle(), time);
        for (StateDecl state : stateDecls) {
            String unit = unitText(state.getUnit());
            if (state.getIndex() == null) {
                same(variables.get(state), assembler.state(state.getName(), expressions.lower(state.getInitial()), unit,
                        state.getDescription()));
            } else {
                same(families.get(state), assembler.stateFamily(state.getName(),
                        layout.range(state.getIndex()), expressions.lower(state.getInitial()), unit,
                        state.getDescription()));
            }
        }
        for (ParamDecl param : paramDecls) {
            String unit = unitText(param.getUnit());
            if (param.getIndex() == null) {
                ParameterRange range = param.getLow() == null ? null
                        : new ParameterRange(expressions.lowerScalar(param.getLow()),
                                expressions.lowerScalar(param.getHigh()));
                same(variables.get(param), assembler.parameter(param.getName(), expressions.lower(param.getValue()),
                        unit, range, param.getDescription()));
            } else if (param.isListed()) {
                List<Expr> values = new ArrayList<>();
                for (Expression value : param.getValues()) {
                    values.add(expressions.lower(value));
                }
                // A wrong count is reported by IndexChecks; parameterTable refuses it too (a LoweringException here).
                same(families.get(param), assembler.parameterTable(param.getName(), layout.range(param.getIndex()),
                        values, unit, param.getDescription()));
            } else {
                same(families.get(param), assembler.parameterFamily(param.getName(), layout.range(param.getIndex()),
                        expressions.lower(param.getValue()), unit, param.getDescription()));
            }
        }
        for (LetDecl let : letDecls) {
            String unit = unitText(let.getUnit());
            if (let.getIndex() == null) {
                same(variables.get(let), assembler.derived(let.getName(), expressions.lower(let.getDefinition()),
                        unit));
            } else {
                same(families.get(let), assembler.derivedFamily(let.getName(), layout.range(let.getIndex()),
                        expressions.lower(let.getDefinition()), unit));
            }
        }
        rates(model, assembler, variables, families, expressions);
        return assembler.build(symmetries(model, assembler, layout, expressions), studies(model, layout, expressions));
    }

    /** The layout computed up front and the assembler must agree on every place; a mismatch is a bug here. */
    private static Variable same(Variable planned, Variable declared) {
        if (planned == null || planned.index() != declared.index()) {
            throw new LoweringException("internal: " + declared.name() + " landed at an unexpected place");
        }
        return declared;
    }

    private static Family same(Family planned, Family declared) {
        if (planned == null || planned.offset() != declared.offset() || planned.size() != declared.size()) {
            throw new LoweringException("internal: family " + declared.name() + " landed at an unexpected place");
        }
        return declared;
    }

    private static void rates(PhaseModel model, ModelAssembler assembler, Map<Symbol, Variable> variables,
            Map<Symbol, Family> families, ExpressionLowering expressions) {
        Set<Symbol> given = new HashSet<>();
        for (RateDecl rate : PhaseModels.rates(model)) {
            Symbol target = rate.getTarget();
            if (!(target instanceof StateDecl state)) {
                throw new LoweringException("a rate of something that is not a state");
            }
            if (!given.add(target)) {
                throw new LoweringException("two rates for state " + target.getName());
            }
            Expr law = expressions.lower(rate.getLaw());
            if (state.getIndex() == null) {
                assembler.rate(variables.get(state), law);
            } else {
                if (rate.getIndex() != state.getIndex()) {
                    throw new LoweringException("the rate of " + state.getName() + " uses another index");
                }
                assembler.familyRate(families.get(state), law);
            }
        }
        for (StateDecl state : PhaseModels.states(model)) {
            if (!given.contains(state)) {
                throw new LoweringException("state " + state.getName() + " has no rate");
            }
        }
    }

    private static List<Symmetry> symmetries(PhaseModel model, ModelAssembler assembler, FlatLayout layout,
            ExpressionLowering expressions) {
        List<Symmetry> symmetries = new ArrayList<>();
        for (SymmetryDecl decl : PhaseModels.symmetries(model)) {
            Map<Integer, Expr> scalarImages = new HashMap<>();
            Map<String, Expr> familyImages = new HashMap<>();
            for (StateMap map : decl.getMaps()) {
                if (!(map.getState() instanceof StateDecl state)) {
                    throw new LoweringException("symmetry " + decl.getName() + " maps something that is not a state");
                }
                Expr image = expressions.lower(map.getImage());
                if (state.getIndex() == null) {
                    scalarImages.put(layout.place(state).offset(), IndexExpansion.expand(image, Map.of()));
                } else {
                    if (map.getIndex() != state.getIndex()) {
                        throw new LoweringException("symmetry " + decl.getName() + " maps " + state.getName()
                                + " over another index");
                    }
                    familyImages.put(state.getName(), image);
                }
            }
            symmetries.add(assembler.symmetry(decl.getName(), scalarImages, familyImages, decl.isReversesTime()));
        }
        return symmetries;
    }

    private static List<Study> studies(PhaseModel model, FlatLayout layout, ExpressionLowering expressions) {
        List<Study> studies = new ArrayList<>();
        for (StudyDecl decl : PhaseModels.studies(model)) {
            List<org.phasewright.runtime.model.Analysis> analyses = new ArrayList<>();
            for (Analysis analysis : decl.getAnalyses()) {
                if (analysis instanceof SimulateRequest simulate) {
                    List<Expr> start = new ArrayList<>();
                    for (Expression component : simulate.getStart()) {
                        start.add(expressions.lowerScalar(component));
                    }
                    Expr tolerance = optional(simulate.getTolerance(), expressions);
                    analyses.add(new Simulation(expressions.lowerScalar(simulate.getEnd()), start, tolerance,
                            method(simulate.getMethod()), stop(simulate, expressions)));
                } else if (analysis instanceof EquilibriaRequest) {
                    analyses.add(new EquilibriumSearch());
                } else if (analysis instanceof SectionRequest section) {
                    analyses.add(section(section, expressions));
                } else if (analysis instanceof LyapunovRequest lyapunov) {
                    analyses.add(new LyapunovExponents(expressions.lowerScalar(lyapunov.getEnd()),
                            optional(lyapunov.getTolerance(), expressions), lyapunov.getLeading()));
                } else if (analysis instanceof LyapunovMapRequest map) {
                    analyses.add(new LyapunovMap(axis(map.getFirst(), VariableKind.PARAMETER, layout, expressions),
                            axis(map.getSecond(), VariableKind.PARAMETER, layout, expressions),
                            expressions.lowerScalar(map.getEnd()), optional(map.getTolerance(), expressions)));
                } else if (analysis instanceof BasinsRequest basins) {
                    analyses.add(new Basins(axis(basins.getFirst(), VariableKind.STATE, layout, expressions),
                            axis(basins.getSecond(), VariableKind.STATE, layout, expressions),
                            expressions.lowerScalar(basins.getEnd()), optional(basins.getTolerance(), expressions)));
                } else if (analysis instanceof FollowRequest follow) {
                    analyses.add(follow(follow, layout, expressions));
                } else if (analysis instanceof SweepRequest sweep) {
                    analyses.add(sweep(sweep, layout, expressions));
                }
            }
            studies.add(new Study(decl.getName(), analyses));
        }
        return studies;
    }

    /** `follow equilibria in PARAM from A to B`: the param becomes a PARAMETER variable by its flat position. */
    private static EquilibriumContinuation follow(FollowRequest follow, FlatLayout layout,
            ExpressionLowering expressions) {
        return new EquilibriumContinuation(scalar(follow.getParameter(), VariableKind.PARAMETER, layout),
                expressions.lowerScalar(follow.getStart()), expressions.lowerScalar(follow.getEnd()));
    }

    /** `sweep PARAM from A to B steps N until T = END`. */
    private static ParameterSweep sweep(SweepRequest sweep, FlatLayout layout, ExpressionLowering expressions) {
        return new ParameterSweep(scalar(sweep.getParameter(), VariableKind.PARAMETER, layout),
                expressions.lowerScalar(sweep.getStart()), expressions.lowerScalar(sweep.getEnd()), sweep.getSteps(),
                expressions.lowerScalar(sweep.getDuration()));
    }

    /** `NAME from A to B steps K` of a grid over params or over initial values of states. */
    private static GridAxis axis(GridSpan span, VariableKind kind, FlatLayout layout,
            ExpressionLowering expressions) {
        return new GridAxis(scalar(span.getVariable(), kind, layout), expressions.lowerScalar(span.getFrom()),
                expressions.lowerScalar(span.getTo()), span.getSteps());
    }

    /** The runtime variable of a scalar param or state that a study varies. */
    private static Variable scalar(Symbol symbol, VariableKind kind, FlatLayout layout) {
        FlatLayout.Place place = symbol == null ? null : layout.place(symbol);
        if (place == null || place.kind() != kind || place.range() != null) {
            throw new LoweringException("a study varies something that is not a scalar "
                    + (kind == VariableKind.STATE ? "state" : "param"));
        }
        return new Variable(kind, place.offset(), symbol.getName());
    }

    private static Expr optional(Expression expression, ExpressionLowering expressions) {
        return expression == null ? null : expressions.lowerScalar(expression);
    }

    /** The surface is written as `left = right`; the runtime looks for zeros of left - right. */
    private static Section section(SectionRequest request, ExpressionLowering expressions) {
        Expr surface = surface(request.getSurface(), request.getLevel(), expressions);
        Section.Crossing direction = request.isRising() ? Section.Crossing.RISING
                : request.isFalling() ? Section.Crossing.FALLING : Section.Crossing.BOTH;
        return new Section(surface, direction, expressions.lowerScalar(request.getEnd()),
                optional(request.getTolerance(), expressions),
                method(request.getMethod()));
    }

    /** `until LEFT = RIGHT [rising|falling]`, or null. */
    private static StopCondition stop(SimulateRequest simulate, ExpressionLowering expressions) {
        if (simulate.getStopSurface() == null) {
            return null;
        }
        return new StopCondition(surface(simulate.getStopSurface(), simulate.getStopLevel(), expressions),
                simulate.isStopRising() ? Section.Crossing.RISING
                        : simulate.isStopFalling() ? Section.Crossing.FALLING : Section.Crossing.BOTH);
    }

    private static Expr surface(Expression leftSide, Expression rightSide, ExpressionLowering expressions) {
        Expr left = expressions.lowerScalar(leftSide);
        Expr right = expressions.lowerScalar(rightSide);
        return right instanceof Constant c && c.value() == 0 ? left : new Binary(BinaryOperator.SUBTRACT, left, right);
    }

    private static IntegrationMethod method(org.phasewright.language.phase.IntegrationMethod method) {
        return switch (method) {
            case HIGH_ORDER -> IntegrationMethod.HIGH_ORDER;
            case STIFF -> IntegrationMethod.STIFF;
            default -> IntegrationMethod.EXPLICIT;
        };
    }

    /** The unit as written, with white space normalised, or null. Checking units is the units validator's job. */
    static String unitText(UnitExpr unit) {
        if (unit == null) {
            return null;
        }
        String text = NodeModelUtils.getTokenText(NodeModelUtils.getNode(unit));
        return text == null ? null : text.replace(" ", "");
    }
}
