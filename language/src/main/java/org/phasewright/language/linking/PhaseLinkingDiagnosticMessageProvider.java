package org.phasewright.language.linking;

import org.eclipse.xtext.diagnostics.DiagnosticMessage;
import org.eclipse.xtext.diagnostics.Severity;
import org.eclipse.xtext.linking.impl.LinkingDiagnosticMessageProvider;
import org.phasewright.language.phase.PhasePackage;

/** Unknown names in plain words, with a hint on how to declare them. */
public class PhaseLinkingDiagnosticMessageProvider extends LinkingDiagnosticMessageProvider {

    public static final String UNKNOWN_NAME = "org.phasewright.language.unknownName";

    @Override
    public DiagnosticMessage getUnresolvedProxyMessage(ILinkingDiagnosticContext context) {
        String name = context.getLinkText();
        String hint;
        if (context.getReference() == PhasePackage.Literals.RATE_DECL__TARGET) {
            hint = "declare it with `state " + name + " = VALUE`";
        } else if (context.getReference() == PhasePackage.Literals.STATE_MAP__STATE) {
            hint = "a symmetry maps declared states";
        } else {
            hint = "declare it with param, state or let, or as the time variable with `time " + name + "`";
        }
        return new DiagnosticMessage("Unknown name '" + name + "'; " + hint + ".", Severity.ERROR, UNKNOWN_NAME,
                name);
    }
}
