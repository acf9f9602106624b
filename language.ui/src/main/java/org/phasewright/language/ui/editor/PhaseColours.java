package org.phasewright.language.ui.editor;

import java.util.EnumMap;
import java.util.Map;

import org.eclipse.jface.text.TextAttribute;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.phasewright.language.ui.highlight.TokenClass;

/** The editor's colour scheme: declarations by kind, so states, params and lets stand apart in rate laws. */
final class PhaseColours {
    private PhaseColours() {
    }

    static Map<TokenClass, TextAttribute> attributes() {
        Map<TokenClass, TextAttribute> map = new EnumMap<>(TokenClass.class);
        map.put(TokenClass.KEYWORD, new TextAttribute(new Color(0x7a, 0x1f, 0x5c), null, SWT.BOLD));
        map.put(TokenClass.NUMBER, new TextAttribute(new Color(0x1c, 0x5d, 0x99)));
        map.put(TokenClass.STRING, new TextAttribute(new Color(0x2e, 0x7d, 0x32)));
        map.put(TokenClass.COMMENT, new TextAttribute(new Color(0x80, 0x80, 0x80), null, SWT.ITALIC));
        map.put(TokenClass.FUNCTION, new TextAttribute(new Color(0x00, 0x69, 0x6b)));
        map.put(TokenClass.STATE, new TextAttribute(new Color(0xb3, 0x4a, 0x00), null, SWT.BOLD));
        map.put(TokenClass.PARAM, new TextAttribute(new Color(0x4a, 0x3a, 0xa8)));
        map.put(TokenClass.LET, new TextAttribute(new Color(0x8a, 0x6d, 0x00)));
        map.put(TokenClass.TIME, new TextAttribute(new Color(0x00, 0x7a, 0x3d), null, SWT.ITALIC));
        return map;
    }
}
