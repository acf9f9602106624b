package org.phasewright.runtime.symmetry;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.SplittableRandom;

import org.phasewright.runtime.model.Expr;

/**
 * Checks that a linear map g is a symmetry of du/dt = f(u): f(g·u) = g·f(u), or f(g·u) = −g·f(u) when g reverses
 * time (Golubitsky, Stewart & Schaeffer, Singularities and Groups in Bifurcation Theory II, ch. XII; Lamb &
 * Roberts 1998 for reversing symmetries). Exact on the normal form when every rate is a rational function of the
 * states; otherwise by sampling.
 */
public final class EquivarianceCheck {
    public static final double RELATIVE_TOLERANCE = 1e-9;
    public static final int SAMPLES = 200;
    /** Fixed, so a check gives the same answer on every run and machine. */
    static final long SEED = 0x5EED_2026L;

    private final PreparedField field;
    private final List<String> names;
    private final List<RationalForm> forms; // null when some rate has no rational normal form

    public EquivarianceCheck(PreparedField field, String timeName) {
        this.field = field;
        this.names = field.variableNames(timeName);
        List<RationalForm> f = new ArrayList<>();
        for (Expr rate : field.rates()) {
            Optional<RationalForm> form = field.form(rate);
            if (form.isEmpty()) {
                f = null;
                break;
            }
            f.add(form.get());
        }
        this.forms = f;
    }

    /** True when every rate is a rational function of the states, so checks are exact. */
    public boolean exact() {
        return forms != null;
    }

    public EquivarianceVerdict check(LinearMap g) {
        if (forms != null) {
            EquivarianceVerdict exact = normalForm(g);
            if (exact != null) {
                return exact;
            }
        }
        return sampled(g, SAMPLES, SEED);
    }

    /** Null when a transformed side cannot be brought into normal form (it grew too large). */
    private EquivarianceVerdict normalForm(LinearMap g) {
        List<Expr> images = g.images();
        double sign = g.reversesTime() ? -1 : 1;
        for (int i = 0; i < field.dimension(); i++) {
            Optional<RationalForm> left = field.form(PreparedField.substituteStates(field.rates().get(i), images));
            double[] row = g.matrix()[i].clone();
            for (int j = 0; j < row.length; j++) {
                row[j] *= sign;
            }
            Optional<RationalForm> right = field.form(PreparedField.combination(row, field.rates()));
            if (left.isEmpty() || right.isEmpty()) {
                return null;
            }
            if (!left.get().sameAs(right.get(), RELATIVE_TOLERANCE)) {
                return new EquivarianceVerdict(EquivarianceVerdict.Outcome.BROKEN,
                        EquivarianceVerdict.Method.NORMAL_FORM, i, left.get().text(names), right.get().text(names), 0);
            }
        }
        return new EquivarianceVerdict(EquivarianceVerdict.Outcome.HOLDS, EquivarianceVerdict.Method.NORMAL_FORM, -1,
                null, null, 0);
    }

    /**
     * Compares both sides at {@code count} random points. A point where one side is defined and the other is not
     * (e.g. log of a negative number) breaks the symmetry; points where neither is defined are skipped.
     */
    EquivarianceVerdict sampled(LinearMap g, int count, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        int n = field.dimension();
        double sign = g.reversesTime() ? -1 : 1;
        int compared = 0;
        for (int k = 0; k < count; k++) {
            double[] u = new double[n];
            for (int j = 0; j < n; j++) {
                u[j] = field.typicalSize(j) * random.nextDouble(-2, 2);
            }
            double t = random.nextDouble(0, 10);
            double[] fu = field.evaluate(u, t);
            double[] left = field.evaluate(g.apply(u), t);
            double[] right = g.apply(fu);
            double scale = 0;
            for (int i = 0; i < n; i++) {
                right[i] *= sign;
                scale = Math.max(scale, Math.max(Math.abs(fu[i]), Math.abs(left[i])));
            }
            boolean defined = true;
            for (int i = 0; i < n; i++) {
                boolean l = Double.isFinite(left[i]), r = Double.isFinite(right[i]);
                if (l != r || (l && Math.abs(left[i] - right[i]) > RELATIVE_TOLERANCE * scale)) {
                    return new EquivarianceVerdict(EquivarianceVerdict.Outcome.BROKEN,
                            EquivarianceVerdict.Method.SAMPLED, i, number(left[i]) + " at " + point(u),
                            number(right[i]), k + 1);
                }
                defined &= l;
            }
            compared += defined ? 1 : 0;
        }
        EquivarianceVerdict.Outcome outcome = compared >= count / 4 ? EquivarianceVerdict.Outcome.HOLDS
                : EquivarianceVerdict.Outcome.UNDECIDED;
        return new EquivarianceVerdict(outcome, EquivarianceVerdict.Method.SAMPLED, -1, null, null, compared);
    }

    private static String number(double x) {
        return String.format(java.util.Locale.ROOT, "%.6g", x);
    }

    private String point(double[] u) {
        StringBuilder out = new StringBuilder("(");
        for (int j = 0; j < u.length; j++) {
            out.append(j > 0 ? ", " : "").append(names.get(j)).append(" = ")
                    .append(String.format(java.util.Locale.ROOT, "%.4g", u[j]));
        }
        return out.append(')').toString();
    }
}
