package org.phasewright.runtime.model;

/** One request inside a study. */
public sealed interface Analysis permits Simulation, EquilibriumSearch, Section, LyapunovExponents,
        EquilibriumContinuation, ParameterSweep, LyapunovMap, Basins {
}
