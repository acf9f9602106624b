package org.phasewright.runtime.units;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The unit names a model may write: the SI base units, the 22 coherent derived units with special names, units
 * accepted for use with the SI, a few common others, each optionally with an SI prefix where that is usual.
 * Sources: SI Brochure (BIPM, 9th ed., 2019) tables 2, 4, 7 and 8; ronna, quetta, ronto and quecto from CGPM 2022,
 * Resolution 3. Names are ASCII because names in the notation are: "u" stands for micro and "ohm" for the ohm
 * (common practice, as in ISO 2955-style ASCII unit codes).
 */
public final class UnitCatalogue {
    private static final Map<String, Unit> NAMED = new LinkedHashMap<>();
    /** Units that take prefixes (kg does not: its prefixed forms are built on g). */
    private static final Map<String, Unit> PREFIXABLE = new LinkedHashMap<>();
    private static final Map<String, Double> PREFIXES = new LinkedHashMap<>();

    static {
        Dimension mass = Dimension.base(Dimension.MASS);
        Dimension length = Dimension.base(Dimension.LENGTH);
        Dimension time = Dimension.base(Dimension.TIME);
        Dimension current = Dimension.base(Dimension.CURRENT);
        // SI Brochure table 2: base units.
        prefixable("m", 1, length);
        named("kg", 1, mass);
        prefixable("g", 1e-3, mass);
        prefixable("s", 1, time);
        prefixable("A", 1, current);
        prefixable("K", 1, Dimension.base(Dimension.TEMPERATURE));
        prefixable("mol", 1, Dimension.base(Dimension.AMOUNT));
        prefixable("cd", 1, Dimension.base(Dimension.LUMINOSITY));
        // Table 4: derived units with special names, in kg, m, s, A, K, mol, cd exponents.
        prefixable("rad", 1, Dimension.NONE);
        prefixable("sr", 1, Dimension.NONE);
        prefixable("Hz", 1, Dimension.of(0, 0, -1));
        prefixable("N", 1, Dimension.of(1, 1, -2));
        prefixable("Pa", 1, Dimension.of(1, -1, -2));
        prefixable("J", 1, Dimension.of(1, 2, -2));
        prefixable("W", 1, Dimension.of(1, 2, -3));
        prefixable("C", 1, Dimension.of(0, 0, 1, 1));
        prefixable("V", 1, Dimension.of(1, 2, -3, -1));
        prefixable("F", 1, Dimension.of(-1, -2, 4, 2));
        prefixable("ohm", 1, Dimension.of(1, 2, -3, -2));
        prefixable("S", 1, Dimension.of(-1, -2, 3, 2));
        prefixable("Wb", 1, Dimension.of(1, 2, -2, -1));
        prefixable("T", 1, Dimension.of(1, 0, -2, -1));
        prefixable("H", 1, Dimension.of(1, 2, -2, -2));
        named("degC", 1, Dimension.base(Dimension.TEMPERATURE)); // differences only: checks compare dimensions
        prefixable("lm", 1, Dimension.base(Dimension.LUMINOSITY));
        prefixable("lx", 1, Dimension.of(0, -2, 0, 0, 0, 0, 1));
        prefixable("Bq", 1, Dimension.of(0, 0, -1));
        prefixable("Gy", 1, Dimension.of(0, 2, -2));
        prefixable("Sv", 1, Dimension.of(0, 2, -2));
        prefixable("kat", 1, Dimension.of(0, 0, -1, 0, 0, 1));
        // Table 8: non-SI units accepted for use with the SI.
        named("min", 60, time);
        named("h", 3600, time);
        named("d", 86400, time);
        named("ha", 1e4, Dimension.of(0, 2));
        prefixable("L", 1e-3, Dimension.of(0, 3));
        prefixable("l", 1e-3, Dimension.of(0, 3));
        named("t", 1e3, mass);
        prefixable("Da", 1.66053906660e-27, mass);
        prefixable("eV", 1.602176634e-19, Dimension.of(1, 2, -2));
        named("deg", Math.PI / 180, Dimension.NONE);
        // Common practice outside the brochure's tables: the Julian year (IAU) and the bar.
        prefixable("yr", 365.25 * 86400, time);
        prefixable("bar", 1e5, Dimension.of(1, -1, -2));
        // Table 7: SI prefixes; "u" is the ASCII stand-in for micro.
        String[] symbols = { "Q", "R", "Y", "Z", "E", "P", "T", "G", "M", "k", "h", "da", "d", "c", "m", "u", "n",
                "p", "f", "a", "z", "y", "r", "q" };
        int[] powers = { 30, 27, 24, 21, 18, 15, 12, 9, 6, 3, 2, 1, -1, -2, -3, -6, -9, -12, -15, -18, -21, -24, -27,
                -30 };
        for (int i = 0; i < symbols.length; i++) {
            PREFIXES.put(symbols[i], Math.pow(10, powers[i]));
        }
    }

    private UnitCatalogue() {
    }

    private static void named(String name, double factor, Dimension dimension) {
        NAMED.put(name, new Unit(factor, dimension));
    }

    private static void prefixable(String name, double factor, Dimension dimension) {
        named(name, factor, dimension);
        PREFIXABLE.put(name, new Unit(factor, dimension));
    }

    /**
     * The unit with this name: an exact name first (so "min", "Pa", "cd" are never read as prefixed units), then
     * a prefix followed by a unit that takes one ("km", "ms", "umol", "kPa").
     */
    public static Optional<Unit> lookup(String name) {
        Unit exact = NAMED.get(name);
        if (exact != null) {
            return Optional.of(exact);
        }
        for (Map.Entry<String, Double> prefix : PREFIXES.entrySet()) {
            if (name.startsWith(prefix.getKey()) && name.length() > prefix.getKey().length()) {
                Unit unit = PREFIXABLE.get(name.substring(prefix.getKey().length()));
                if (unit != null) {
                    return Optional.of(unit.scaled(prefix.getValue()));
                }
            }
        }
        return Optional.empty();
    }

    /** A few names to suggest when a name is unknown. */
    public static List<String> examples() {
        return List.of("m", "s", "kg", "mol", "K", "A", "N", "J", "W", "Pa", "Hz", "V", "L", "h", "min", "d", "yr",
                "with prefixes such as km, ms, umol, kPa");
    }
}
