package org.phasewright.runtime.symmetry;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Symmetry;

/**
 * Uses the declared symmetries on equilibria: a symmetry maps equilibria to equilibria (a time-reversing one too,
 * since −g·0 = 0), so the found ones fall into orbits; each has an isotropy; and the fixed-point subspaces of the
 * forward symmetries are invariant under the flow.
 */
public final class SymmetryAnalysis {
    /** Two equilibria are the same point when they agree to this, relative to their size (Newton is far tighter). */
    static final double MATCH = 1e-6;
    /** Intersections are formed over at most this many symmetries (2^k subsets). */
    private static final int MAX_SUBSET_SYMMETRIES = 8;
    /** The image of an equilibrium is an equilibrium; if the search did not find it, the list is incomplete. */
    public static final String MISSING = "not among the equilibria found";

    private SymmetryAnalysis() {
    }

    /** The declared symmetries that are linear maps; others are the checker's to report. */
    public static List<LinearMap> linearMaps(DynamicalModel model) {
        List<LinearMap> maps = new ArrayList<>();
        for (Symmetry s : model.symmetries()) {
            LinearMap.of(s, model.dimension()).filter(LinearMap::invertible).ifPresent(maps::add);
        }
        return maps;
    }

    public static SymmetryReport analyse(List<LinearMap> symmetries, List<String> names, List<double[]> points,
            List<String> stateNames) {
        if (symmetries.isEmpty()) {
            return SymmetryReport.NONE;
        }
        int count = points.size();
        int[] parent = new int[count];
        for (int k = 0; k < count; k++) {
            parent[k] = k;
        }
        List<List<String>> isotropy = new ArrayList<>();
        List<List<String>> images = new ArrayList<>();
        for (int k = 0; k < count; k++) {
            List<String> fixing = new ArrayList<>();
            List<String> imageList = new ArrayList<>();
            for (LinearMap g : symmetries) {
                double[] image = g.apply(points.get(k));
                if (same(image, points.get(k))) {
                    fixing.add(g.name());
                }
                int match = find(image, points);
                imageList.add(g.name() + ": " + (match < 0 ? MISSING : names.get(match)));
                if (match >= 0) {
                    union(parent, k, match);
                }
            }
            isotropy.add(fixing);
            images.add(imageList);
        }
        Map<Integer, Integer> orbitNumber = new LinkedHashMap<>();
        List<EquilibriumSymmetry> perEquilibrium = new ArrayList<>();
        for (int k = 0; k < count; k++) {
            int orbit = orbitNumber.computeIfAbsent(root(parent, k), r -> orbitNumber.size() + 1);
            perEquilibrium.add(new EquilibriumSymmetry(names.get(k), orbit, isotropy.get(k), images.get(k)));
        }
        List<String> symmetryNames = symmetries.stream().map(LinearMap::name).toList();
        return new SymmetryReport(symmetryNames, perEquilibrium, invariantSubspaces(symmetries, stateNames));
    }

    /** Fix(H) for every non-empty set H of forward symmetries (up to 2^8), without repeats or the whole space. */
    public static List<InvariantSubspace> invariantSubspaces(List<LinearMap> symmetries, List<String> stateNames) {
        List<LinearMap> forward = symmetries.stream().filter(g -> !g.reversesTime()).toList();
        forward = forward.subList(0, Math.min(forward.size(), MAX_SUBSET_SYMMETRIES));
        int n = stateNames.size();
        Map<String, InvariantSubspace> found = new LinkedHashMap<>();
        for (int mask = 1; mask < (1 << forward.size()); mask++) {
            List<double[]> rows = new ArrayList<>();
            List<String> by = new ArrayList<>();
            for (int s = 0; s < forward.size(); s++) {
                if ((mask >> s & 1) == 1) {
                    double[][] m = forward.get(s).matrix();
                    for (int i = 0; i < n; i++) {
                        double[] row = m[i].clone();
                        row[i] -= 1; // g − I: Fix(g) is its null space
                        rows.add(row);
                    }
                    by.add(forward.get(s).name());
                }
            }
            List<double[]> equations = Subspaces.reducedRows(rows.toArray(double[][]::new));
            if (equations.isEmpty()) {
                continue; // the identity fixes everything
            }
            String text = equationsText(equations, stateNames);
            if (!found.containsKey(text)) {
                found.put(text, new InvariantSubspace(text, describe(equations, stateNames), n - equations.size(),
                        by));
            }
        }
        return new ArrayList<>(found.values());
    }

    /** Each row as "pivot = combination of the others", e.g. "x = 0", "x = y", "x = -y". */
    static String equationsText(List<double[]> rows, List<String> names) {
        List<String> parts = new ArrayList<>();
        for (double[] row : rows) {
            int pivot = 0;
            while (row[pivot] == 0) {
                pivot++;
            }
            StringBuilder right = new StringBuilder();
            for (int j = pivot + 1; j < row.length; j++) {
                double c = -row[j];
                if (c == 0) {
                    continue;
                }
                right.append(right.length() == 0 ? (c < 0 ? "-" : "") : (c < 0 ? " - " : " + "));
                double size = Math.abs(c);
                right.append(Math.abs(size - 1) < 1e-12 ? "" : compact(size) + "*").append(names.get(j));
            }
            parts.add(names.get(pivot) + " = " + (right.length() == 0 ? "0" : right));
        }
        return String.join(", ", parts);
    }

    private static String describe(List<double[]> rows, List<String> names) {
        int n = names.size();
        if (rows.size() == n) {
            return "the origin";
        }
        boolean[] zero = new boolean[n];
        for (double[] row : rows) {
            int nonZero = 0, at = -1;
            for (int j = 0; j < n; j++) {
                if (row[j] != 0) {
                    nonZero++;
                    at = j;
                }
            }
            if (nonZero != 1) {
                return equationsText(rows, names);
            }
            zero[at] = true;
        }
        List<String> free = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            if (!zero[j]) {
                free.add(names.get(j));
            }
        }
        return free.size() == 1 ? "the " + free.get(0) + " axis"
                : free.size() == 2 ? "the " + free.get(0) + "-" + free.get(1) + " plane"
                        : "the " + String.join("-", free) + " subspace";
    }

    private static String compact(double x) {
        return x == Math.rint(x) ? Long.toString((long) x) : String.format(java.util.Locale.ROOT, "%.6g", x);
    }

    private static int find(double[] image, List<double[]> points) {
        for (int k = 0; k < points.size(); k++) {
            if (same(image, points.get(k))) {
                return k;
            }
        }
        return -1;
    }

    static boolean same(double[] a, double[] b) {
        double size = 1;
        for (int i = 0; i < a.length; i++) {
            size = Math.max(size, Math.max(Math.abs(a[i]), Math.abs(b[i])));
        }
        for (int i = 0; i < a.length; i++) {
            if (!(Math.abs(a[i] - b[i]) <= MATCH * size)) {
                return false;
            }
        }
        return true;
    }

    private static int root(int[] parent, int k) {
        while (parent[k] != k) {
            parent[k] = parent[parent[k]];
            k = parent[k];
        }
        return k;
    }

    private static void union(int[] parent, int a, int b) {
        parent[root(parent, a)] = root(parent, b);
    }
}
