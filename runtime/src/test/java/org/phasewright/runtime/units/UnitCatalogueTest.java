package org.phasewright.runtime.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Unit names, prefixes and dimension algebra against the SI Brochure (BIPM, 9th edition, 2019). */
class UnitCatalogueTest {

    private static Unit u(String name) {
        return UnitCatalogue.lookup(name).orElseThrow(() -> new AssertionError("unknown " + name));
    }

    private static Dimension d(String name) {
        return u(name).dimension();
    }

    @Test
    void derivedUnitsWithSpecialNamesInBaseUnits() {
        // SI Brochure table 4, column "expressed in terms of SI base units".
        assertEquals(d("kg").times(d("m")).dividedBy(d("s").power(Rational.of(2))), d("N"));
        assertEquals(d("N").dividedBy(d("m").power(Rational.of(2))), d("Pa"));
        assertEquals(d("N").times(d("m")), d("J"));
        assertEquals(d("J").dividedBy(d("s")), d("W"));
        assertEquals(d("A").times(d("s")), d("C"));
        assertEquals(d("W").dividedBy(d("A")), d("V"));
        assertEquals(d("C").dividedBy(d("V")), d("F"));
        assertEquals(d("V").dividedBy(d("A")), d("ohm"));
        assertEquals(d("A").dividedBy(d("V")), d("S"));
        assertEquals(d("V").times(d("s")), d("Wb"));
        assertEquals(d("Wb").dividedBy(d("m").power(Rational.of(2))), d("T"));
        assertEquals(d("Wb").dividedBy(d("A")), d("H"));
        assertEquals(Dimension.NONE.dividedBy(d("s")), d("Hz"));
        assertEquals(d("mol").dividedBy(d("s")), d("kat"));
        assertTrue(d("rad").isDimensionless()); // table 4: rad = m/m = 1
        assertEquals("kg*m^2/(s^3*A)", d("V").toString()); // table 4: V = kg m^2 s^-3 A^-1
    }

    @Test
    void prefixesScaleTheUnit() {
        // SI Brochure table 7.
        assertEquals(1e3, u("km").factor(), 1e-12);
        assertEquals(1e-3, u("ms").factor(), 1e-18);
        assertEquals(1e-6, u("umol").factor(), 1e-21); // "u" for micro: ASCII common practice
        assertEquals(1e3, u("kPa").factor(), 1e-12);
        assertEquals(1e9, u("GW").factor(), 1e-3);
        assertEquals(1e-9, u("nm").factor(), 1e-24);
        assertEquals(10, u("dam").factor(), 1e-12); // deca, the only two-letter prefix
        assertEquals(1e2, u("hPa").factor(), 1e-12);
        // Section 3: prefixes attach to the gram, so 1 mg = 1e-6 kg.
        assertEquals(1e-6, u("mg").factor(), 1e-21);
        assertEquals(d("kg"), d("mg"));
        // CGPM 2022, Resolution 3: ronna and quecto.
        assertEquals(1e24, u("Rg").factor(), 1e9); // ronnagram = 1e27 g
        assertEquals(1e-30, u("qm").factor(), 1e-45);
    }

    @Test
    void compoundPrefixesAndUnknownNamesAreRejected() {
        // SI Brochure section 3: "compound prefixes are not allowed", e.g. not "mkg" nor "kkm".
        assertTrue(UnitCatalogue.lookup("mkg").isEmpty());
        assertTrue(UnitCatalogue.lookup("kkm").isEmpty());
        assertTrue(UnitCatalogue.lookup("furlong").isEmpty());
        assertTrue(UnitCatalogue.lookup("").isEmpty());
    }

    @Test
    void exactNamesWinOverPrefixedReadings() {
        // Table 8: min is the minute; table 2: cd is the candela; table 4: Pa is the pascal (common practice
        // for reading symbols: a symbol that is itself a unit is never split into prefix and unit).
        assertEquals(60, u("min").factor(), 0);
        assertEquals(d("cd"), Dimension.base(Dimension.LUMINOSITY));
        assertEquals(1, u("Pa").factor(), 0);
        assertEquals(1e-3, u("mPa").factor(), 1e-18);
    }

    @Test
    void nonSiUnitsAcceptedForUseWithTheSi() {
        // SI Brochure table 8.
        assertEquals(3600, u("h").factor(), 0);
        assertEquals(86400, u("d").factor(), 0);
        assertEquals(1e-3, u("L").factor(), 0);
        assertEquals(d("m").power(Rational.of(3)), d("L"));
        assertEquals(1e3, u("t").factor(), 0);
        assertEquals(1e4, u("ha").factor(), 0);
        assertEquals(1.602176634e-19, u("eV").factor(), 0);
        assertEquals(d("J"), d("eV"));
    }

    @Test
    void squareRootsGiveRationalExponents() {
        Dimension perSecondSquared = d("m").dividedBy(d("s").power(Rational.of(2))).dividedBy(d("m"));
        assertEquals(Dimension.NONE.dividedBy(d("s")), perSecondSquared.power(new Rational(1, 2)));
        assertEquals("m^(1/2)", d("m").power(new Rational(1, 2)).toString());
        assertNotEquals(d("m"), d("m").power(new Rational(1, 2)));
        assertEquals("1", Dimension.NONE.toString());
        assertEquals("mol/(m^3*s)", d("mol").dividedBy(d("m").power(Rational.of(3))).dividedBy(d("s")).toString());
    }

    @Test
    void exponentsFromNumbers() {
        assertEquals(new Rational(1, 3), Rational.approximate(1.0 / 3, 12));
        assertEquals(Rational.of(-2), Rational.approximate(-2.0, 12));
        assertNull(Rational.approximate(Math.PI, 12));
    }
}
