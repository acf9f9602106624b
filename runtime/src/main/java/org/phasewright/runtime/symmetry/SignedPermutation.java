package org.phasewright.runtime.symmetry;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A signed permutation of the states, possibly reversing time: (g·u)_i = signs[i] * u[source[i]].
 * The candidates of symmetry discovery, and the elements of the group they generate.
 */
public record SignedPermutation(int[] source, int[] signs, boolean reversesTime) {

    public static SignedPermutation identity(int n) {
        int[] source = new int[n];
        int[] signs = new int[n];
        for (int i = 0; i < n; i++) {
            source[i] = i;
            signs[i] = 1;
        }
        return new SignedPermutation(source, signs, false);
    }

    /** The signed permutation a matrix is, or null when it is some other linear map. */
    public static SignedPermutation of(LinearMap map) {
        int n = map.dimension();
        int[] source = new int[n];
        int[] signs = new int[n];
        boolean[] used = new boolean[n];
        for (int i = 0; i < n; i++) {
            int found = -1;
            for (int j = 0; j < n; j++) {
                double a = map.matrix()[i][j];
                if (a != 0) {
                    if (found >= 0 || Math.abs(a) != 1 || used[j]) {
                        return null;
                    }
                    found = j;
                }
            }
            if (found < 0) {
                return null;
            }
            used[found] = true;
            source[i] = found;
            signs[i] = (int) Math.signum(map.matrix()[i][found]);
        }
        return new SignedPermutation(source, signs, map.reversesTime());
    }

    /** g∘h: first h, then g. */
    public SignedPermutation after(SignedPermutation h) {
        int n = source.length;
        int[] s = new int[n];
        int[] sg = new int[n];
        for (int i = 0; i < n; i++) {
            s[i] = h.source[source[i]];
            sg[i] = signs[i] * h.signs[source[i]];
        }
        return new SignedPermutation(s, sg, reversesTime ^ h.reversesTime);
    }

    public boolean isIdentity() {
        return equals(identity(source.length));
    }

    /** How many states it moves or flips. */
    int moved() {
        int count = 0;
        for (int i = 0; i < source.length; i++) {
            count += source[i] != i || signs[i] != 1 ? 1 : 0;
        }
        return count;
    }

    public LinearMap map(String name) {
        int n = source.length;
        double[][] m = new double[n][n];
        for (int i = 0; i < n; i++) {
            m[i][source[i]] = signs[i];
        }
        return new LinearMap(name, m, reversesTime);
    }

    /** The notation for it, e.g. {@code symmetry s1: x -> -x, y -> -y} or {@code ... reverses time}. */
    public String declaration(String name, List<String> states) {
        List<String> maps = new ArrayList<>();
        for (int i = 0; i < source.length; i++) {
            if (source[i] != i || signs[i] != 1) {
                maps.add(states.get(i) + " -> " + (signs[i] < 0 ? "-" : "") + states.get(source[i]));
            }
        }
        if (maps.isEmpty()) { // only time is reversed: the grammar needs one map, so say a state stays
            maps.add(states.get(0) + " -> " + states.get(0));
        }
        return "symmetry " + name + ": " + String.join(", ", maps) + (reversesTime ? " reverses time" : "");
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof SignedPermutation p && Arrays.equals(source, p.source) && Arrays.equals(signs, p.signs)
                && reversesTime == p.reversesTime;
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(source) + Arrays.hashCode(signs)) + (reversesTime ? 1 : 0);
    }

    @Override
    public String toString() {
        return "SignedPermutation" + Arrays.toString(source) + Arrays.toString(signs) + (reversesTime ? "R" : "");
    }
}
