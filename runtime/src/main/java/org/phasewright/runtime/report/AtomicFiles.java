package org.phasewright.runtime.report;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.CharsetEncoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Writes a file so that readers see either the old content or the complete new one, never a partial file:
 * write a temporary file in the same folder, then rename it over the target. There is no fsync: the rename
 * already protects against a run that crashes, and forcing to disk cost ~0.1 s per file here, too slow for runs on save.
 */
public final class AtomicFiles {
    /** Produces the content. */
    @FunctionalInterface
    public interface Content {
        void writeTo(Writer out) throws IOException;
    }

    private static final AtomicLong COUNTER = new AtomicLong();

    private AtomicFiles() {
    }

    /** UTF-8 that writes '?' for a lone surrogate (a name can contain one) instead of failing the whole file. */
    private static CharsetEncoder utf8() {
        return StandardCharsets.UTF_8.newEncoder().onMalformedInput(CodingErrorAction.REPLACE)
                .onUnmappableCharacter(CodingErrorAction.REPLACE);
    }

    public static void write(Path target, String text) throws IOException {
        write(target, out -> out.write(text));
    }

    public static void write(Path target, Content content) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        Files.createDirectories(folder);
        // Same folder, so the rename stays on one file system; a unique name so concurrent writers do not collide.
        Path temporary = folder.resolve("." + absolute.getFileName() + "." + ProcessHandle.current().pid() + "."
                + COUNTER.incrementAndGet() + ".tmp");
        try {
            try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.CREATE_NEW,
                    StandardOpenOption.WRITE);
                    Writer out = new BufferedWriter(Channels.newWriter(channel, utf8(), -1))) {
                content.writeTo(out);
                out.flush();
            }
            try {
                Files.move(temporary, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) { // some file systems cannot rename atomically
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temporary);
        }
    }
}
