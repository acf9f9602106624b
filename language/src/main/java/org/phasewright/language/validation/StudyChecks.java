package org.phasewright.language.validation;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.validation.Check;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.FollowRequest;
import org.phasewright.language.phase.LyapunovRequest;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.SectionRequest;
import org.phasewright.language.phase.SimulateRequest;
import org.phasewright.language.phase.StudyDecl;
import org.phasewright.language.phase.SweepRequest;

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
        int states = PhaseModels.states(model).size();
        int given = simulate.getStart().size();
        if (given > 0 && given != states) {
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

    @Check
    public void followVariesAParam(FollowRequest follow) {
        if (follow.getParameter() != null && !follow.getParameter().eIsProxy()
                && !(follow.getParameter() instanceof ParamDecl)) {
            error("`follow equilibria in NAME` varies a param; '" + follow.getParameter().getName() + "' is a "
                    + PhaseModels.kindWord(follow.getParameter()) + ".", follow, PHASE.getFollowRequest_Parameter(),
                    IssueCodes.NOT_CONSTANT);
        }
    }

    @Check
    public void sweepVariesAParam(SweepRequest sweep) {
        if (sweep.getParameter() != null && !sweep.getParameter().eIsProxy()
                && !(sweep.getParameter() instanceof ParamDecl)) {
            error("`sweep NAME from ...` varies a param; '" + sweep.getParameter().getName() + "' is a "
                    + PhaseModels.kindWord(sweep.getParameter()) + ".", sweep, PHASE.getSweepRequest_Parameter(),
                    IssueCodes.NOT_CONSTANT);
        }
        timeName(sweep, sweep.getTimeName(), PHASE.getSweepRequest_TimeName(), "sweep ... until ");
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
