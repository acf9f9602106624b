package org.phasewright.runtime.report;

/** The little JSON the reports need: string escaping and numbers (JSON has no NaN or infinity, so those are null). */
final class Json {
    private Json() {
    }

    static String string(String s) {
        if (s == null) {
            return "null";
        }
        StringBuilder out = new StringBuilder(s.length() + 2).append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> out.append("\\\"");
                case '\\' -> out.append("\\\\");
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                case '\t' -> out.append("\\t");
                case '\b' -> out.append("\\b");
                case '\f' -> out.append("\\f");
                default -> {
                    // Control characters must be escaped, U+2028/9 break JavaScript, and a lone surrogate cannot be
                    // encoded in UTF-8 (it would silently become a question mark), so these are written as escapes.
                    if (c < 0x20 || c == '\u2028' || c == '\u2029' || loneSurrogate(s, i)) {
                        out.append(String.format("\\u%04x", (int) c));
                    } else {
                        out.append(c);
                    }
                }
            }
        }
        return out.append('"').toString();
    }

    private static boolean loneSurrogate(String s, int i) {
        char c = s.charAt(i);
        if (Character.isHighSurrogate(c)) {
            return !(i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1)));
        }
        if (Character.isLowSurrogate(c)) {
            return !(i > 0 && Character.isHighSurrogate(s.charAt(i - 1)));
        }
        return false;
    }

    static String number(double x) {
        return Double.isFinite(x) ? Double.toString(x) : "null";
    }
}
