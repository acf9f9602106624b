package org.phasewright.report;

/** Escaping for HTML text and attribute values: the only way user text enters a report. */
final class Html {
    private Html() {
    }

    /** Escapes &amp; &lt; &gt; &quot; &#39; and replaces control characters and lone surrogates. */
    static String escape(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder b = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> {
                    boolean control = c < 0x20 && c != '\n' && c != '\t' && c != '\r' || c == 0x7f;
                    boolean lone = Character.isHighSurrogate(c)
                            ? !(i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1)))
                            : Character.isLowSurrogate(c) && !(i > 0 && Character.isHighSurrogate(s.charAt(i - 1)));
                    b.append(control || lone ? '\uFFFD' : c);
                }
            }
        }
        return b.toString();
    }
}
