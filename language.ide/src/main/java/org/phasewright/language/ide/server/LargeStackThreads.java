package org.phasewright.language.ide.server;

import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Daemon threads with a large stack, for the server's parsing and validation: the generated parser recurses several
 * frames per nesting level and overflowed a normal (1 MB) stack at about 500 nested parentheses. The size matches
 * what {@code phasewright check} parses on (see the language's {@code PhaseFiles}); the stack is only reserved, and
 * memory is used only as deep as a text actually nests.
 */
public final class LargeStackThreads implements ThreadFactory {
    /** 256 MB, as the command line. */
    public static final long STACK_BYTES = 256L << 20;

    private final String prefix;
    private final AtomicInteger count = new AtomicInteger();

    public LargeStackThreads(String prefix) {
        this.prefix = prefix;
    }

    @Override
    public Thread newThread(Runnable runnable) {
        Thread thread = new Thread(null, runnable, prefix + "-" + count.incrementAndGet(), STACK_BYTES);
        thread.setDaemon(true);
        return thread;
    }
}
