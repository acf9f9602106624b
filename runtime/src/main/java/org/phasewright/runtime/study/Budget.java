package org.phasewright.runtime.study;

import java.util.function.BooleanSupplier;

/** The deadline and cancellation flag shared by all analyses of one study run. */
record Budget(long deadlineNanos, BooleanSupplier cancelled) {
    static Budget start(RunSettings settings) {
        long deadline = settings.wallTimeLimit() == null ? Long.MAX_VALUE
                : System.nanoTime() + settings.wallTimeLimit().toNanos();
        return new Budget(deadline, settings.cancelled());
    }

    boolean expired() {
        return deadlineNanos != Long.MAX_VALUE && System.nanoTime() - deadlineNanos > 0;
    }
}
