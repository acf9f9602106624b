package org.phasewright.language.ide.hover;

import java.util.Optional;

import org.phasewright.language.phase.UnitExpr;

import com.google.inject.ImplementedBy;

/**
 * Turns a declared unit into its physical dimension for hovers (for example `m/s^2` into "length / time^2"). Units
 * checking is a later step; until it binds a real implementation, no dimension is shown.
 */
@ImplementedBy(DimensionDescriber.NotYetKnown.class)
public interface DimensionDescriber {

    Optional<String> dimensionOf(UnitExpr unit);

    /** The stand-in until units are checked: never claims a dimension. */
    final class NotYetKnown implements DimensionDescriber {
        @Override
        public Optional<String> dimensionOf(UnitExpr unit) {
            return Optional.empty();
        }
    }
}
