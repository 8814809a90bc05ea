package org.counterpoise.io.chart;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;

import org.junit.jupiter.api.Test;

/** The wizard's chart warm-up paints headless, off any event thread (it runs on a background thread). */
class ChartWarmUpTest {
    @Test
    void paintsIntoAnImageWithoutADisplay() {
        assertDoesNotThrow(ChartWarmUp::paintOnce);
    }
}
