package org.phasewright.language.ide.tests;

import java.util.ArrayList;
import java.util.List;

import org.apache.log4j.AppenderSkeleton;
import org.apache.log4j.Level;
import org.apache.log4j.Logger;
import org.apache.log4j.spi.LoggingEvent;

/**
 * Collects what is logged at ERROR or above (the server logs exceptions of its requests) while it is open. Public
 * for the language server fuzz test in another package.
 */
public final class LoggedErrors extends AppenderSkeleton implements AutoCloseable {
    private final List<String> messages = new ArrayList<>();

    public LoggedErrors() {
        Logger.getRootLogger().addAppender(this);
    }

    @Override
    protected void append(LoggingEvent event) {
        if (event.getLevel().isGreaterOrEqual(Level.ERROR)) {
            synchronized (messages) {
                messages.add(event.getLoggerName() + ": " + event.getRenderedMessage()
                        + (event.getThrowableInformation() == null ? ""
                                : " (" + event.getThrowableInformation().getThrowable() + ")"));
            }
        }
    }

    public List<String> messages() {
        synchronized (messages) {
            return List.copyOf(messages);
        }
    }

    /** What was logged since the last call, so that each finding names the input that caused it. */
    public List<String> take() {
        synchronized (messages) {
            List<String> taken = List.copyOf(messages);
            messages.clear();
            return taken;
        }
    }

    @Override
    public void close() {
        Logger.getRootLogger().removeAppender(this);
    }

    @Override
    public boolean requiresLayout() {
        return false;
    }
}
