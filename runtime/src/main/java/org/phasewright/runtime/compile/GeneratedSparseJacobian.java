package org.phasewright.runtime.compile;

import java.util.Arrays;

import org.phasewright.runtime.linalg.SparsePattern;

/** Exact sparse Jacobian values from the generated kernel; stateless, so thread-safe. */
final class GeneratedSparseJacobian implements SparseJacobian {
    private final SparsePattern pattern;
    private final int[] slots;
    private final SparseJacobianKernel kernel;

    GeneratedSparseJacobian(SparsePattern pattern, int[] slots, SparseJacobianKernel kernel) {
        this.pattern = pattern;
        this.slots = slots;
        this.kernel = kernel;
    }

    @Override
    public SparsePattern pattern() {
        return pattern;
    }

    @Override
    public String method() {
        return "generated code";
    }

    @Override
    public void values(double t, double[] u, double[] p, double[] values) {
        Arrays.fill(values, 0, pattern.nonZeros(), 0.0);
        kernel.add(t, u, p, values, slots);
    }
}
