package org.phasewright.language.validation;

import java.util.List;

import org.eclipse.emf.ecore.EPackage;
import org.eclipse.xtext.validation.AbstractDeclarativeValidator;
import org.eclipse.xtext.validation.EValidatorRegistrar;
import org.phasewright.language.phase.PhasePackage;

/** Common base of the focused check classes that {@link PhaseValidator} composes. */
abstract class PhaseCheckBase extends AbstractDeclarativeValidator {
    protected static final PhasePackage PHASE = PhasePackage.eINSTANCE;

    @Override
    protected List<EPackage> getEPackages() {
        return List.of(PhasePackage.eINSTANCE);
    }

    @Override
    public void register(EValidatorRegistrar registrar) {
        // Composed into PhaseValidator, which registers for all of them.
    }
}
