package org.phasewright.cli;

import java.io.Console;
import java.io.PrintStream;
import java.util.Locale;
import java.util.function.LongSupplier;

import org.phasewright.runtime.study.ProgressListener;

/**
 * One line on the terminal for long analyses, redrawn in place: {@code [ 42%] simulate to t = 1000, ETA 3 s}.
 * Silent for the first half second of a task (short runs print nothing), redrawn at most five times a second.
 */
final class TerminalProgress implements ProgressListener {
    private static final long QUIET_START = 500_000_000L;
    private static final long REDRAW = 200_000_000L;

    private final PrintStream err;
    private final LongSupplier clock;
    private String task;
    private long taskStart;
    private long lastDraw;
    private int width;

    TerminalProgress(PrintStream err, LongSupplier nanoClock) {
        this.err = err;
        this.clock = nanoClock;
    }

    /** A display on {@code err} when it is an interactive terminal and not quiet; otherwise one that says nothing. */
    static ProgressListener forTerminal(PrintStream err, boolean quiet) {
        return quiet || !interactive() ? ProgressListener.NONE : new TerminalProgress(err, System::nanoTime);
    }

    /** True when standard input and output are a terminal (JDK 22+ returns a console even when redirected). */
    static boolean interactive() {
        Console console = System.console();
        if (console == null) {
            return false;
        }
        try {
            return (Boolean) Console.class.getMethod("isTerminal").invoke(console);
        } catch (ReflectiveOperationException | ClassCastException e) {
            return true; // JDK 21: a console exists only for a terminal
        }
    }

    @Override
    public void progress(String what, double fraction) {
        long now = clock.getAsLong();
        if (!what.equals(task)) {
            task = what;
            taskStart = now;
            lastDraw = now - REDRAW; // the first redraw may come as soon as the quiet start is over
        }
        long elapsed = now - taskStart;
        if (elapsed < QUIET_START || now - lastDraw < REDRAW && fraction < 1) {
            return;
        }
        lastDraw = now;
        String line = line(what, fraction, elapsed);
        err.print("\r" + line + " ".repeat(Math.max(0, width - line.length())));
        err.flush();
        width = line.length();
    }

    /** Removes the line, so that what is printed next starts clean. */
    void clear() {
        if (width > 0) {
            err.print("\r" + " ".repeat(width) + "\r");
            err.flush();
            width = 0;
        }
        task = null;
    }

    static void clear(ProgressListener listener) {
        if (listener instanceof TerminalProgress t) {
            t.clear();
        }
    }

    static String line(String what, double fraction, long elapsedNanos) {
        int percent = (int) Math.floor(100 * fraction);
        String eta = "";
        if (fraction >= 0.01 && fraction < 1) {
            double seconds = elapsedNanos / 1e9 * (1 - fraction) / fraction;
            eta = ", ETA " + duration(seconds);
        }
        return String.format(Locale.ROOT, "[%3d%%] %s%s", percent, what, eta);
    }

    static String duration(double seconds) {
        long s = Math.round(seconds);
        if (s < 60) {
            return s + " s";
        }
        if (s < 3600) {
            return String.format(Locale.ROOT, "%d min %02d s", s / 60, s % 60);
        }
        return String.format(Locale.ROOT, "%d h %02d min", s / 3600, (s % 3600) / 60);
    }
}
