package org.phasewright.runtime.model;

import java.util.List;

/**
 * A declared symmetry: {@code images.get(i)} is the image of state i (a state not named in the declaration maps to
 * itself). {@code reversesTime} marks a time-reversing symmetry.
 */
public record Symmetry(String name, List<Expr> images, boolean reversesTime) {
    public Symmetry {
        images = ExpandedList.immutable(images);
    }
}
