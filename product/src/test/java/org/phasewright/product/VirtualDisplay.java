package org.phasewright.product;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

/** An Xvfb X server on a free display number, for starting the IDE without a screen. */
final class VirtualDisplay implements AutoCloseable {
    private final Process server;
    private final int number;

    private VirtualDisplay(Process server, int number) {
        this.server = server;
        this.number = number;
    }

    static boolean available() {
        for (String dir : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
            if (Files.isExecutable(Path.of(dir, "Xvfb"))) {
                return true;
            }
        }
        return false;
    }

    static VirtualDisplay start(Path log) throws IOException, InterruptedException {
        for (int number = 90; number < 140; number++) {
            if (Files.exists(Path.of("/tmp/.X11-unix/X" + number))
                    || Files.exists(Path.of("/tmp/.X" + number + "-lock"))) {
                continue;
            }
            Process server = new ProcessBuilder("Xvfb", ":" + number, "-screen", "0", "1400x900x24", "-nolisten", "tcp")
                    .redirectErrorStream(true).redirectOutput(log.toFile()).start();
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(15);
            while (System.nanoTime() < deadline && server.isAlive()) {
                if (Files.exists(Path.of("/tmp/.X11-unix/X" + number))) {
                    return new VirtualDisplay(server, number);
                }
                Thread.sleep(50);
            }
            server.destroy();
        }
        throw new IOException("could not start Xvfb on any display from :90 to :139; see " + log);
    }

    String name() {
        return ":" + number;
    }

    @Override
    public void close() throws InterruptedException {
        server.destroy();
        if (!server.waitFor(10, TimeUnit.SECONDS)) {
            server.destroyForcibly();
        }
    }
}
