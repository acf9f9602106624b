package org.phasewright.language.ide.server;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.eclipse.lsp4j.Position;
import org.eclipse.lsp4j.SemanticTokenModifiers;
import org.eclipse.lsp4j.SemanticTokenTypes;
import org.eclipse.lsp4j.SemanticTokens;
import org.eclipse.lsp4j.SemanticTokensParams;
import org.eclipse.xtext.ide.server.Document;
import org.eclipse.xtext.ide.server.semantictokens.SemanticTokensService;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.util.CancelIndicator;
import org.phasewright.language.ide.highlighting.SemanticClassifier;
import org.phasewright.language.ide.highlighting.SemanticKind;
import org.phasewright.language.ide.highlighting.SemanticRegion;

/**
 * Semantic tokens from {@link SemanticClassifier}, in the standard token types so that any client theme colours them:
 * states are variables, params read-only parameters, lets read-only properties, the time variable a static
 * variable, units types, built-in functions and `pi` default-library items. Tokens that span lines (block comments)
 * are split per line, since clients need not support multi-line tokens.
 */
public class PhaseSemanticTokensService extends SemanticTokensService {
    private static final Map<SemanticKind, String> TYPES = new EnumMap<>(SemanticKind.class);

    static {
        TYPES.put(SemanticKind.KEYWORD, SemanticTokenTypes.Keyword);
        TYPES.put(SemanticKind.OPERATOR, SemanticTokenTypes.Operator);
        TYPES.put(SemanticKind.COMMENT, SemanticTokenTypes.Comment);
        TYPES.put(SemanticKind.STRING, SemanticTokenTypes.String);
        TYPES.put(SemanticKind.NUMBER, SemanticTokenTypes.Number);
        TYPES.put(SemanticKind.CONSTANT, SemanticTokenTypes.Variable);
        TYPES.put(SemanticKind.FUNCTION, SemanticTokenTypes.Function);
        TYPES.put(SemanticKind.UNIT, SemanticTokenTypes.Type);
        TYPES.put(SemanticKind.MODEL, SemanticTokenTypes.Namespace);
        TYPES.put(SemanticKind.STATE, SemanticTokenTypes.Variable);
        TYPES.put(SemanticKind.PARAM, SemanticTokenTypes.Parameter);
        TYPES.put(SemanticKind.LET, SemanticTokenTypes.Property);
        TYPES.put(SemanticKind.TIME, SemanticTokenTypes.Variable);
        TYPES.put(SemanticKind.SYMMETRY, SemanticTokenTypes.Struct);
        TYPES.put(SemanticKind.STUDY, SemanticTokenTypes.Event);
    }

    private static final List<String> MODIFIERS = List.of(SemanticTokenModifiers.Declaration,
            SemanticTokenModifiers.Readonly, SemanticTokenModifiers.DefaultLibrary, SemanticTokenModifiers.Static);

    public PhaseSemanticTokensService() {
        super();
    }

    @Override
    protected void addTokenTypes() {
        for (String type : TYPES.values()) {
            if (!getTokenTypes().contains(type)) {
                getTokenTypes().add(type);
            }
        }
    }

    @Override
    protected void addTokenModifiers() {
        getTokenModifiers().addAll(MODIFIERS);
    }

    @Override
    public SemanticTokens semanticTokensFull(Document document, XtextResource resource, SemanticTokensParams params,
            CancelIndicator cancelIndicator) {
        List<Integer> data = new ArrayList<>();
        if (document == null || resource == null) {
            return new SemanticTokens(data);
        }
        SemanticClassifier classifier = resource.getResourceServiceProvider().get(SemanticClassifier.class);
        List<SemanticRegion> regions = new ArrayList<>(classifier.classify(resource));
        regions.sort(Comparator.comparingInt(SemanticRegion::offset));
        String text = document.getContents();
        int lastLine = 0;
        int lastCharacter = 0;
        for (SemanticRegion region : regions) {
            if (cancelIndicator.isCanceled()) {
                break;
            }
            int type = getTokenTypes().indexOf(TYPES.get(region.kind()));
            int modifiers = modifiers(region);
            int start = region.offset();
            int end = Math.min(text.length(), region.offset() + region.length());
            while (start < end) {
                int lineBreak = text.indexOf('\n', start);
                int pieceEnd = lineBreak < 0 || lineBreak >= end ? end : lineBreak;
                int length = pieceEnd - start - (pieceEnd > start && text.charAt(pieceEnd - 1) == '\r' ? 1 : 0);
                if (length > 0) {
                    Position position = document.getPosition(start);
                    int deltaLine = position.getLine() - lastLine;
                    data.add(deltaLine);
                    data.add(deltaLine == 0 ? position.getCharacter() - lastCharacter : position.getCharacter());
                    data.add(length);
                    data.add(type);
                    data.add(modifiers);
                    lastLine = position.getLine();
                    lastCharacter = position.getCharacter();
                }
                start = pieceEnd + 1;
            }
        }
        return new SemanticTokens(data);
    }

    private int modifiers(SemanticRegion region) {
        int bits = 0;
        if (region.declaration()) {
            bits |= bit(SemanticTokenModifiers.Declaration);
        }
        switch (region.kind()) {
            case PARAM, LET -> bits |= bit(SemanticTokenModifiers.Readonly);
            case CONSTANT -> bits |= bit(SemanticTokenModifiers.Readonly) | bit(SemanticTokenModifiers.DefaultLibrary);
            case FUNCTION -> bits |= bit(SemanticTokenModifiers.DefaultLibrary);
            case TIME -> bits |= bit(SemanticTokenModifiers.Static);
            default -> {
            }
        }
        return bits;
    }

    private int bit(String modifier) {
        return 1 << getTokenModifiers().indexOf(modifier);
    }
}
