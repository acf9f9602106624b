package org.phasewright.language.ide.tests;

/** Our demo scenario for editor tests: a thermosyphon loop (three-mode truncation, as in the README tour). */
final class ThermosyphonText {
    private ThermosyphonText() {
    }

    static final String TEXT = """
            // Solar water heater: fluid in a closed loop heated at the bottom, cooled at the top.
            model thermosyphon "Closed-loop thermosyphon"
            time t in s
            param p = 10 "loop friction over thermal relaxation"
            param ra = 28 range 0 .. 60 "scaled heating"
            param k = 8/3
            state q = 1 in m/s "loop flow"
            state h = 1 "horizontal temperature difference"
            state v = 1 "vertical temperature difference"
            let flux = q*h
            let speed = abs(q) in m/s "flow speed"
            rate q = p*(h - q)
            rate h = ra*q - h - q*v
            rate v = flux - k*v
            symmetry reversal: q -> -q, h -> -h
            study first_look {
              simulate to t = 5
              equilibria
            }
            """;
}
