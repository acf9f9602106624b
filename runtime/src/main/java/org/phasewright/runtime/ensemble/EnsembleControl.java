package org.phasewright.runtime.ensemble;

import java.util.function.BooleanSupplier;
import java.util.function.DoubleConsumer;

/**
 * The caller's side of one ensemble run.
 *
 * @param deadlineNanos {@link System#nanoTime()} of the calling JVM after which no point starts, or
 *                      {@link Long#MAX_VALUE}
 * @param cancelled     true stops the run promptly
 * @param progress      hears the fraction of points done, on the calling thread; may be null
 */
public record EnsembleControl(long deadlineNanos, BooleanSupplier cancelled, DoubleConsumer progress) {
    public static final EnsembleControl NONE = new EnsembleControl(Long.MAX_VALUE, () -> false, null);

    public EnsembleControl {
        if (cancelled == null) {
            cancelled = () -> false;
        }
    }

    public boolean expired() {
        return deadlineNanos != Long.MAX_VALUE && System.nanoTime() - deadlineNanos > 0;
    }

    /** Milliseconds left before the deadline (a wall-clock budget other JVMs can use), or Long.MAX_VALUE. */
    public long remainingMillis() {
        return deadlineNanos == Long.MAX_VALUE ? Long.MAX_VALUE
                : Math.max(0, (deadlineNanos - System.nanoTime()) / 1_000_000);
    }
}
