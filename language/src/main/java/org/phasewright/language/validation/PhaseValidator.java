package org.phasewright.language.validation;

import org.eclipse.xtext.validation.ComposedChecks;

/**
 * All checks of a `.phase` model. Each composed class owns one concern so that rules stay small and testable.
 */
@ComposedChecks(validators = { NameChecks.class, StructureChecks.class, ExpressionChecks.class, StudyChecks.class,
        ValueChecks.class, UnitChecks.class, SymmetryChecks.class })
public class PhaseValidator extends AbstractPhaseValidator {
}
