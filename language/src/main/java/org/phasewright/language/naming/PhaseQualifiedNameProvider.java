package org.phasewright.language.naming;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.naming.DefaultDeclarativeQualifiedNameProvider;
import org.eclipse.xtext.naming.QualifiedName;
import org.phasewright.language.phase.Expression;

/**
 * Names of `.phase` elements, as the default provider gives them, except that expressions (which never have a name)
 * are answered at once. The default provider first looks the element up in a per-resource cache, which walks up
 * the containers to find the resource: on an expression nested thousands of levels deep that made indexing
 * quadratic, and a fuzzed text with a 300,000-level expression never finished (see docs/reliability.md).
 */
public class PhaseQualifiedNameProvider extends DefaultDeclarativeQualifiedNameProvider {
    @Override
    public QualifiedName getFullyQualifiedName(EObject object) {
        return object instanceof Expression ? null : super.getFullyQualifiedName(object);
    }
}
