package org.phasewright.report;

import java.util.Locale;

/** Numbers for people: short but not lossy where it matters. results.json carries the exact values. */
final class Formats {
    private Formats() {
    }

    /** "1000" rather than "1000.0"; other values with up to 6 significant digits. */
    static String plain(double x) {
        if (Double.isNaN(x)) {
            return "n/a";
        }
        if (Double.isInfinite(x)) {
            return x > 0 ? "∞" : "−∞";
        }
        if (x == Math.rint(x) && Math.abs(x) < 1e15) {
            return Long.toString((long) x);
        }
        return number(x);
    }

    /** Six significant digits, scientific notation outside [1e-4, 1e6). */
    static String number(double x) {
        if (!Double.isFinite(x)) {
            return plain(x);
        }
        double a = Math.abs(x);
        if (a != 0 && (a < 1e-4 || a >= 1e6)) {
            return String.format(Locale.ROOT, "%.5e", x).replaceFirst("\\.?0+e", "e");
        }
        String s = String.format(Locale.ROOT, "%.6g", x);
        if (s.contains(".") && !s.contains("e")) {
            s = s.replaceFirst("0+$", "").replaceFirst("\\.$", "");
        }
        return s;
    }

    /** A duration in seconds for people: "0.84 s", "12.3 s", "2 min 05 s". */
    static String seconds(double s) {
        if (s < 10) {
            return String.format(Locale.ROOT, "%.2f s", s);
        }
        if (s < 60) {
            return String.format(Locale.ROOT, "%.1f s", s);
        }
        long whole = Math.round(s);
        return String.format(Locale.ROOT, "%d min %02d s", whole / 60, whole % 60);
    }
}
