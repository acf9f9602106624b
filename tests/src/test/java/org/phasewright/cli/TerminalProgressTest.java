package org.phasewright.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.atomic.AtomicLong;

import org.junit.jupiter.api.Test;

/** The progress line: percentage, task, ETA from the rate so far; redrawn in place; silent for short tasks. */
class TerminalProgressTest {
    private final ByteArrayOutputStream bytes = new ByteArrayOutputStream();
    private final AtomicLong now = new AtomicLong();
    private final TerminalProgress progress = new TerminalProgress(new PrintStream(bytes, true,
            StandardCharsets.UTF_8), now::get);

    private String printed() {
        return bytes.toString(StandardCharsets.UTF_8);
    }

    @Test
    void showsPercentageAndEtaThenClears() {
        progress.progress("simulate to t = 1000", 0);
        now.set(3_000_000_000L); // 3 s for the first 42%: 58% more take about 4 s
        progress.progress("simulate to t = 1000", 0.42);
        assertEquals("\r[ 42%] simulate to t = 1000, ETA 4 s", printed());
        now.addAndGet(50_000_000L); // too soon to redraw
        progress.progress("simulate to t = 1000", 0.43);
        assertEquals("\r[ 42%] simulate to t = 1000, ETA 4 s", printed());
        now.addAndGet(1_000_000_000L);
        progress.progress("simulate to t = 1000", 1.0);
        String done = "[100%] simulate to t = 1000", before = "[ 42%] simulate to t = 1000, ETA 4 s";
        assertTrue(printed().endsWith("\r" + done + " ".repeat(before.length() - done.length())), printed());
        progress.clear();
        assertTrue(printed().endsWith("\r" + " ".repeat(done.length()) + "\r"), "the line is blanked");
    }

    @Test
    void shortTasksPrintNothing() {
        progress.progress("lyapunov to t = 10", 0);
        now.set(100_000_000L);
        progress.progress("lyapunov to t = 10", 0.9);
        progress.clear();
        assertEquals("", printed());
    }

    @Test
    void longEtasReadInMinutesAndHours() {
        assertEquals("1 min 30 s", TerminalProgress.duration(90));
        assertEquals("2 h 05 min", TerminalProgress.duration(7500));
        assertEquals("[  0%] section to t = 5", TerminalProgress.line("section to t = 5", 0.001, 1));
    }
}
