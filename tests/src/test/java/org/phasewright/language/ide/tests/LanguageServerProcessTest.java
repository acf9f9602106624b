package org.phasewright.language.ide.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import org.eclipse.lsp4j.Position;
import org.eclipse.xtext.ide.server.Document;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;

/**
 * End to end: `phasewright lsp` as a separate process, spoken to over stdin/stdout exactly as an editor would
 * (message names and shapes from the LSP 3.17 specification). The server is started from this test's own class
 * path, so the check does not depend on which jars were packaged.
 */
class LanguageServerProcessTest {
    private static final Duration PATIENCE = Duration.ofSeconds(60);

    private static final String POND = """
            model pond "Algae in a pond"
            param growth = 0.4 "growth rate"
            state algae = 1
            rate algae = growth*algae  -  zz
            """;

    @TempDir
    Path workspace;

    private static ProcessBuilder serverProcess() {
        String classPath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        return new ProcessBuilder(java, "-Dguice_bytecode_gen_option=DISABLED", "-XX:TieredStopAtLevel=1", "-cp",
                classPath, "org.phasewright.cli.Main", "lsp").redirectError(ProcessBuilder.Redirect.DISCARD);
    }

    private static Map<String, Object> document(String uri) {
        return Map.of("uri", uri);
    }

    private static Map<String, Object> at(String uri, Position position) {
        return Map.of("textDocument", document(uri), "position",
                Map.of("line", position.getLine(), "character", position.getCharacter()));
    }

    private static Position positionOf(String snippet, int shift) {
        return new Document(1, POND).getPosition(POND.indexOf(snippet) + shift);
    }

    @Test
    void editorSessionOverStdio() throws Exception {
        String rootUri = workspace.toUri().toString();
        String uri = workspace.resolve("pond.phase").toUri().toString();
        try (JsonRpcProcess server = new JsonRpcProcess(serverProcess(), PATIENCE)) {
            JsonObject initialized = server.request("initialize", Map.of("processId", ProcessHandle.current().pid(),
                    "rootUri", rootUri, "capabilities", Map.of("textDocument",
                            Map.of("hover", Map.of("contentFormat", List.of("markdown"))))));
            JsonObject capabilities = initialized.getAsJsonObject("result").getAsJsonObject("capabilities");
            assertTrue(capabilities.get("hoverProvider").getAsBoolean());
            assertTrue(capabilities.has("completionProvider"));
            assertTrue(capabilities.get("documentFormattingProvider").getAsBoolean());
            assertTrue(capabilities.getAsJsonObject("textDocumentSync").has("save"), "asks for didSave");
            server.notify("initialized", Map.of());

            server.notify("textDocument/didOpen", Map.of("textDocument",
                    Map.of("uri", uri, "languageId", "phase", "version", 1, "text", POND)));
            JsonObject published = server.await(m -> "textDocument/publishDiagnostics".equals(stringOf(m, "method"))
                    && uri.equals(m.getAsJsonObject("params").get("uri").getAsString())
                    && !m.getAsJsonObject("params").getAsJsonArray("diagnostics").isEmpty());
            JsonObject diagnostic = published.getAsJsonObject("params").getAsJsonArray("diagnostics").get(0)
                    .getAsJsonObject();
            assertTrue(diagnostic.get("message").getAsString().startsWith("Unknown name 'zz'"), diagnostic::toString);
            assertEquals(1, diagnostic.get("severity").getAsInt(), "1 = Error");
            JsonObject start = diagnostic.getAsJsonObject("range").getAsJsonObject("start");
            assertEquals(positionOf("zz", 0), new Position(start.get("line").getAsInt(), start.get("character").getAsInt()));

            JsonObject completion = server.request("textDocument/completion", at(uri, positionOf("growth*", 0)));
            JsonElement result = completion.get("result");
            JsonArray items = result.isJsonArray() ? result.getAsJsonArray()
                    : result.getAsJsonObject().getAsJsonArray("items");
            List<String> labels = new ArrayList<>();
            items.forEach(item -> labels.add(item.getAsJsonObject().get("label").getAsString()));
            assertTrue(labels.containsAll(List.of("growth", "algae", "sin", "pi")), labels::toString);

            JsonObject hover = server.request("textDocument/hover", at(uri, positionOf("growth*", 1)));
            String hoverText = hover.getAsJsonObject("result").getAsJsonObject("contents").get("value").getAsString();
            assertTrue(hoverText.startsWith("**param** `growth` — growth rate"), hoverText);

            JsonObject formatting = server.request("textDocument/formatting", Map.of("textDocument", document(uri),
                    "options", Map.of("tabSize", 4, "insertSpaces", true)));
            assertEquals(POND.replace("growth*algae  -  zz", "growth*algae - zz"),
                    applyEdits(POND, formatting.getAsJsonArray("result")));

            JsonObject shutdown = server.request("shutdown", null);
            assertTrue(shutdown.has("result") && !shutdown.has("error"), shutdown::toString);
            server.notify("exit", null);
            assertTrue(server.process().waitFor(PATIENCE.toSeconds(), TimeUnit.SECONDS), "server exits after exit");
            assertEquals(0, server.process().exitValue());
            assertEquals(List.of(), server.violations(), "standard output carries only protocol messages");
        }
    }

    private static String stringOf(JsonObject message, String member) {
        return message.has(member) && message.get(member).isJsonPrimitive() ? message.get(member).getAsString() : null;
    }

    private static String applyEdits(String text, JsonArray edits) {
        Document document = new Document(1, text);
        record Edit(int start, int end, String text) {
        }
        List<Edit> parsed = new ArrayList<>();
        for (JsonElement element : edits) {
            JsonObject edit = element.getAsJsonObject();
            JsonObject range = edit.getAsJsonObject("range");
            parsed.add(new Edit(offset(document, range.getAsJsonObject("start")),
                    offset(document, range.getAsJsonObject("end")), edit.get("newText").getAsString()));
        }
        parsed.sort((a, b) -> Integer.compare(b.start(), a.start()));
        StringBuilder result = new StringBuilder(text);
        parsed.forEach(edit -> result.replace(edit.start(), edit.end(), edit.text()));
        return result.toString();
    }

    private static int offset(Document document, JsonObject position) {
        return document.getOffSet(new Position(position.get("line").getAsInt(), position.get("character").getAsInt()));
    }
}
