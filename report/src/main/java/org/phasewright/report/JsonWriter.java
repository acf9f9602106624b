package org.phasewright.report;

import java.util.ArrayDeque;
import java.util.Deque;

/**
 * A tiny streaming JSON writer with two-space indentation. Numbers are written so that they read back as the same
 * double; JSON has no NaN or infinity, so those are written as null. Strings are escaped so that the output is valid
 * JSON and also safe to embed in HTML ({@code <}, {@code >} and {@code &} are written as escapes).
 */
final class JsonWriter {
    private final StringBuilder out = new StringBuilder();
    /** Per open container: whether it has an element yet. */
    private final Deque<boolean[]> open = new ArrayDeque<>();
    private boolean afterName;

    JsonWriter beginObject() {
        raw("{");
        open.push(new boolean[1]);
        return this;
    }

    JsonWriter endObject() {
        return close('}');
    }

    JsonWriter beginArray() {
        raw("[");
        open.push(new boolean[1]);
        return this;
    }

    JsonWriter endArray() {
        return close(']');
    }

    JsonWriter name(String name) {
        separate();
        out.append(string(name)).append(": ");
        afterName = true;
        return this;
    }

    JsonWriter value(String s) {
        return raw(s == null ? "null" : string(s));
    }

    JsonWriter value(double x) {
        return raw(number(x));
    }

    JsonWriter value(long x) {
        return raw(Long.toString(x));
    }

    JsonWriter value(boolean b) {
        return raw(Boolean.toString(b));
    }

    JsonWriter nullValue() {
        return raw("null");
    }

    JsonWriter field(String name, String s) {
        return name(name).value(s);
    }

    JsonWriter field(String name, double x) {
        return name(name).value(x);
    }

    JsonWriter field(String name, long x) {
        return name(name).value(x);
    }

    JsonWriter field(String name, boolean b) {
        return name(name).value(b);
    }

    JsonWriter numbers(String name, double[] values) {
        name(name);
        if (values == null) {
            return nullValue();
        }
        StringBuilder line = new StringBuilder("[");
        for (int i = 0; i < values.length; i++) {
            line.append(i > 0 ? ", " : "").append(number(values[i]));
        }
        return raw(line.append(']').toString());
    }

    String finish() {
        if (!open.isEmpty()) {
            throw new IllegalStateException("unclosed JSON container");
        }
        return out.append('\n').toString();
    }

    private JsonWriter raw(String text) {
        if (!afterName) {
            separate();
        }
        afterName = false;
        out.append(text);
        return this;
    }

    private void separate() {
        boolean[] container = open.peek();
        if (container != null) {
            out.append(container[0] ? ",\n" : "\n");
            container[0] = true;
            indent(open.size());
        }
    }

    private JsonWriter close(char closer) {
        boolean[] container = open.pop();
        if (container[0]) {
            out.append('\n');
            indent(open.size());
        }
        out.append(closer);
        return this;
    }

    private void indent(int depth) {
        out.append("  ".repeat(depth));
    }

    static String number(double x) {
        if (!Double.isFinite(x)) {
            return "null";
        }
        if (x == Math.rint(x) && Math.abs(x) < 1e15) {
            return Long.toString((long) x) + (x == 0 && 1 / x < 0 ? ".0" : "");
        }
        return Double.toString(x);
    }

    static String string(String s) {
        StringBuilder b = new StringBuilder(s.length() + 2).append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                default -> {
                    if (c < 0x20 || c == '<' || c == '>' || c == '&' || c == '\u2028' || c == '\u2029'
                            || Character.isSurrogate(c) && !pairedSurrogate(s, i)) {
                        b.append(String.format("\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.append('"').toString();
    }

    private static boolean pairedSurrogate(String s, int i) {
        char c = s.charAt(i);
        if (Character.isHighSurrogate(c)) {
            return i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1));
        }
        return i > 0 && Character.isHighSurrogate(s.charAt(i - 1));
    }
}
