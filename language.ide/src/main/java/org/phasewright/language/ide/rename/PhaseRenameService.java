package org.phasewright.language.ide.rename;

import java.util.Set;

import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.ResponseErrorException;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseError;
import org.eclipse.lsp4j.jsonrpc.messages.ResponseErrorCode;
import org.eclipse.xtext.GrammarUtil;
import org.eclipse.xtext.IGrammarAccess;
import org.eclipse.xtext.ide.server.rename.RenameService2;
import org.phasewright.language.phase.Member;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.StudyDecl;
import org.phasewright.language.phase.Symbol;
import org.phasewright.language.phase.SymmetryDecl;

import com.google.inject.Inject;

/**
 * Rename of a declared name across the file (Xtext's rename), refusing new names that would break the model: not a
 * name at all, a keyword, or a name the model already declares.
 */
public class PhaseRenameService extends RenameService2 {
    private static final String NAME = "[A-Za-z_][A-Za-z0-9_]*";

    @Inject
    private IGrammarAccess grammar;

    @Override
    public WorkspaceEdit rename(Options options) {
        String newName = options.getRenameParams().getNewName();
        if (newName == null || !newName.matches(NAME)) {
            throw refused("'" + newName + "' is not a name: use letters, digits and _, starting with a letter or _.");
        }
        Set<String> keywords = GrammarUtil.getAllKeywords(grammar.getGrammar());
        if (keywords.contains(newName)) {
            throw refused("'" + newName + "' is a keyword of the notation and cannot be a name.");
        }
        boolean taken = options.getLanguageServerAccess().doSyncRead(options.getRenameParams().getTextDocument()
                .getUri(), context -> context.getResource().getContents().stream()
                        .filter(PhaseModel.class::isInstance).map(PhaseModel.class::cast)
                        .anyMatch(model -> declares(model, newName)));
        if (taken) {
            throw refused("'" + newName + "' is already declared in this model.");
        }
        return super.rename(options);
    }

    private static boolean declares(PhaseModel model, String name) {
        for (Member member : model.getMembers()) {
            String declared = member instanceof Symbol symbol ? symbol.getName()
                    : member instanceof SymmetryDecl symmetry ? symmetry.getName()
                            : member instanceof StudyDecl study ? study.getName() : null;
            if (name.equals(declared)) {
                return true;
            }
        }
        return false;
    }

    private static ResponseErrorException refused(String message) {
        return new ResponseErrorException(new ResponseError(ResponseErrorCode.InvalidParams, message, null));
    }
}
