package org.phasewright.language.validation;

import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.validation.AbstractDeclarativeValidator;
import org.eclipse.xtext.validation.EValidatorRegistrar;
import org.phasewright.language.lowering.ConstantValues;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.PhasePackage;

/** Common base of the focused check classes that {@link PhaseValidator} composes. */
abstract class PhaseCheckBase extends AbstractDeclarativeValidator {
    protected static final PhasePackage PHASE = PhasePackage.eINSTANCE;

    @Override
    protected List<EPackage> getEPackages() {
        return List.of(PhasePackage.eINSTANCE);
    }

    /**
     * The params of the model around {@code inside}, evaluated once per validation run and shared by all check
     * classes. get/put rather than computeIfAbsent: callers may already be inside a computeIfAbsent on the context.
     */
    protected ConstantValues constants(EObject inside) {
        ConstantValues constants = (ConstantValues) getContext().get(ConstantValues.class);
        if (constants == null) {
            constants = ConstantValues.of(EcoreUtil2.getContainerOfType(inside, PhaseModel.class));
            getContext().put(ConstantValues.class, constants);
        }
        return constants;
    }

    @Override
    public void register(EValidatorRegistrar registrar) {
        // Composed into PhaseValidator, which registers for all of them.
    }
}
