package org.phasewright.language.ui.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The results view's coordinates cell: every value for small models, the first 16 for large ones (our rule). */
class CoordinatesTextTest {

    @Test
    void smallModelsShowEveryCoordinate() {
        assertEquals("(1, -2, 0.5)", ResultsView.coordinates(new double[] {1, -2, 0.5}));
    }

    @Test
    void largeModelsShowTheFirstSixteenAndTheCount() {
        double[] x = new double[100_000];
        java.util.Arrays.fill(x, 8);
        String text = ResultsView.coordinates(x);
        assertTrue(text.endsWith(", ... of 100000 states)"), text);
        assertEquals(16, text.chars().filter(c -> c == '8').count(), text);
    }
}
