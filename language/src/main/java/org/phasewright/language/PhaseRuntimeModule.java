package org.phasewright.language;

import org.eclipse.xtext.formatting2.IFormatter2;
import org.eclipse.xtext.linking.ILinkingDiagnosticMessageProvider;
import org.phasewright.language.formatting.PhaseFormatter;
import org.phasewright.language.linking.PhaseLinkingDiagnosticMessageProvider;

/** Guice bindings of the language that hold without Eclipse. */
public class PhaseRuntimeModule extends AbstractPhaseRuntimeModule {

    public Class<? extends ILinkingDiagnosticMessageProvider> bindILinkingDiagnosticMessageProvider() {
        return PhaseLinkingDiagnosticMessageProvider.class;
    }

    /** Expressions have no names; answering so directly keeps indexing linear in deeply nested text. */
    public Class<? extends org.eclipse.xtext.naming.IQualifiedNameProvider> bindIQualifiedNameProvider() {
        return org.phasewright.language.naming.PhaseQualifiedNameProvider.class;
    }

    /** Names resolve within their own file only; see {@link OwnFileGlobalScopeProvider}. */
    @Override
    public Class<? extends org.eclipse.xtext.scoping.IGlobalScopeProvider> bindIGlobalScopeProvider() {
        return org.phasewright.language.scoping.OwnFileGlobalScopeProvider.class;
    }

    /**
     * EMF's generic constraints look up the resource from every object by walking its containers, which is quadratic
     * on a deeply nested expression (100,000 nested minus signs took 33 s); they add nothing here: the parser reports
     * missing parts and linking reports unresolved names.
     */
    public void configureUseEObjectValidator(com.google.inject.Binder binder) {
        binder.bind(Boolean.class).annotatedWith(com.google.inject.name.Names.named(
                org.eclipse.xtext.validation.CompositeEValidator.USE_EOBJECT_VALIDATOR)).toInstance(Boolean.FALSE);
    }

    /** The canonical layout of `.phase` files (editors' format command, and any future batch formatting). */
    public Class<? extends IFormatter2> bindIFormatter2() {
        return PhaseFormatter.class;
    }
}
