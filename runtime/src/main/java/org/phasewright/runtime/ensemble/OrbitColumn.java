package org.phasewright.runtime.ensemble;

import java.io.Serializable;

import org.phasewright.runtime.sweep.SweepColumn;

/** Serializable form of one orbit-diagram column ({@link SweepColumn}). */
public record OrbitColumn(double parameter, double[][] maxima, String ending) implements Serializable {
    static OrbitColumn of(SweepColumn c) {
        double[][] m = new double[c.states()][];
        for (int i = 0; i < m.length; i++) {
            m[i] = c.maxima(i);
        }
        return new OrbitColumn(c.parameter(), m, c.ending());
    }

    public SweepColumn column() {
        return new SweepColumn(parameter, maxima, ending);
    }
}
