package org.phasewright.language.ide.tests;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.function.Predicate;

import com.google.gson.Gson;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/**
 * A minimal language client over a child process's standard streams, framing messages as the LSP 3.17 base protocol
 * specifies ("Content-Length: N" header, blank line, N bytes of UTF-8 JSON-RPC 2.0). Anything else on the server's
 * standard output is recorded as a protocol violation.
 */
final class JsonRpcProcess implements AutoCloseable {
    private static final Gson GSON = new Gson();

    private final Process process;
    private final OutputStream toServer;
    private final BlockingQueue<JsonObject> fromServer = new LinkedBlockingQueue<>();
    private final List<JsonObject> unclaimed = new ArrayList<>();
    private final List<String> violations = new ArrayList<>();
    private final Duration patience;
    private int nextId = 1;

    JsonRpcProcess(ProcessBuilder builder, Duration patience) throws IOException {
        this.process = builder.start();
        this.toServer = process.getOutputStream();
        this.patience = patience;
        Thread reader = new Thread(this::readLoop, "lsp-reader");
        reader.setDaemon(true);
        reader.start();
    }

    /** Sends a request and waits for its response; notifications received meanwhile are kept. */
    JsonObject request(String method, Object params) throws IOException, InterruptedException {
        int id = nextId++;
        JsonObject message = message(method, params);
        message.addProperty("id", id);
        send(message);
        return await(m -> m.has("id") && m.get("id").getAsInt() == id && !m.has("method"));
    }

    void notify(String method, Object params) throws IOException {
        send(message(method, params));
    }

    /** The first message (already received or arriving within the patience) that matches. */
    JsonObject await(Predicate<JsonObject> wanted) throws InterruptedException {
        for (JsonObject earlier : unclaimed) {
            if (wanted.test(earlier)) {
                unclaimed.remove(earlier);
                return earlier;
            }
        }
        long deadline = System.nanoTime() + patience.toNanos();
        while (System.nanoTime() < deadline) {
            JsonObject next = fromServer.poll(deadline - System.nanoTime(), TimeUnit.NANOSECONDS);
            if (next == null) {
                break;
            }
            if (wanted.test(next)) {
                return next;
            }
            unclaimed.add(next);
        }
        throw new AssertionError("no matching message from the server; received " + unclaimed + "; violations "
                + violations);
    }

    List<String> violations() {
        synchronized (violations) {
            return List.copyOf(violations);
        }
    }

    Process process() {
        return process;
    }

    private JsonObject message(String method, Object params) {
        JsonObject message = new JsonObject();
        message.addProperty("jsonrpc", "2.0");
        message.addProperty("method", method);
        if (params != null) {
            message.add("params", params instanceof JsonElement element ? element : GSON.toJsonTree(params));
        }
        return message;
    }

    private void send(JsonObject message) throws IOException {
        byte[] body = GSON.toJson(message).getBytes(StandardCharsets.UTF_8);
        toServer.write(("Content-Length: " + body.length + "\r\n\r\n").getBytes(StandardCharsets.US_ASCII));
        toServer.write(body);
        toServer.flush();
    }

    private void readLoop() {
        try (InputStream in = process.getInputStream()) {
            while (true) {
                int length = -1;
                String header;
                while (!(header = readLine(in)).isEmpty()) {
                    if (header.startsWith("Content-Length: ")) {
                        length = Integer.parseInt(header.substring("Content-Length: ".length()).trim());
                    } else if (!header.startsWith("Content-Type: ")) {
                        violation("unexpected header or output: " + header);
                    }
                }
                if (length < 0) {
                    violation("message without Content-Length");
                    return;
                }
                byte[] body = in.readNBytes(length);
                if (body.length < length) {
                    return;
                }
                fromServer.add(JsonParser.parseString(new String(body, StandardCharsets.UTF_8)).getAsJsonObject());
            }
        } catch (EndOfStream | IOException end) {
            // The server exited.
        } catch (RuntimeException malformed) {
            violation("malformed message: " + malformed);
        }
    }

    private void violation(String what) {
        synchronized (violations) {
            violations.add(what);
        }
    }

    private static final class EndOfStream extends Exception {
        private static final long serialVersionUID = 1L;
    }

    private static String readLine(InputStream in) throws IOException, EndOfStream {
        ByteArrayOutputStream line = new ByteArrayOutputStream();
        int b;
        while ((b = in.read()) != '\n') {
            if (b < 0) {
                throw new EndOfStream();
            }
            line.write(b);
        }
        String text = line.toString(StandardCharsets.US_ASCII);
        return text.endsWith("\r") ? text.substring(0, text.length() - 1) : text;
    }

    @Override
    public void close() {
        if (process.isAlive()) {
            process.destroyForcibly();
        }
    }
}
