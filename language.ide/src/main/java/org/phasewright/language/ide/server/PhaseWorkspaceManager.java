package org.phasewright.language.ide.server;

import java.util.HashMap;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.xtext.ide.server.Document;
import org.eclipse.xtext.ide.server.WorkspaceManager;

/**
 * Xtext's workspace manager, with every open document kept as a {@link ClientDocument}: Xtext counts only LF as a
 * line break, so lone CRs are read as LF (as {@code phasewright check} does) for parsing and for positions.
 */
public class PhaseWorkspaceManager extends WorkspaceManager {

    /** Called from the super constructor: uses no field of this class. */
    @Override
    protected Map<URI, Document> createOpenDocuments() {
        // The workspace manager stores documents only through put (didOpen, and didChange with the changes applied).
        return new HashMap<>() {
            private static final long serialVersionUID = 1L;

            @Override
            public Document put(URI uri, Document document) {
                return super.put(uri, document == null || document instanceof ClientDocument ? document
                        : new ClientDocument(document.getVersion(), document.getContents(),
                                document.isPrintSourceOnError()));
            }
        };
    }
}
