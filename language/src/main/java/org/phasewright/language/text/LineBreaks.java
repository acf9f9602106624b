package org.phasewright.language.text;

/**
 * Line breaks as users' editors read them: CR, LF and CRLF each end a line. A lone CR (old-Mac line ends) becomes
 * LF, which has the same length, so every offset stays valid while the parsing library and Xtext's document
 * positions, which count only LF, see the same lines; {@code phasewright check} and the language server both read
 * text through it.
 */
public final class LineBreaks {

    private LineBreaks() {
    }

    /** {@code text} with every CR that is not followed by LF replaced by LF; {@code null} stays {@code null}. */
    public static String loneCrAsLf(String text) {
        if (text == null || text.indexOf('\r') < 0) {
            return text;
        }
        char[] chars = text.toCharArray();
        for (int i = 0; i < chars.length; i++) {
            if (chars[i] == '\r' && (i + 1 == chars.length || chars[i + 1] != '\n')) {
                chars[i] = '\n';
            }
        }
        return new String(chars);
    }
}
