package org.phasewright.language.text;

import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Daemon threads with a large stack for parsing and validation, used by {@code phasewright check} (PhaseFiles) and
 * the language server alike: the generated parser recurses several frames per nesting level and overflowed a normal
 * (1 MB) stack at about 500 nested parentheses. The stack is only reserved; memory is used only as deep as a text
 * actually nests.
 */
public final class LargeStackThreads implements ThreadFactory {
    /** 256 MB. */
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
