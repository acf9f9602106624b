package org.phasewright.language.ide.tests;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;

import org.eclipse.emf.common.util.URI;
import org.eclipse.lsp4j.ClientCapabilities;
import org.eclipse.lsp4j.Diagnostic;
import org.eclipse.lsp4j.DidOpenTextDocumentParams;
import org.eclipse.lsp4j.DocumentSymbolCapabilities;
import org.eclipse.lsp4j.InitializeResult;
import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.TextDocumentClientCapabilities;
import org.eclipse.lsp4j.TextDocumentItem;
import org.eclipse.lsp4j.TextEdit;
import org.eclipse.lsp4j.jsonrpc.services.ServiceEndpoints;
import org.eclipse.xtext.LanguageInfo;
import org.eclipse.xtext.ide.server.Document;
import org.eclipse.xtext.resource.IResourceServiceProvider;
import org.eclipse.xtext.testing.AbstractLanguageServerTest;
import org.eclipse.xtext.util.Modules2;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.language.ide.PhaseIdeSetup;
import org.phasewright.language.ide.server.PhaseServerModule;
import org.phasewright.language.standalone.PhaseFiles;
import org.phasewright.language.standalone.Problem;

import com.google.inject.Guice;
import com.google.inject.Injector;
import com.google.inject.Module;

/**
 * In-process language-server tests: Xtext's test harness (JUnit 4 style, driven from JUnit 5 here) with our server
 * module, a workspace in a temporary folder, and helpers to turn positions into offsets and apply edits.
 */
public abstract class LanguageServerTestBase extends AbstractLanguageServerTest {

    @TempDir
    protected Path workspace;

    /** The command-line checker, to compare the server's diagnostics with. */
    private static PhaseFiles checker;

    protected LanguageServerTestBase() {
        super("phase");
    }

    @Override
    protected Module getServerModule() {
        return Modules2.mixin(super.getServerModule(), new PhaseServerModule());
    }

    /** Before the server's setup, as each test class did on its own: setup then registers the server's injector. */
    @BeforeAll
    static void createChecker() {
        if (checker == null) {
            checker = new PhaseFiles();
        }
    }

    /** What the command-line checker reports for {@code text} as a file pond.phase. */
    static List<Problem> problems(String text) {
        return checker.check("pond.phase", URI.createURI("inmemory:/pond.phase"), text).problems();
    }

    /** The first diagnostic of {@code uri} with issue code {@code code}. */
    Diagnostic diagnostic(String uri, String code) {
        return diagnosticsOf(uri).stream().filter(d -> d.getCode() != null && code.equals(d.getCode().getLeft()))
                .findFirst().orElseThrow(() -> new AssertionError("no " + code + " in " + diagnosticsOf(uri)));
    }

    /** Like the harness's setup, but the workspace is a temporary folder instead of one under the working directory. */
    @Override
    @BeforeEach
    public void setup() {
        Guice.createInjector(getServerModule()).injectMembers(this);
        Object language = resourceServerProviderRegistry.getExtensionToFactoryMap().get(fileExtension);
        if (language instanceof IResourceServiceProvider provider) {
            languageInfo = provider.get(LanguageInfo.class);
            // Other tests in this JVM register their own injectors in EMF's global registry; the server must build
            // with the injector it serves from, as it does in its own process.
            new PhaseIdeSetup().register(provider.get(Injector.class));
        }
        languageServer.connect(ServiceEndpoints.toServiceObject(this, getLanguageClientClass()));
        languageServer.supportedMethods();
        root = workspace.toFile();
    }

    /** The temporary folder is removed by JUnit. */
    @Override
    @AfterEach
    public void cleanup() {
    }

    /** What the server answered to `initialize` in {@link #openModel}. */
    InitializeResult initializeResult;

    /** Initializes the server with hierarchical document symbols, then writes and opens {@code text}. */
    String openModel(String fileName, String text) {
        hierarchicalDocumentSymbolSupport = true;
        initializeResult = initialize(params -> {
            // Keep the harness's capabilities (workspace folders); add hierarchical symbols.
            ClientCapabilities capabilities = params.getCapabilities() == null ? new ClientCapabilities()
                    : params.getCapabilities();
            TextDocumentClientCapabilities textDocument = capabilities.getTextDocument() == null
                    ? new TextDocumentClientCapabilities()
                    : capabilities.getTextDocument();
            DocumentSymbolCapabilities symbols = new DocumentSymbolCapabilities();
            symbols.setHierarchicalDocumentSymbolSupport(true);
            textDocument.setDocumentSymbol(symbols);
            capabilities.setTextDocument(textDocument);
            params.setCapabilities(capabilities);
        });
        String uri = writeFile(fileName, text);
        open(uri, text);
        return uri;
    }

    /**
     * Writes {@code text} and opens it as the client holds it (the harness's {@code open} turns CRLF into LF). With
     * the server's own request manager the build runs later, but a following read such as {@link #getDiagnostics}
     * waits for it: requests are queued in order.
     */
    protected String openAsIs(String fileName, String text) {
        String uri = writeFile(fileName, text);
        languageServer.didOpen(new DidOpenTextDocumentParams(new TextDocumentItem(uri, "phase", 1, text)));
        return uri;
    }

    List<Diagnostic> diagnosticsOf(String uri) {
        return getDiagnostics().getOrDefault(uri, List.of());
    }

    /** The position of the {@code occurrence}-th (0-based) appearance of {@code snippet}, plus {@code shift}. */
    static Position positionOf(String text, String snippet, int occurrence, int shift) {
        int offset = -1;
        for (int i = 0; i <= occurrence; i++) {
            offset = text.indexOf(snippet, offset + 1);
            if (offset < 0) {
                throw new IllegalArgumentException("'" + snippet + "' occurs fewer than " + (occurrence + 1) + " times");
            }
        }
        return new Document(1, text).getPosition(offset + shift);
    }

    static String apply(String text, List<? extends TextEdit> edits) {
        Document document = new Document(1, text);
        List<TextEdit> sorted = new ArrayList<>(edits);
        sorted.sort((a, b) -> Integer.compare(document.getOffSet(b.getRange().getStart()),
                document.getOffSet(a.getRange().getStart())));
        StringBuilder result = new StringBuilder(text);
        for (TextEdit edit : sorted) {
            Range range = edit.getRange();
            result.replace(document.getOffSet(range.getStart()), document.getOffSet(range.getEnd()),
                    edit.getNewText());
        }
        return result.toString();
    }

    static <T> T get(CompletableFuture<T> future) {
        try {
            return future.get();
        } catch (InterruptedException | ExecutionException e) {
            throw new AssertionError(e);
        }
    }

    /** Notifications the server sent to this client under {@code method}. */
    List<Object> notificationsOf(String method) {
        List<Object> found = new ArrayList<>();
        for (var notification : notifications) {
            if (notification.getKey().equals(method)) {
                found.add(notification.getValue());
            }
        }
        return found;
    }
}
