package org.phasewright.language.ide.server;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

import org.eclipse.xtext.ide.server.concurrent.AbstractRequest;
import org.eclipse.xtext.ide.server.concurrent.RequestManager;
import org.eclipse.xtext.service.OperationCanceledManager;
import org.phasewright.language.text.LargeStackThreads;

import com.google.inject.Inject;
import com.google.inject.Singleton;

/**
 * Xtext's request manager, with its queue on a large-stack thread. Write requests (didOpen, didChange, didSave and
 * the workspace build, so all parsing and validation) run on the queue thread itself, which Xtext creates with a
 * normal stack and does not take from the {@link org.eclipse.xtext.ide.ExecutorServiceProvider}; read requests run
 * on the injected executor ({@link LargeStackExecutorServiceProvider}).
 */
@Singleton
public class PhaseRequestManager extends RequestManager {

    private final ExecutorService largeStackQueue = Executors
            .newSingleThreadExecutor(new LargeStackThreads("phase-request-queue"));

    @Inject
    public PhaseRequestManager(ExecutorService parallel, OperationCanceledManager operationCanceledManager) {
        super(parallel, operationCanceledManager);
    }

    @Override
    protected void submitRequest(AbstractRequest<?> request) {
        largeStackQueue.submit(request);
    }

    @Override
    public void shutdown() {
        largeStackQueue.shutdown();
        super.shutdown();
    }
}
