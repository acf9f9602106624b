package org.phasewright.language.ide.server;

import org.eclipse.xtext.ide.server.LanguageServerImpl;
import org.eclipse.xtext.ide.server.ServerModule;
import org.eclipse.xtext.ide.server.semantictokens.SemanticTokensService;
import org.eclipse.xtext.util.Modules2;

import com.google.inject.AbstractModule;
import com.google.inject.Module;

/** Server-side bindings (language-independent part of the server): our server class and semantic tokens. */
public class PhaseServerModule extends AbstractModule {

    /** Xtext's server module with ours on top. */
    public static Module withDefaults() {
        return Modules2.mixin(new ServerModule(), new PhaseServerModule());
    }

    @Override
    protected void configure() {
        bind(LanguageServerImpl.class).to(PhaseLanguageServer.class);
        bind(SemanticTokensService.class).to(PhaseSemanticTokensService.class);
    }
}
