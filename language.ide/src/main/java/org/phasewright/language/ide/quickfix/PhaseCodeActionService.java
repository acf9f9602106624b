package org.phasewright.language.ide.quickfix;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.lsp4j.CodeAction;
import org.eclipse.lsp4j.CodeActionKind;
import org.eclipse.lsp4j.Command;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.WorkspaceEdit;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.xtext.ide.server.Document;
import org.eclipse.xtext.ide.server.codeActions.ICodeActionService2;
import org.eclipse.xtext.resource.XtextResource;
import org.phasewright.language.ide.text.TextChange;

import com.google.inject.Inject;

/** Language-server quick fixes: one code action per {@link QuickFix} for each diagnostic the client sends back. */
public class PhaseCodeActionService implements ICodeActionService2 {

    @Inject
    private PhaseQuickFixes quickFixes;

    @Override
    public List<Either<Command, CodeAction>> getCodeActions(Options options) {
        if (options.getCodeActionParams().getContext() == null) {
            return new ArrayList<>();
        }
        if (options.getDocument() != null && options.getResource() != null) {
            return actions(options, options.getDocument(), options.getResource());
        }
        // Xtext's server passes only the URI; read the document and resource within the current request.
        return options.getLanguageServerAccess().doSyncRead(options.getURI(),
                context -> actions(options, context.getDocument(), context.getResource()));
    }

    private List<Either<Command, CodeAction>> actions(Options options, Document document, Resource resource) {
        List<Either<Command, CodeAction>> actions = new ArrayList<>();
        if (!(resource instanceof XtextResource xtext) || document == null) {
            return actions;
        }
        for (Diagnostic diagnostic : options.getCodeActionParams().getContext().getDiagnostics()) {
            if (options.getCancelIndicator().isCanceled()) {
                break;
            }
            String code = diagnostic.getCode() == null ? null
                    : diagnostic.getCode().isLeft() ? diagnostic.getCode().getLeft()
                            : String.valueOf(diagnostic.getCode().getRight());
            int start = document.getOffSet(diagnostic.getRange().getStart());
            int end = document.getOffSet(diagnostic.getRange().getEnd());
            String message = diagnostic.getMessage() == null ? null
                    : diagnostic.getMessage().isLeft() ? diagnostic.getMessage().getLeft()
                            : diagnostic.getMessage().getRight().getValue();
            for (QuickFix fix : quickFixes.fixesFor(xtext, code, start, end - start, message)) {
                CodeAction action = new CodeAction(fix.title());
                action.setKind(CodeActionKind.QuickFix);
                action.setDiagnostics(List.of(diagnostic));
                action.setEdit(new WorkspaceEdit(Map.of(options.getURI(), toEdits(fix, document))));
                actions.add(Either.forRight(action));
            }
        }
        return actions;
    }

    private static List<TextEdit> toEdits(QuickFix fix, Document document) {
        List<TextEdit> edits = new ArrayList<>();
        for (TextChange change : fix.changes()) {
            edits.add(new TextEdit(new Range(document.getPosition(change.offset()),
                    document.getPosition(change.offset() + change.length())), change.text()));
        }
        return edits;
    }
}
