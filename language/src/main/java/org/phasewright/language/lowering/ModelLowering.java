package org.phasewright.language.lowering;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.phasewright.language.ast.DependencyOrder;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.Analysis;
import org.phasewright.language.phase.EquilibriaRequest;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.FollowRequest;
import org.phasewright.language.phase.LetDecl;
import org.phasewright.language.phase.LyapunovRequest;
import org.phasewright.language.phase.SectionRequest;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.RateDecl;
import org.phasewright.language.phase.SimulateRequest;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StateMap;
import org.phasewright.language.phase.StudyDecl;
import org.phasewright.language.phase.SweepRequest;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.SymmetryDecl;
import org.phasewright.language.phase.TimeDecl;
import org.phasewright.language.phase.UnitExpr;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.EquilibriumContinuation;
import org.phasewright.runtime.model.EquilibriumSearch;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.IntegrationMethod;
import org.phasewright.runtime.model.LyapunovExponents;
import org.phasewright.runtime.model.Parameter;
import org.phasewright.runtime.model.ParameterSweep;
import org.phasewright.runtime.model.ParameterRange;
import org.phasewright.runtime.model.Section;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.model.StateVariable;
import org.phasewright.runtime.model.StopCondition;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.model.Symmetry;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/**
 * Lowers a checked AST into the runtime {@link DynamicalModel}. Call it only on a model without validation errors;
 * otherwise it throws {@link LoweringException}.
 */
public final class ModelLowering {

    public DynamicalModel lower(PhaseModel model) {
        Map<Symbol, Variable> variables = new HashMap<>();
        List<StateDecl> stateDecls = PhaseModels.states(model);
        List<ParamDecl> paramDecls = PhaseModels.params(model);
        List<LetDecl> letDecls = orderedLets(model);
        List<TimeDecl> timeDecls = PhaseModels.timeDecls(model);
        for (int i = 0; i < stateDecls.size(); i++) {
            variables.put(stateDecls.get(i), new Variable(VariableKind.STATE, i, stateDecls.get(i).getName()));
        }
        for (int i = 0; i < paramDecls.size(); i++) {
            variables.put(paramDecls.get(i), new Variable(VariableKind.PARAMETER, i, paramDecls.get(i).getName()));
        }
        for (int i = 0; i < letDecls.size(); i++) {
            variables.put(letDecls.get(i), new Variable(VariableKind.DERIVED, i, letDecls.get(i).getName()));
        }
        TimeAxis time = TimeAxis.DEFAULT;
        if (!timeDecls.isEmpty()) {
            TimeDecl decl = timeDecls.get(0);
            time = new TimeAxis(decl.getName(), unitText(decl.getUnit()));
            variables.put(decl, new Variable(VariableKind.TIME, 0, decl.getName()));
        }
        ExpressionLowering expressions = new ExpressionLowering(variables);

        List<StateVariable> states = new ArrayList<>();
        for (StateDecl state : stateDecls) {
            states.add(new StateVariable(state.getName(), expressions.lower(state.getInitial()),
                    unitText(state.getUnit()), state.getDescription()));
        }
        List<Parameter> parameters = new ArrayList<>();
        for (ParamDecl param : paramDecls) {
            ParameterRange range = param.getLow() == null ? null
                    : new ParameterRange(expressions.lower(param.getLow()), expressions.lower(param.getHigh()));
            parameters.add(new Parameter(param.getName(), expressions.lower(param.getValue()),
                    unitText(param.getUnit()), range, param.getDescription()));
        }
        List<DerivedQuantity> derived = new ArrayList<>();
        for (LetDecl let : letDecls) {
            derived.add(new DerivedQuantity(let.getName(), expressions.lower(let.getDefinition()),
                    unitText(let.getUnit())));
        }
        return new DynamicalModel(model.getName(), model.getTitle(), time, states, parameters, derived,
                rates(model, stateDecls, expressions), symmetries(model, stateDecls, variables, expressions),
                studies(model, expressions));
    }

    private static List<LetDecl> orderedLets(PhaseModel model) {
        DependencyOrder<LetDecl> order = DependencyOrder.ofLets(model);
        if (!order.cycles().isEmpty()) {
            throw new LoweringException("the let quantities depend on each other in a cycle");
        }
        return order.ordered();
    }

    private static List<Expr> rates(PhaseModel model, List<StateDecl> states, ExpressionLowering expressions) {
        Map<Symbol, Expr> byState = new HashMap<>();
        for (RateDecl rate : PhaseModels.rates(model)) {
            if (byState.put(rate.getTarget(), expressions.lower(rate.getLaw())) != null) {
                throw new LoweringException("two rates for state " + rate.getTarget().getName());
            }
        }
        List<Expr> rates = new ArrayList<>();
        for (StateDecl state : states) {
            Expr rate = byState.get(state);
            if (rate == null) {
                throw new LoweringException("state " + state.getName() + " has no rate");
            }
            rates.add(rate);
        }
        return rates;
    }

    private static List<Symmetry> symmetries(PhaseModel model, List<StateDecl> states, Map<Symbol, Variable> variables,
            ExpressionLowering expressions) {
        List<Symmetry> symmetries = new ArrayList<>();
        for (SymmetryDecl decl : PhaseModels.symmetries(model)) {
            List<Expr> images = new ArrayList<>();
            for (StateDecl state : states) {
                images.add(variables.get(state));
            }
            for (StateMap map : decl.getMaps()) {
                int index = states.indexOf(map.getState());
                if (index < 0) {
                    throw new LoweringException("symmetry " + decl.getName() + " maps something that is not a state");
                }
                images.set(index, expressions.lower(map.getImage()));
            }
            symmetries.add(new Symmetry(decl.getName(), images, decl.isReversesTime()));
        }
        return symmetries;
    }

    private static List<Study> studies(PhaseModel model, ExpressionLowering expressions) {
        List<Study> studies = new ArrayList<>();
        for (StudyDecl decl : PhaseModels.studies(model)) {
            List<org.phasewright.runtime.model.Analysis> analyses = new ArrayList<>();
            for (Analysis analysis : decl.getAnalyses()) {
                if (analysis instanceof SimulateRequest simulate) {
                    List<Expr> start = new ArrayList<>();
                    for (Expression component : simulate.getStart()) {
                        start.add(expressions.lower(component));
                    }
                    Expr tolerance = simulate.getTolerance() == null ? null : expressions.lower(simulate.getTolerance());
                    analyses.add(new Simulation(expressions.lower(simulate.getEnd()), start, tolerance,
                            method(simulate.getMethod()), stop(simulate, expressions)));
                } else if (analysis instanceof EquilibriaRequest) {
                    analyses.add(new EquilibriumSearch());
                } else if (analysis instanceof SectionRequest section) {
                    analyses.add(section(section, expressions));
                } else if (analysis instanceof LyapunovRequest lyapunov) {
                    analyses.add(new LyapunovExponents(expressions.lower(lyapunov.getEnd()),
                            lyapunov.getTolerance() == null ? null : expressions.lower(lyapunov.getTolerance())));
                } else if (analysis instanceof FollowRequest follow) {
                    analyses.add(follow(model, follow, expressions));
                } else if (analysis instanceof SweepRequest sweep) {
                    analyses.add(sweep(model, sweep, expressions));
                }
            }
            studies.add(new Study(decl.getName(), analyses));
        }
        return studies;
    }

    /** `follow equilibria in PARAM from A to B`: the param becomes a PARAMETER variable by its position. */
    private static EquilibriumContinuation follow(PhaseModel model, FollowRequest follow,
            ExpressionLowering expressions) {
        int index = PhaseModels.params(model).indexOf(follow.getParameter());
        if (index < 0) {
            throw new LoweringException("follow equilibria varies something that is not a param");
        }
        return new EquilibriumContinuation(new Variable(VariableKind.PARAMETER, index, follow.getParameter().getName()),
                expressions.lower(follow.getStart()), expressions.lower(follow.getEnd()));
    }

    /** `sweep PARAM from A to B steps N until T = END`. */
    private static ParameterSweep sweep(PhaseModel model, SweepRequest sweep, ExpressionLowering expressions) {
        int index = PhaseModels.params(model).indexOf(sweep.getParameter());
        if (index < 0) {
            throw new LoweringException("sweep varies something that is not a param");
        }
        return new ParameterSweep(new Variable(VariableKind.PARAMETER, index, sweep.getParameter().getName()),
                expressions.lower(sweep.getStart()), expressions.lower(sweep.getEnd()), sweep.getSteps(),
                expressions.lower(sweep.getDuration()));
    }

    /** The surface is written as `left = right`; the runtime looks for zeros of left - right. */
    private static Section section(SectionRequest request, ExpressionLowering expressions) {
        Expr surface = surface(request.getSurface(), request.getLevel(), expressions);
        Section.Crossing direction = request.isRising() ? Section.Crossing.RISING
                : request.isFalling() ? Section.Crossing.FALLING : Section.Crossing.BOTH;
        return new Section(surface, direction, expressions.lower(request.getEnd()),
                request.getTolerance() == null ? null : expressions.lower(request.getTolerance()),
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
        Expr left = expressions.lower(leftSide);
        Expr right = expressions.lower(rightSide);
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
