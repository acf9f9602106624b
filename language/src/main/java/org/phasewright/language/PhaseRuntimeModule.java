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

    /** The canonical layout of `.phase` files (editors' format command, and any future batch formatting). */
    public Class<? extends IFormatter2> bindIFormatter2() {
        return PhaseFormatter.class;
    }
}
