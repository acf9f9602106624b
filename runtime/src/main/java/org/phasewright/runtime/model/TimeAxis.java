package org.phasewright.runtime.model;

/** The independent variable: its name ("t" when undeclared) and unit text (null when none is given). */
public record TimeAxis(String name, String unit) {
    public static final TimeAxis DEFAULT = new TimeAxis("t", null);
}
