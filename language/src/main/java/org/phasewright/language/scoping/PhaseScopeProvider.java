/*
 * Phasewright .phase language (Xtext).
 */
package org.phasewright.language.scoping;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.xtext.scoping.IScope;
import org.phasewright.language.phase.Expression;


/**
 * This class contains custom scoping description.
 * 
 * See https://www.eclipse.org/Xtext/documentation/303_runtime_concepts.html#scoping
 * on how and when to use it.
 */
public class PhaseScopeProvider extends AbstractPhaseScopeProvider {
    /**
     * Expressions declare no names, so a reference inside one sees what its enclosing declaration sees. Asking there
     * directly keeps linking linear: the default provider builds one scope layer per enclosing object, which made a
     * sum thousands of terms long take minutes (found by fuzzing, see docs/reliability.md).
     */
    @Override
    public IScope getScope(EObject context, EReference reference) {
        EObject owner = context;
        while (owner instanceof Expression && owner.eContainer() != null) {
            owner = owner.eContainer();
        }
        return super.getScope(owner, reference);
    }
}
