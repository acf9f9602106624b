package org.phasewright.language.validation;

import java.util.OptionalDouble;

import org.eclipse.xtext.validation.Check;
import org.phasewright.language.lowering.ConstantValues;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.SimulateRequest;

/** Numeric sanity of values known before a run: params inside their ranges, positive end times and tolerances. */
public class ValueChecks extends PhaseCheckBase {

    @Check
    public void valueInsideRange(ParamDecl param) {
        if (param.getLow() == null || param.getHigh() == null) {
            return;
        }
        ConstantValues constants = constants(param);
        OptionalDouble low = constants.evaluate(param.getLow());
        OptionalDouble high = constants.evaluate(param.getHigh());
        if (low.isEmpty() || high.isEmpty()) {
            return;
        }
        if (low.getAsDouble() > high.getAsDouble()) {
            error("The range of '" + param.getName() + "' is empty: " + format(low.getAsDouble()) + " > "
                    + format(high.getAsDouble()) + ".", param, PHASE.getParamDecl_Low(), IssueCodes.EMPTY_RANGE);
            return;
        }
        OptionalDouble value = constants.evaluate(param.getValue());
        if (value.isPresent() && (value.getAsDouble() < low.getAsDouble() || value.getAsDouble() > high.getAsDouble())) {
            error("Param '" + param.getName() + "' = " + format(value.getAsDouble()) + " lies outside its range "
                    + format(low.getAsDouble()) + " .. " + format(high.getAsDouble()) + ".", param,
                    PHASE.getParamDecl_Value(), IssueCodes.OUT_OF_RANGE);
        }
    }

    @Check
    public void simulationSettings(SimulateRequest simulate) {
        ConstantValues constants = constants(simulate);
        OptionalDouble end = simulate.getEnd() == null ? OptionalDouble.empty() : constants.evaluate(simulate.getEnd());
        if (end.isPresent() && !(end.getAsDouble() > 0 && Double.isFinite(end.getAsDouble()))) {
            error("The end time must be positive and finite; it is " + format(end.getAsDouble()) + ".", simulate,
                    PHASE.getSimulateRequest_End(), IssueCodes.BAD_END_TIME);
        }
        if (simulate.getTolerance() != null) {
            OptionalDouble tolerance = constants.evaluate(simulate.getTolerance());
            if (tolerance.isPresent() && !(tolerance.getAsDouble() > 0 && tolerance.getAsDouble() < 1)) {
                error("The relative tolerance must lie between 0 and 1 (e.g. 1e-8); it is "
                        + format(tolerance.getAsDouble()) + ".", simulate, PHASE.getSimulateRequest_Tolerance(),
                        IssueCodes.BAD_TOLERANCE);
            }
        }
    }

    static String format(double value) {
        return value == Math.rint(value) && Math.abs(value) < 1e15 ? Long.toString((long) value)
                : Double.toString(value);
    }
}
