package org.phasewright.language.ide.server;

import org.eclipse.xtext.ide.server.ServerLauncher;

/**
 * Starts the `.phase` language server on standard input and output (JSON-RPC with Content-Length framing). Standard
 * output carries protocol messages only: Xtext's launcher silences other writes to it, and to standard error, unless
 * `-log` is given (then both go to a log file). Other arguments: `-trace` logs the protocol, `-noValidate` skips
 * message validation.
 */
public final class PhaseLanguageServerLauncher {
    private PhaseLanguageServerLauncher() {
    }

    public static void main(String[] args) {
        ServerLauncher.launch(PhaseLanguageServerLauncher.class.getName(), args, PhaseServerModule.withDefaults());
    }
}
