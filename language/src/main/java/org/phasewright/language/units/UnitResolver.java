package org.phasewright.language.units;

import java.util.Optional;
import java.util.function.Consumer;

import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.phasewright.language.phase.PhasePackage;
import org.phasewright.language.phase.UnitExpr;
import org.phasewright.language.phase.UnitFactor;
import org.phasewright.runtime.units.Unit;
import org.phasewright.runtime.units.UnitCatalogue;

/** Turns a written unit (`kg*m/s^2`, `mol/(m^3*s)`, `1`) into a {@link Unit}; empty when any part is unknown. */
public final class UnitResolver {
    private UnitResolver() {
    }

    /** Resolves without reporting. */
    public static Optional<Unit> resolve(UnitExpr unit) {
        return resolve(unit, factor -> { });
    }

    /** Resolves, handing every factor that cannot be understood to {@code unknown}. */
    public static Optional<Unit> resolve(UnitExpr unit, Consumer<UnitFactor> unknown) {
        if (unit == null) {
            return Optional.empty();
        }
        Unit result = Unit.ONE;
        boolean complete = true;
        for (int i = 0; i < unit.getFactors().size(); i++) {
            Optional<Unit> factor = factor(unit.getFactors().get(i), unknown);
            if (factor.isEmpty()) {
                complete = false;
                continue;
            }
            boolean divide = i > 0 && i - 1 < unit.getOperators().size() && "/".equals(unit.getOperators().get(i - 1));
            result = divide ? result.dividedBy(factor.get()) : result.times(factor.get());
        }
        return complete ? Optional.of(result) : Optional.empty();
    }

    private static Optional<Unit> factor(UnitFactor factor, Consumer<UnitFactor> unknown) {
        Optional<Unit> base;
        if (factor.getGroup() != null) {
            base = resolve(factor.getGroup(), unknown);
        } else if (factor.getName() != null) {
            base = UnitCatalogue.lookup(factor.getName());
        } else {
            base = factor.getOne() == 1 ? Optional.of(Unit.ONE) : Optional.empty(); // only `1` means "no unit"
        }
        if (base.isEmpty()) {
            if (factor.getGroup() == null) {
                unknown.accept(factor);
            }
            return base;
        }
        return Optional.of(base.get().power(hasExponent(factor) ? factor.getExponent() : 1));
    }

    /** `^0` and no exponent both leave the attribute at its default, so ask the parse tree. */
    private static boolean hasExponent(UnitFactor factor) {
        return !NodeModelUtils.findNodesForFeature(factor, PhasePackage.Literals.UNIT_FACTOR__EXPONENT).isEmpty();
    }
}
