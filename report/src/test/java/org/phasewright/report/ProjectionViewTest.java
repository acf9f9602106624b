package org.phasewright.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.study.Trajectory;

/** A periodic family of equilibria far from the trajectory does not squash the phase projection. */
class ProjectionViewTest {
    @Test
    void equilibriaFarFromTheTrajectoryAreLeftOutAndCounted() {
        // A damped pendulum swinging within |θ| <= 1: equilibria at θ = kπ, stable for even k, saddles for odd k.
        int rows = 200;
        double[] t = new double[rows];
        double[][] u = new double[rows][];
        for (int k = 0; k < rows; k++) {
            t[k] = k * 0.1;
            u[k] = new double[] {Math.exp(-0.1 * t[k]) * Math.cos(t[k]), -Math.exp(-0.1 * t[k]) * Math.sin(t[k])};
        }
        Trajectory swing = new Trajectory("t", List.of("theta", "omega"), List.of(), t, u, new double[rows][0]);
        List<Equilibrium> family = new ArrayList<>();
        for (int k = -6; k <= 6; k++) {
            double[] re = k % 2 == 0 ? new double[] {-0.05, -0.05} : new double[] {0.95, -1.05};
            double[] im = k % 2 == 0 ? new double[] {1, -1} : new double[] {0, 0};
            family.add(Fixtures.equilibrium("E" + k, new double[] {k * Math.PI, 0}, re, im));
        }
        List<Equilibrium> near = Charts.near(swing, 0, 1, family);
        // θ spans [-0.83, 1], so the view reaches 1.5 widths further: θ in [-3.6, 3.7] holds -π, 0 and π.
        assertEquals(List.of("E-1", "E0", "E1"), near.stream().map(Equilibrium::name).toList());

        var chart = Charts.projection(swing, 0, 1, family, "theta", "omega", "pendulum", "t from 0 to 20");
        String subtitle = ((org.jfree.chart.title.TextTitle) chart.getSubtitle(0)).getText();
        assertTrue(subtitle.endsWith("10 equilibria lie far outside the trajectory and are not drawn (see the table)"),
                subtitle);
        assertEquals(List.of("stable equilibrium (filled)", "unstable equilibrium (hollow)", "trajectory", "start"),
                Charts.seriesNames(chart));
    }
}
