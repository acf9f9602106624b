package org.phasewright.language.ui.highlight;

import java.util.HashMap;
import java.util.Map;

import org.phasewright.language.ide.highlighting.SemanticClassifier;
import org.phasewright.language.ide.highlighting.SemanticKind;
import org.phasewright.language.phase.Member;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.Symbol;

/**
 * Semantic colouring: the class of every declared name, as the editor-neutral {@link SemanticClassifier} sees it.
 * Names are global in a `.phase` file, so a name means the same symbol wherever it appears and a name-to-kind map
 * lets the fast lexer colour as you type.
 */
public final class DeclaredKinds {
    private DeclaredKinds() {
    }

    public static Map<String, TokenClass> of(PhaseModel model) {
        Map<String, TokenClass> kinds = new HashMap<>();
        if (model == null) {
            return kinds;
        }
        for (Member member : model.getMembers()) {
            if (member instanceof Symbol symbol && symbol.getName() != null) {
                TokenClass kind = tokenClass(SemanticClassifier.kindOf(symbol));
                if (kind != null) {
                    kinds.putIfAbsent(symbol.getName(), kind);
                }
            }
        }
        return kinds;
    }

    private static TokenClass tokenClass(SemanticKind kind) {
        if (kind == null) {
            return null;
        }
        return switch (kind) {
            case STATE -> TokenClass.STATE;
            case PARAM -> TokenClass.PARAM;
            case LET -> TokenClass.LET;
            case TIME -> TokenClass.TIME;
            default -> null;
        };
    }
}
