package org.phasewright.language.ide.server;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

import org.eclipse.xtext.ide.ExecutorServiceProvider;
import org.phasewright.language.text.LargeStackThreads;

import com.google.inject.Singleton;

/**
 * Xtext's executors (the server's read requests: hover, symbols, semantic tokens, ...; content assist), on threads
 * with a large stack ({@link LargeStackThreads}) so that deeply nested text does not overflow them.
 */
@Singleton
public class LargeStackExecutorServiceProvider extends ExecutorServiceProvider {

    @Override
    protected ExecutorService createInstance(String key) {
        return Executors.newCachedThreadPool(new LargeStackThreads(key == null ? "phase-server" : "phase-" + key));
    }
}
