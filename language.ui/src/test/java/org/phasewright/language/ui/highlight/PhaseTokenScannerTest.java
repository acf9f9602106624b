package org.phasewright.language.ui.highlight;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.EnumMap;
import java.util.Map;

import org.eclipse.jface.text.Document;
import org.eclipse.jface.text.TextAttribute;
import org.eclipse.jface.text.rules.IToken;
import org.junit.jupiter.api.Test;

/** The JFace adapter, without a display: tokens tile the requested range and carry the class's attribute. */
class PhaseTokenScannerTest {
    private final Map<TokenClass, TextAttribute> attributes = new EnumMap<>(TokenClass.class);
    private final PhaseTokenScanner scanner;

    PhaseTokenScannerTest() {
        for (TokenClass tokenClass : TokenClass.values()) {
            attributes.put(tokenClass, new TextAttribute(null, null, tokenClass.ordinal()));
        }
        scanner = new PhaseTokenScanner(attributes);
    }

    @Test
    void tokensTileTheRangeAndCarryTheirClass() {
        Document document = new Document("model m\n/* a\nb */ state x = 1\nrate x = -x\n");
        scanner.setDeclaredKinds(Map.of("x", TokenClass.STATE));
        int start = document.get().indexOf("b */"); // inside the block comment, as after a partial damage
        int end = document.getLength();
        scanner.setRange(document, start, end - start);
        int cursor = start;
        StringBuilder classes = new StringBuilder();
        for (IToken token = scanner.nextToken(); !token.isEOF(); token = scanner.nextToken()) {
            assertEquals(cursor, scanner.getTokenOffset(), "tokens must be contiguous");
            cursor += scanner.getTokenLength();
            if (token.getData() instanceof TextAttribute attribute) {
                String word = document.get().substring(scanner.getTokenOffset(), cursor);
                classes.append(word).append('=').append(TokenClass.values()[attribute.getStyle()]).append(' ');
            }
        }
        assertEquals(end, cursor);
        assertEquals("b */=COMMENT state=KEYWORD x=STATE ==OPERATOR 1=NUMBER rate=KEYWORD x=STATE ==OPERATOR "
                + "-=OPERATOR x=STATE ", classes.toString());
    }

    @Test
    void whitespaceIsReportedAsWhitespace() {
        Document document = new Document("model   m");
        scanner.setRange(document, 0, document.getLength());
        scanner.nextToken();
        IToken blank = scanner.nextToken();
        assertSame(true, blank.isWhitespace());
        assertEquals(3, scanner.getTokenLength());
    }
}
