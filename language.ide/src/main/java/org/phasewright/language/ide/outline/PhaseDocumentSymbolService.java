package org.phasewright.language.ide.outline;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.lsp4j.DocumentSymbol;
import org.eclipse.lsp4j.DocumentSymbolParams;
import org.eclipse.lsp4j.Range;
import org.eclipse.lsp4j.SymbolKind;
import org.eclipse.xtext.ide.server.Document;
import org.eclipse.xtext.ide.server.symbol.HierarchicalDocumentSymbolService;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.util.CancelIndicator;

import com.google.inject.Inject;

/** Language-server outline (hierarchical document symbols) built from {@link PhaseOutline}. */
public class PhaseDocumentSymbolService extends HierarchicalDocumentSymbolService {

    @Inject
    private PhaseOutline outline;

    @Override
    public List<DocumentSymbol> getSymbols(Document document, XtextResource resource, DocumentSymbolParams params,
            CancelIndicator cancelIndicator) {
        List<DocumentSymbol> symbols = new ArrayList<>();
        outline.of(resource).ifPresent(root -> symbols.add(toSymbol(root, document)));
        return symbols;
    }

    private static DocumentSymbol toSymbol(OutlineNode node, Document document) {
        Range whole = new Range(document.getPosition(node.offset()), document.getPosition(node.offset() + node.length()));
        Range name = new Range(document.getPosition(node.nameOffset()),
                document.getPosition(node.nameOffset() + node.nameLength()));
        DocumentSymbol symbol = new DocumentSymbol(node.name(), kind(node.kind()), whole, name, node.detail());
        List<DocumentSymbol> children = new ArrayList<>();
        node.children().forEach(child -> children.add(toSymbol(child, document)));
        symbol.setChildren(children);
        return symbol;
    }

    /** The closest standard symbol kinds, so generic clients pick sensible icons. */
    static SymbolKind kind(OutlineKind kind) {
        return switch (kind) {
            case MODEL -> SymbolKind.Module;
            case TIME -> SymbolKind.TypeParameter;
            case PARAM -> SymbolKind.Constant;
            case STATE -> SymbolKind.Variable;
            case LET -> SymbolKind.Property;
            case RATE -> SymbolKind.Function;
            case SYMMETRY -> SymbolKind.Struct;
            case STUDY -> SymbolKind.Event;
            case ANALYSIS -> SymbolKind.Method;
        };
    }
}
