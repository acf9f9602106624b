package org.phasewright.runtime.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;

/** Numbers for people: six significant digits, no trailing zeros, scientific only for very large or small values. */
final class Numbers {
    private Numbers() {
    }

    static String compact(double x) {
        if (!Double.isFinite(x)) {
            return Double.toString(x);
        }
        if (x == 0) {
            return "0";
        }
        double a = Math.abs(x);
        if (a >= 1e-4 && a < 1e7) {
            return new BigDecimal(x).round(new MathContext(6)).stripTrailingZeros().toPlainString();
        }
        String s = String.format(Locale.ROOT, "%.5e", x); // e.g. 1.23450e-07
        int e = s.indexOf('e');
        String mantissa = s.substring(0, e).replaceAll("0+$", "").replaceAll("\\.$", "");
        return mantissa + s.substring(e);
    }

    /** "a ± bi" for a complex pair, "a + bi"/"a - bi" for a lone complex value, "a" for a real one. */
    static String complex(double re, double im, boolean pair) {
        if (im == 0) {
            return compact(re);
        }
        String sign = pair ? " ± " : im > 0 ? " + " : " - ";
        return compact(re) + sign + compact(Math.abs(im)) + "i";
    }
}
