package org.phasewright.language.ide.hover;

import java.util.Optional;

import org.phasewright.language.phase.UnitExpr;
import org.phasewright.language.units.UnitResolver;

import com.google.inject.ImplementedBy;

/**
 * Turns a declared unit into its physical dimension in SI base units for hovers (for example `N` into
 * "kg*m/s^2"); empty when the unit is unknown.
 */
@ImplementedBy(DimensionDescriber.FromUnits.class)
public interface DimensionDescriber {

    Optional<String> dimensionOf(UnitExpr unit);

    /** Uses the checker's unit catalogue, so hovers and unit errors always agree. */
    final class FromUnits implements DimensionDescriber {
        @Override
        public Optional<String> dimensionOf(UnitExpr unit) {
            return UnitResolver.resolve(unit).map(resolved -> resolved.dimension().toString());
        }
    }
}
