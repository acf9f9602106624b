package org.phasewright.report;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Replaces a folder of files as a whole: everything is written into a fresh hidden sibling folder first; only when
 * every file is complete is the old folder renamed away, the new one renamed into its place, and the old one deleted.
 * A run that fails while writing leaves the previous folder untouched.
 */
final class ReportFolder {
    /** Writes one file; replaceable in tests to make a write fail. */
    @FunctionalInterface
    interface FileSink {
        void write(Path file, byte[] content) throws IOException;
    }

    static final FileSink DISK = Files::write;

    private static final AtomicLong COUNTER = new AtomicLong();

    private ReportFolder() {
    }

    static void replace(Path target, Map<String, byte[]> files, FileSink sink) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path parent = absolute.getParent();
        Files.createDirectories(parent);
        String unique = ProcessHandle.current().pid() + "-" + COUNTER.incrementAndGet();
        Path fresh = parent.resolve("." + absolute.getFileName() + ".new-" + unique);
        Files.createDirectory(fresh);
        try {
            for (Map.Entry<String, byte[]> f : files.entrySet()) {
                sink.write(fresh.resolve(f.getKey()), f.getValue());
            }
        } catch (IOException | RuntimeException e) {
            deleteTree(fresh);
            throw e;
        }
        Path old = null;
        if (Files.exists(absolute)) {
            old = parent.resolve("." + absolute.getFileName() + ".old-" + unique);
            try {
                move(absolute, old);
            } catch (IOException e) {
                deleteTree(fresh);
                throw e;
            }
        }
        try {
            move(fresh, absolute);
        } catch (IOException e) {
            if (old != null) {
                move(old, absolute); // put the previous report back
            }
            deleteTree(fresh);
            throw e;
        }
        if (old != null) {
            try {
                deleteTree(old);
            } catch (IOException e) {
                // The new report is in place; a left-over hidden folder is harmless.
            }
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to);
        }
    }

    static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        Files.walkFileTree(root, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                Files.delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path dir, IOException e) throws IOException {
                if (e != null) {
                    throw e;
                }
                Files.delete(dir);
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
