package org.phasewright.runtime.linalg;

import java.util.Arrays;

/**
 * Reverse Cuthill–McKee ordering (Cuthill &amp; McKee 1969; reversed as George 1971 found it fills less) of the
 * symmetrised pattern A + Aᵀ: breadth-first from a pseudo-peripheral vertex (George &amp; Liu 1979), neighbours by
 * increasing degree. It gathers a banded or ring-shaped Jacobian into a narrow band, so LU fills in only inside it.
 */
public final class SparseOrdering {
    private SparseOrdering() {
    }

    /** perm[k] = the original index placed at position k. */
    public static int[] reverseCuthillMcKee(SparsePattern a) {
        int n = a.dimension();
        int[][] graph = symmetric(a);
        int[] start = graph[0], adj = graph[1];
        int[] degree = new int[n];
        for (int i = 0; i < n; i++) {
            degree[i] = start[i + 1] - start[i];
        }
        // neighbours by increasing degree, once, so every BFS visits them in that order
        for (int i = 0; i < n; i++) {
            sortByDegree(adj, start[i], start[i + 1], degree);
        }
        int[] order = new int[n];
        boolean[] placed = new boolean[n];
        int[] level = new int[n];
        int count = 0;
        for (int seed = 0; seed < n; seed++) {
            if (placed[seed]) {
                continue;
            }
            int root = peripheral(seed, start, adj, degree, level);
            placed[root] = true;
            int head = count;
            order[count++] = root;
            while (head < count) {
                int v = order[head++];
                for (int k = start[v]; k < start[v + 1]; k++) {
                    int w = adj[k];
                    if (!placed[w]) {
                        placed[w] = true;
                        order[count++] = w;
                    }
                }
            }
        }
        for (int i = 0, j = n - 1; i < j; i++, j--) {
            int t = order[i];
            order[i] = order[j];
            order[j] = t;
        }
        return order;
    }

    /** Structure of A + Aᵀ without the diagonal: {start, adjacency}. */
    private static int[][] symmetric(SparsePattern a) {
        int n = a.dimension();
        int[] count = new int[n + 1];
        for (int i = 0; i < n; i++) {
            for (int k = a.rowStart(i); k < a.rowEnd(i); k++) {
                int j = a.column(k);
                if (j != i) {
                    count[i + 1]++;
                    count[j + 1]++;
                }
            }
        }
        for (int i = 0; i < n; i++) {
            count[i + 1] += count[i];
        }
        int[] next = Arrays.copyOf(count, n);
        int[] adj = new int[count[n]];
        for (int i = 0; i < n; i++) {
            for (int k = a.rowStart(i); k < a.rowEnd(i); k++) {
                int j = a.column(k);
                if (j != i) {
                    adj[next[i]++] = j;
                    adj[next[j]++] = i;
                }
            }
        }
        // remove duplicates (an entry present in both A and Aᵀ)
        int[] start = new int[n + 1];
        int out = 0;
        for (int i = 0; i < n; i++) {
            int from = count[i], to = count[i + 1];
            Arrays.sort(adj, from, to);
            start[i] = out;
            for (int k = from; k < to; k++) {
                if (k == from || adj[k] != adj[k - 1]) {
                    adj[out++] = adj[k];
                }
            }
        }
        start[n] = out;
        return new int[][] {start, adj};
    }

    private static void sortByDegree(int[] adj, int from, int to, int[] degree) {
        for (int i = from + 1; i < to; i++) { // insertion sort: rows of a Jacobian are short
            int v = adj[i];
            int j = i - 1;
            while (j >= from && (degree[adj[j]] > degree[v] || (degree[adj[j]] == degree[v] && adj[j] > v))) {
                adj[j + 1] = adj[j];
                j--;
            }
            adj[j + 1] = v;
        }
    }

    /** A vertex of (nearly) maximal eccentricity in the component of {@code seed}. */
    private static int peripheral(int seed, int[] start, int[] adj, int[] degree, int[] level) {
        int root = seed;
        int depth = -1;
        for (int round = 0; round < 8; round++) {
            int[] result = levels(root, start, adj, level);
            int d = result[0], last = result[1];
            if (d <= depth) {
                break;
            }
            depth = d;
            root = last;
        }
        return root;
    }

    /** BFS from root: {depth, a vertex of smallest degree in the last level}; level[] is scratch (reset after). */
    private static int[] levels(int root, int[] start, int[] adj, int[] level) {
        int[] queue = new int[16];
        int head = 0, tail = 0;
        queue[tail++] = root;
        level[root] = 1;
        int depth = 1, best = root;
        while (head < tail) {
            int v = queue[head++];
            if (level[v] > depth) {
                depth = level[v];
                best = v;
            } else if (level[v] == depth && start[v + 1] - start[v] < start[best + 1] - start[best]) {
                best = v;
            }
            for (int k = start[v]; k < start[v + 1]; k++) {
                int w = adj[k];
                if (level[w] == 0) {
                    level[w] = level[v] + 1;
                    if (tail == queue.length) {
                        queue = Arrays.copyOf(queue, queue.length * 2);
                    }
                    queue[tail++] = w;
                }
            }
        }
        for (int k = 0; k < tail; k++) {
            level[queue[k]] = 0;
        }
        return new int[] {depth, best};
    }
}
