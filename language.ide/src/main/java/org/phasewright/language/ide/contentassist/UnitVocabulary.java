package org.phasewright.language.ide.contentassist;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.UnitFactor;

/**
 * Unit names offered after `in`: the units the file already uses first (authors mostly repeat their own), then the
 * SI base units and common derived and accepted units (symbols as in the SI Brochure, 9th edition, BIPM 2019).
 * Only proposals: the notation accepts any unit name, and checking them is a later step.
 */
public final class UnitVocabulary {
    private static final Map<String, String> COMMON = new LinkedHashMap<>();

    static {
        // SI base units (SI Brochure, 9th ed., table 2).
        COMMON.put("s", "second (time)");
        COMMON.put("m", "metre (length)");
        COMMON.put("kg", "kilogram (mass)");
        COMMON.put("A", "ampere (electric current)");
        COMMON.put("K", "kelvin (temperature)");
        COMMON.put("mol", "mole (amount of substance)");
        COMMON.put("cd", "candela (luminous intensity)");
        // Derived units with special names (table 4) that reduced-order models use most.
        COMMON.put("Hz", "hertz (1/s)");
        COMMON.put("N", "newton (kg*m/s^2)");
        COMMON.put("Pa", "pascal (N/m^2)");
        COMMON.put("J", "joule (N*m)");
        COMMON.put("W", "watt (J/s)");
        COMMON.put("C", "coulomb (A*s)");
        COMMON.put("V", "volt (W/A)");
        COMMON.put("F", "farad (C/V)");
        COMMON.put("ohm", "ohm (V/A)");
        COMMON.put("H", "henry (V*s/A)");
        COMMON.put("T", "tesla (V*s/m^2)");
        // Non-SI units accepted for use with the SI (table 8).
        COMMON.put("min", "minute (60 s)");
        COMMON.put("h", "hour (3600 s)");
        COMMON.put("d", "day (86400 s)");
        COMMON.put("L", "litre (1e-3 m^3)");
        COMMON.put("g", "gram (1e-3 kg)");
        COMMON.put("1", "dimensionless");
    }

    /** Name and short meaning of every unit to offer in {@code model}, used ones first, without repeats. */
    public List<Map.Entry<String, String>> proposals(PhaseModel model) {
        Map<String, String> result = new LinkedHashMap<>();
        if (model != null) {
            for (UnitFactor factor : EcoreUtil2.getAllContentsOfType(model, UnitFactor.class)) {
                String name = factor.getName();
                if (name != null && !name.isEmpty() && NodeModelUtils.getNode(factor) != null) {
                    result.putIfAbsent(name, COMMON.getOrDefault(name, "used in this file"));
                }
            }
        }
        COMMON.forEach(result::putIfAbsent);
        return new ArrayList<>(result.entrySet());
    }
}
