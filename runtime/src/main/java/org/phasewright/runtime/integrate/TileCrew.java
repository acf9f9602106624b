package org.phasewright.runtime.integrate;

import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.concurrent.locks.LockSupport;
import java.util.function.IntConsumer;

/**
 * Helper threads for one integration that runs many short parallel passes (a few hundred microseconds each): the
 * helpers live as long as the integration and spin briefly between passes instead of being woken by a pool, which
 * would cost tens of microseconds per pass. They park when no pass comes, and stop on {@link #close}.
 * <p>
 * A pass always waits for every share, also when one fails, so no helper still works on shared arrays after
 * {@link #run} returns; the first failure is rethrown (as it is, when unchecked), later ones are added to it as
 * suppressed.
 */
final class TileCrew implements AutoCloseable {
    /** How long a helper spins for the next pass before it parks. */
    private static final long SPIN_NANOS = 200_000;
    /** How long the caller, or a waiting helper, spins before it yields between polls. */
    private static final long YIELD_AFTER_NANOS = 20_000;

    private final IntConsumer task;
    private final Thread[] helpers;
    private final AtomicInteger unfinished = new AtomicInteger();
    private final AtomicReference<Throwable> failure = new AtomicReference<>();
    private volatile int pass;
    private volatile boolean closed;

    /** {@code task.accept(w)} runs worker w's share of a pass: w = 0 on the caller, 1..workers-1 on helpers. */
    TileCrew(int workers, IntConsumer task) {
        this.task = task;
        helpers = new Thread[workers - 1];
        try {
            for (int w = 1; w < workers; w++) {
                int worker = w;
                helpers[w - 1] = Thread.ofPlatform().daemon().name("phasewright-tiles-" + w)
                        .unstarted(() -> serve(worker));
                helpers[w - 1].start();
            }
        } catch (RuntimeException | Error e) { // e.g. no more native threads: stop the ones already started
            close();
            throw e;
        }
    }

    /** One pass: every worker's share, returning when all are done. */
    void run() {
        unfinished.set(helpers.length);
        pass++; // publishes the caller's writes before it
        for (Thread h : helpers) {
            LockSupport.unpark(h);
        }
        try {
            task.accept(0);
        } catch (Throwable e) {
            record(e);
        }
        long since = System.nanoTime();
        while (unfinished.get() > 0) { // spin briefly, then leave the processor to others (the JIT's compilers)
            if (System.nanoTime() - since < YIELD_AFTER_NANOS) {
                Thread.onSpinWait();
            } else {
                Thread.yield();
            }
        }
        Throwable f = failure.getAndSet(null);
        if (f instanceof RuntimeException r) {
            throw r;
        }
        if (f instanceof Error e) {
            throw e;
        }
        if (f != null) {
            throw new IllegalStateException(f);
        }
    }

    private void record(Throwable e) {
        if (!failure.compareAndSet(null, e)) {
            Throwable first = failure.get();
            if (first != null && first != e) {
                first.addSuppressed(e);
            }
        }
    }

    private void serve(int worker) {
        int seen = 0;
        while (true) {
            long since = System.nanoTime();
            while (pass == seen && !closed) {
                long waited = System.nanoTime() - since;
                if (waited < YIELD_AFTER_NANOS) {
                    Thread.onSpinWait();
                } else if (waited < SPIN_NANOS) {
                    Thread.yield();
                } else {
                    LockSupport.park(this);
                    Thread.interrupted(); // an interrupt would make every later park return at once
                }
            }
            if (closed) {
                return;
            }
            seen = pass;
            try {
                task.accept(worker);
            } catch (Throwable e) {
                record(e);
            } finally {
                unfinished.decrementAndGet();
            }
        }
    }

    /** Stops the helpers and waits (briefly) until they have ended. */
    @Override
    public void close() {
        closed = true;
        for (Thread h : helpers) {
            if (h != null) {
                LockSupport.unpark(h);
            }
        }
        for (Thread h : helpers) {
            if (h != null && h.isAlive()) {
                try {
                    h.join(1000);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                }
            }
        }
    }
}
