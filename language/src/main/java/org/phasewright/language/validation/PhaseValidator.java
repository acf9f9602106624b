package org.phasewright.language.validation;

import java.util.List;
import java.util.Map;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.validation.Check;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.PhaseModel;
import org.eclipse.xtext.validation.ComposedChecks;

/**
 * All checks of a `.phase` model. Each composed class owns one concern so that rules stay small and testable.
 */
@ComposedChecks(validators = { NameChecks.class, StructureChecks.class, ExpressionChecks.class, StudyChecks.class,
        ValueChecks.class, UnitChecks.class, SymmetryChecks.class, IndexChecks.class })
public class PhaseValidator extends AbstractPhaseValidator {
    private static final String TOO_DEEP_KEY = ExpressionDepth.class.getName();

    /**
     * Expressions nested deeper than {@link ExpressionDepth#MAX_DEPTH} are an error (below), and then no other check
     * runs on that model: several walk expressions recursively and could overflow the stack. The model is validated
     * first, so the finding is in the context before its contents are visited.
     */
    @Override
    protected boolean isResponsible(Map<Object, Object> context, EObject object) {
        if (!super.isResponsible(context, object)) {
            return false;
        }
        if (context == null) {
            return true;
        }
        if (object instanceof PhaseModel model) {
            context.put(TOO_DEEP_KEY, ExpressionDepth.tooDeep(model));
            return true;
        }
        return !(context.get(TOO_DEEP_KEY) instanceof List<?> deep) || deep.isEmpty();
    }

    @Override
    protected List<MethodWrapper> getMethodsForType(EObject object) {
        List<MethodWrapper> all = super.getMethodsForType(object);
        if (object instanceof PhaseModel model && !ExpressionDepth.tooDeep(model).isEmpty()) {
            return all.stream().filter(m -> m.getMethod().getName().equals("checkNestingDepth")).toList();
        }
        return all;
    }

    @Check
    public void checkNestingDepth(PhaseModel model) {
        for (Expression e : ExpressionDepth.tooDeep(model)) {
            error(ExpressionDepth.message(e), e, null, ExpressionDepth.TOO_DEEP);
        }
    }
}
