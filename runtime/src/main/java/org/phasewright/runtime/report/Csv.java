package org.phasewright.runtime.report;

import java.io.IOException;
import java.util.List;

/** RFC 4180 fields: a field with a comma, quote, line break or edge space is quoted, with quotes doubled. */
final class Csv {
    private Csv() {
    }

    static String field(String s) {
        if (s == null) {
            return "";
        }
        boolean quote = s.isEmpty() ? false : s.charAt(0) == ' ' || s.charAt(s.length() - 1) == ' ';
        for (int i = 0; i < s.length() && !quote; i++) {
            char c = s.charAt(i);
            quote = c == ',' || c == '"' || c == '\n' || c == '\r';
        }
        return quote ? '"' + s.replace("\"", "\"\"") + '"' : s;
    }

    static void row(Appendable out, List<String> fields) throws IOException {
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                out.append(',');
            }
            out.append(field(fields.get(i)));
        }
        out.append('\n');
    }

    /** Shortest text that reads back to the same double; NaN and infinities as Java spells them. */
    static String number(double x) {
        return Double.toString(x);
    }
}
