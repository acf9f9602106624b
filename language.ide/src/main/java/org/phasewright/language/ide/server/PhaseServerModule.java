package org.phasewright.language.ide.server;

import org.eclipse.xtext.ide.ExecutorServiceProvider;
import org.eclipse.xtext.ide.server.LanguageServerImpl;
import org.eclipse.xtext.ide.server.ServerModule;
import org.eclipse.xtext.ide.server.WorkspaceManager;
import org.eclipse.xtext.ide.server.concurrent.RequestManager;
import org.eclipse.xtext.ide.server.semantictokens.SemanticTokensService;
import org.eclipse.xtext.util.Modules2;

import com.google.inject.AbstractModule;
import com.google.inject.Module;

/**
 * Server-side bindings (language-independent part of the server): our server class and semantic tokens; lone CRs
 * read as line breaks ({@link PhaseWorkspaceManager}); parsing, validation and requests on large-stack threads
 * ({@link PhaseRequestManager}, {@link LargeStackExecutorServiceProvider}).
 */
public class PhaseServerModule extends AbstractModule {

    /** Xtext's server module with ours on top. */
    public static Module withDefaults() {
        return Modules2.mixin(new ServerModule(), new PhaseServerModule());
    }

    @Override
    protected void configure() {
        bind(LanguageServerImpl.class).to(PhaseLanguageServer.class);
        bind(SemanticTokensService.class).to(PhaseSemanticTokensService.class);
        bind(WorkspaceManager.class).to(PhaseWorkspaceManager.class);
        bind(ExecutorServiceProvider.class).to(LargeStackExecutorServiceProvider.class);
        // The concrete class, not IRequestManager: ServerModule links IRequestManager to it, and a test harness
        // that binds IRequestManager to a direct (same-thread) manager keeps its own.
        bind(RequestManager.class).to(PhaseRequestManager.class);
    }
}
