package org.phasewright.runtime.continuation;

/**
 * A sign-change bracket [a, b] of a test function along a step, shrunk by regula falsi with the Illinois
 * modification (halve the stale end's value when the same end is kept twice) so it converges from both sides.
 * Used to locate special points on equilibrium branches and cycle families.
 */
public final class RegulaFalsiBracket {
    private double a, b, fa, fb;
    private int side;

    public RegulaFalsiBracket(double a, double fa, double b, double fb) {
        this.a = a;
        this.fa = fa;
        this.b = b;
        this.fb = fb;
    }

    /** The next trial point: the secant root, or the midpoint when that falls outside the bracket. */
    public double trial() {
        double s = b - fb * (b - a) / (fb - fa);
        return s > Math.min(a, b) && s < Math.max(a, b) ? s : (a + b) / 2;
    }

    /** Shrinks the bracket with the test function's value {@code fs} at {@code s}. */
    public void update(double s, double fs) {
        if (Math.signum(fs) == Math.signum(fb)) {
            b = s;
            fb = fs;
            if (side == -1) {
                fa /= 2;
            }
            side = -1;
        } else {
            a = b;
            fa = fb;
            b = s;
            fb = fs;
            side = 1;
        }
    }

    public double width() {
        return Math.abs(b - a);
    }

    /** b - a: the direction from the kept end to the newest point, for nudges along the bracket. */
    public double signedWidth() {
        return b - a;
    }
}
