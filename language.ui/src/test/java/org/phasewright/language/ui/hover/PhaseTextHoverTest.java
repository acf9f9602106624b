package org.phasewright.language.ui.hover;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.phasewright.language.ui.ExampleModels;

class PhaseTextHoverTest {
    private final String text = ExampleModels.read("thermosyphon.phase");

    @Test
    void hoveringAParamInARateShowsItsDescriptionValueAndRange() {
        int offset = text.indexOf("ra*q") + 1;
        String hover = PhaseTextHover.symbolText("thermosyphon.phase", text, offset).orElseThrow();
        assertTrue(hover.contains("ra") && hover.contains("scaled heating"), hover);
        assertTrue(hover.contains("28"), "value: " + hover);
        assertTrue(hover.contains("0 .. 60"), "range: " + hover);
    }

    @Test
    void hoveringTheTimeVariableShowsItsUnit() {
        int offset = text.indexOf("time t in s") + 5;
        String hover = PhaseTextHover.symbolText("thermosyphon.phase", text, offset).orElseThrow();
        assertTrue(hover.lines().anyMatch(line -> line.equals("unit: s")), hover);
    }

    @Test
    void hoveringPunctuationShowsNothing() {
        Optional<String> hover = PhaseTextHover.symbolText("thermosyphon.phase", text, text.indexOf("->"));
        assertTrue(hover.isEmpty(), hover::toString);
    }
}
