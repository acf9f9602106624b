package org.phasewright.language.ide.server;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicReference;

import org.apache.log4j.Logger;
import org.eclipse.emf.common.util.URI;
import org.eclipse.lsp4j.DidSaveTextDocumentParams;
import org.eclipse.lsp4j.InitializeParams;
import org.eclipse.lsp4j.MessageParams;
import org.eclipse.lsp4j.MessageType;
import org.eclipse.lsp4j.SaveOptions;
import org.eclipse.lsp4j.ServerCapabilities;
import org.eclipse.lsp4j.TextDocumentSyncKind;
import org.eclipse.lsp4j.TextDocumentSyncOptions;
import org.eclipse.lsp4j.jsonrpc.Endpoint;
import org.eclipse.lsp4j.jsonrpc.messages.Either;
import org.eclipse.lsp4j.services.LanguageClient;
import org.eclipse.xtext.ide.server.BuildManager.Buildable;
import org.eclipse.xtext.ide.server.LanguageServerImpl;
import org.eclipse.xtext.ide.server.UriExtensions;
import org.phasewright.language.standalone.StudyPipeline;
import org.phasewright.language.text.LineBreaks;

import com.google.inject.Inject;

/**
 * Xtext's language server, plus running the model's studies on save. On `textDocument/didSave` the saved file is
 * rebuilt with generation allowed for exactly the saved text ({@link StudyOnSave}); the generator runs the studies
 * and writes `<file>.results`. The outcome goes to the client as a {@value #STUDY_FINISHED} notification and as a
 * log message, so generic clients that ignore unknown notifications still show something.
 */
public class PhaseLanguageServer extends LanguageServerImpl {
    public static final String STUDY_FINISHED = "phasewright/studyFinished";
    private static final Logger LOG = Logger.getLogger(PhaseLanguageServer.class);

    @Inject
    private UriExtensions uris;

    @Override
    protected ServerCapabilities createServerCapabilities(InitializeParams params) {
        ServerCapabilities capabilities = super.createServerCapabilities(params);
        // Ask clients for didSave explicitly; the bare sync kind leaves it to the client.
        TextDocumentSyncOptions sync = new TextDocumentSyncOptions();
        sync.setOpenClose(true);
        sync.setChange(TextDocumentSyncKind.Incremental);
        sync.setSave(new SaveOptions(false));
        capabilities.setTextDocumentSync(Either.forRight(sync));
        return capabilities;
    }

    @Override
    public void didSave(DidSaveTextDocumentParams params) {
        URI uri = getURI(params.getTextDocument());
        if (getResourceServiceProvider(uri) == null) {
            return;
        }
        AtomicReference<StudyOnSave> studies = new AtomicReference<>();
        getRequestManager().<Buildable, Object>runWrite(() -> {
            String text = getWorkspaceManager().doRead(uri, (document, resource) -> {
                // Ask the injector that built this resource: it is the one whose builder will consult the request.
                studies.set(resource.getResourceServiceProvider().get(StudyOnSave.class));
                return params.getText() != null ? LineBreaks.loneCrAsLf(params.getText()) : document.getContents();
            });
            studies.get().requestRun(uri, text);
            return getWorkspaceManager().didChangeFiles(List.of(uri), List.of());
        }, (cancelIndicator, buildable) -> buildable.build(cancelIndicator)).whenComplete((deltas, error) -> {
            try {
                StudyOnSave requested = studies.get();
                StudyOutcome outcome = requested == null ? null : requested.finish(uri).orElse(null);
                report(uri, outcome != null ? outcome : new StudyOutcome(StudyOutcome.Status.NOT_RUN,
                        "superseded by a later edit; save again to run the studies", 0));
            } catch (RuntimeException e) {
                LOG.error("Could not report the studies of " + uri, e);
            }
        });
    }

    private void report(URI uri, StudyOutcome run) {
        LanguageClient client = getLanguageClient();
        if (client == null) {
            return;
        }
        String folder = resultsFolder(uri);
        String status = run.status().name().toLowerCase(Locale.ROOT).replace('_', '-');
        StudyFinished finished = new StudyFinished(uris.toUriString(uri), status, run.message(), folder, run.millis());
        if (client instanceof Endpoint endpoint) {
            endpoint.notify(STUDY_FINISHED, finished);
        }
        String line = "Studies of " + uri.lastSegment() + ": " + status + " (" + run.message() + ")"
                + (folder == null || run.status() != StudyOutcome.Status.FINISHED ? "" : "; results in " + folder);
        client.logMessage(new MessageParams(
                run.status() == StudyOutcome.Status.FAILED ? MessageType.Error : MessageType.Info, line));
    }

    /** The results folder beside a file-system model (see StudyPipeline), when it exists. */
    private String resultsFolder(URI uri) {
        if (!uri.isFile()) {
            return null;
        }
        Path folder = StudyPipeline.resultsFolderFor(Paths.get(uri.toFileString()));
        return Files.isDirectory(folder) ? uris.toUriString(folder.toUri()) : null;
    }
}
