package org.phasewright.language;

import org.eclipse.xtext.linking.ILinkingDiagnosticMessageProvider;
import org.phasewright.language.linking.PhaseLinkingDiagnosticMessageProvider;

/** Guice bindings of the language that hold without Eclipse. */
public class PhaseRuntimeModule extends AbstractPhaseRuntimeModule {

    public Class<? extends ILinkingDiagnosticMessageProvider> bindILinkingDiagnosticMessageProvider() {
        return PhaseLinkingDiagnosticMessageProvider.class;
    }
}
