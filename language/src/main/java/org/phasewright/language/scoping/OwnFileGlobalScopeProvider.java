package org.phasewright.language.scoping;

import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.xtext.resource.IEObjectDescription;
import org.eclipse.xtext.scoping.IGlobalScopeProvider;
import org.eclipse.xtext.scoping.IScope;

import com.google.common.base.Predicate;

/**
 * A `.phase` file is a whole model: its names never resolve to declarations in other files of the same workspace
 * (an editor or language server holds many files in one resource set; the command-line checker holds one).
 */
public class OwnFileGlobalScopeProvider implements IGlobalScopeProvider {
    @Override
    public IScope getScope(Resource context, EReference reference, Predicate<IEObjectDescription> filter) {
        return IScope.NULLSCOPE;
    }
}
