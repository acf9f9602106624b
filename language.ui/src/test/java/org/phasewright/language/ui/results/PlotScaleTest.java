package org.phasewright.language.ui.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class PlotScaleTest {

    @Test
    void coversTheDataWithAMarginAndMapsItOntoThePixels() {
        PlotScale scale = PlotScale.covering(new double[] { -20, 0, 20, Double.NaN }, 100, 500);
        assertTrue(scale.low() < -20 && scale.high() > 20, scale::toString);
        assertEquals(300, scale.toPixel(0));
        assertTrue(scale.toPixel(-20) > 100 && scale.toPixel(20) < 500);
    }

    @Test
    void ticksAreRoundStepsInsideTheInterval() {
        PlotScale scale = PlotScale.covering(new double[] { 0, 50 }, 0, 400);
        double[] ticks = scale.ticks(5);
        assertTrue(ticks.length >= 4 && ticks.length <= 11, () -> java.util.Arrays.toString(ticks));
        double step = ticks[1] - ticks[0];
        assertTrue(step == 5 || step == 10 || step == 20, "1-2-5 step: " + step);
        for (double tick : ticks) {
            assertTrue(tick >= scale.low() && tick <= scale.high());
            assertEquals(0, Math.IEEEremainder(tick, step), 1e-9);
        }
    }

    @Test
    void aFlatSeriesGetsAUsableInterval() {
        PlotScale scale = PlotScale.covering(new double[] { 3, 3, 3 }, 0, 100);
        assertEquals(2.5, scale.low());
        assertEquals(3.5, scale.high());
    }
}
