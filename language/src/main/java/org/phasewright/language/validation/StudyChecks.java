package org.phasewright.language.validation;

import java.util.OptionalLong;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.validation.Check;
import org.phasewright.language.ast.Families;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.lowering.ConstantValues;
import org.phasewright.language.lowering.IndexRanges;
import org.phasewright.language.phase.BasinsRequest;
import org.phasewright.language.phase.FollowRequest;
import org.phasewright.language.phase.GridSpan;
import org.phasewright.language.phase.IndexDecl;
import org.phasewright.language.phase.LyapunovMapRequest;
import org.phasewright.language.phase.LyapunovRequest;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.SectionRequest;
import org.phasewright.language.phase.SimulateRequest;
import org.phasewright.language.phase.StateDecl;
import org.phasewright.language.phase.StudyDecl;
import org.phasewright.language.phase.SweepRequest;
import org.phasewright.language.phase.Symbol;

/** Study requests name the model's time variable and give a start value for every state. */
public class StudyChecks extends PhaseCheckBase {

    @Check
    public void simulationUsesModelTime(SimulateRequest simulate) {
        PhaseModel model = EcoreUtil2.getContainerOfType(simulate, PhaseModel.class);
        String time = PhaseModels.timeName(model);
        if (simulate.getTimeName() != null && !simulate.getTimeName().equals(time)) {
            error("The time variable of this model is '" + time + "': write `simulate to " + time + " = ...`.",
                    simulate, PHASE.getSimulateRequest_TimeName(), IssueCodes.WRONG_TIME_NAME, time);
        }
        int given = simulate.getStart().size();
        OptionalLong dimension = given == 0 ? OptionalLong.empty() : dimension(model, constants(simulate));
        if (dimension.isPresent() && given != dimension.getAsLong()) {
            int states = (int) dimension.getAsLong();
            error("The start point has " + ExpressionChecks.plural(given, "value") + " but the model has "
                    + ExpressionChecks.plural(states, "state") + " (" + stateNames(model) + ").", simulate,
                    PHASE.getSimulateRequest_Start(), IssueCodes.WRONG_START_SIZE);
        }
    }

    @Check
    public void sectionUsesModelTime(SectionRequest section) {
        timeName(section, section.getTimeName(), PHASE.getSectionRequest_TimeName(), "section where ... to ");
    }

    @Check
    public void lyapunovUsesModelTime(LyapunovRequest lyapunov) {
        timeName(lyapunov, lyapunov.getTimeName(), PHASE.getLyapunovRequest_TimeName(), "lyapunov to ");
    }

    /** `leading K` asks for 1 .. dimension exponents. */
    @Check
    public void lyapunovLeading(LyapunovRequest lyapunov) {
        if (!lyapunov.isHasLeading()) {
            return;
        }
        OptionalLong dimension = dimension(EcoreUtil2.getContainerOfType(lyapunov, PhaseModel.class),
                constants(lyapunov));
        int leading = lyapunov.getLeading();
        if (leading < 1 || (dimension.isPresent() && leading > dimension.getAsLong())) {
            error("`leading K` asks for the K largest exponents: K must lie between 1 and the number of states"
                    + (dimension.isPresent() ? " (" + dimension.getAsLong() + ")" : "") + "; it is " + leading
                    + ". Leave it out for the whole spectrum.", lyapunov, PHASE.getLyapunovRequest_Leading(),
                    IssueCodes.BAD_LEADING);
        }
    }

    @Check
    public void lyapunovMapOverParams(LyapunovMapRequest map) {
        timeName(map, map.getTimeName(), PHASE.getLyapunovMapRequest_TimeName(), "lyapunov map over ... until ");
        grid(map.getFirst(), map.getSecond(), ParamDecl.class, "`lyapunov map over` varies two single params");
    }

    @Check
    public void basinsOverStates(BasinsRequest basins) {
        timeName(basins, basins.getTimeName(), PHASE.getBasinsRequest_TimeName(), "basins over ... until ");
        grid(basins.getFirst(), basins.getSecond(), StateDecl.class,
                "`basins over` varies the initial values of two single states");
    }

    private void grid(GridSpan first, GridSpan second, Class<? extends Symbol> kind, String rule) {
        for (GridSpan span : new GridSpan[] { first, second }) {
            if (span == null) {
                continue;
            }
            if (span.getSteps() < 2) {
                error("A grid axis needs at least 2 steps (its two ends); it has " + span.getSteps() + ".", span,
                        PHASE.getGridSpan_Steps(), IssueCodes.BAD_GRID_STEPS);
            }
            Symbol symbol = span.getVariable();
            if (symbol == null || symbol.eIsProxy()) {
                continue;
            }
            if (!kind.isInstance(symbol)) {
                error(rule + "; '" + symbol.getName() + "' is " + PhaseModels.aKind(symbol) + ".", span,
                        PHASE.getGridSpan_Variable(), IssueCodes.GRID_VARIABLE);
            } else if (Families.isFamily(symbol)) {
                error(rule + "; '" + symbol.getName() + "' is a family.", span, PHASE.getGridSpan_Variable(),
                        IssueCodes.GRID_VARIABLE);
            } else if (span == second && first != null && first.getVariable() == symbol) {
                error("The two axes of a grid vary different quantities; '" + symbol.getName() + "' is already the "
                        + "first.", span, PHASE.getGridSpan_Variable(), IssueCodes.GRID_VARIABLE);
            }
        }
    }

    /** The number of flat states (families count their elements), when every index range is known. */
    static OptionalLong dimension(PhaseModel model, ConstantValues constants) {
        long total = 0;
        for (StateDecl state : PhaseModels.states(model)) {
            IndexDecl index = state.getIndex();
            if (index == null) {
                total++;
                continue;
            }
            if (index.eIsProxy()) {
                return OptionalLong.empty();
            }
            OptionalLong size = IndexRanges.size(index, constants);
            if (size.isEmpty() || size.getAsLong() < 1) {
                return OptionalLong.empty();
            }
            total += size.getAsLong();
        }
        return OptionalLong.of(total);
    }

    @Check
    public void followVariesAParam(FollowRequest follow) {
        scalarVaried(follow.getParameter(), follow, PHASE.getFollowRequest_Parameter());
        if (follow.getParameter() != null && !follow.getParameter().eIsProxy()
                && !(follow.getParameter() instanceof ParamDecl)) {
            error("`follow equilibria in NAME` varies a param; '" + follow.getParameter().getName() + "' is "
                    + PhaseModels.aKind(follow.getParameter()) + ".", follow, PHASE.getFollowRequest_Parameter(),
                    IssueCodes.NOT_CONSTANT);
        }
    }

    @Check
    public void sweepVariesAParam(SweepRequest sweep) {
        scalarVaried(sweep.getParameter(), sweep, PHASE.getSweepRequest_Parameter());
        if (sweep.getParameter() != null && !sweep.getParameter().eIsProxy()
                && !(sweep.getParameter() instanceof ParamDecl)) {
            error("`sweep NAME from ...` varies a param; '" + sweep.getParameter().getName() + "' is "
                    + PhaseModels.aKind(sweep.getParameter()) + ".", sweep, PHASE.getSweepRequest_Parameter(),
                    IssueCodes.NOT_CONSTANT);
        }
        timeName(sweep, sweep.getTimeName(), PHASE.getSweepRequest_TimeName(), "sweep ... until ");
    }

    /** Continuation and sweeps vary one number; a table has many. */
    private void scalarVaried(Symbol symbol, EObject request, EStructuralFeature feature) {
        if (symbol != null && !symbol.eIsProxy() && Families.isFamily(symbol)) {
            error("A study varies a single param; '" + symbol.getName() + "' is a table (a family over an index).",
                    request, feature, IssueCodes.GRID_VARIABLE);
        }
    }

    private void timeName(EObject request, String written, EStructuralFeature feature, String form) {
        String time = PhaseModels.timeName(EcoreUtil2.getContainerOfType(request, PhaseModel.class));
        if (written != null && !written.equals(time)) {
            error("The time variable of this model is '" + time + "': write `" + form + time + " = ...`.", request,
                    feature, IssueCodes.WRONG_TIME_NAME, time);
        }
    }

    @Check
    public void studyNotEmpty(StudyDecl study) {
        if (study.getAnalyses().isEmpty()) {
            warning("Study '" + study.getName() + "' requests nothing; add `simulate to t = ...` or `equilibria`.",
                    study, PHASE.getStudyDecl_Name(), IssueCodes.EMPTY_STUDY);
        }
    }

    private static String stateNames(PhaseModel model) {
        return String.join(", ", PhaseModels.states(model).stream().map(s -> s.getName()).toList());
    }
}
