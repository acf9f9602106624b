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

    /** The canonical layout of `.phase` files (editors' format command, and any future batch formatting). */
    public Class<? extends IFormatter2> bindIFormatter2() {
        return PhaseFormatter.class;
    }
}
