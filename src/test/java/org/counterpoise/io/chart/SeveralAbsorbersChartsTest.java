package org.counterpoise.io.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * The chart of several absorbers at a point other than the response point: its curves with the
 * absorbers and each mode's part against the dense complex LU solve of the equations of motion
 * ({@code ModalDirectSolve}, Commons Math) of the invented gallery-floor preset's design.
 */
class SeveralAbsorbersChartsTest {
    @Test
    void theCurvesAtAnotherPointAreTheDenseSolvesDisplacementAndModeParts() throws Exception {
        LoadedProject gallery = Presets.load("gallery-floor-two-modes.json");
        DesignResult design = DesignDossier.of(gallery.project().toStudy()).design();
        SeveralAbsorbers set = SeveralAbsorbersDesigner.design(design, SeveralModes.layout(gallery.project()).orElseThrow());
        XYChart chart = SeveralAbsorbersCharts.response(set, "display", UnitSystem.SI, ChartTheme.LIGHT, 640, 380);
        assertTrue(chart.getYAxisTitle().contains("display"), chart.getYAxisTitle());
        XYSeries after = chart.getSeriesMap().get("with 2 absorbers");
        List<String> names = set.layout().modeNames();
        XYSeries first = chart.getSeriesMap().get("mode " + names.get(0) + ", its part with absorbers");
        XYSeries second = chart.getSeriesMap().get("mode " + names.get(1) + ", its part with absorbers");
        // the parts are drawn within the range of the curves before and after (clipped to the axis)
        double floor = Double.POSITIVE_INFINITY;
        double ceiling = 0;
        for (XYSeries curve : List.of(after, chart.getSeriesMap().get("without absorbers"))) {
            for (double y : curve.getYData()) {
                floor = Math.min(floor, y);
                ceiling = Math.max(ceiling, y);
            }
        }
        int checked = 0;
        for (int i = 0; i < after.getXData().length; i += 37) {
            double omega = Unit.HERTZ.toSi(after.getXData()[i]);
            var modes = set.layout().structure().modes();
            Complex x = ModalDirectSolve.solve(modes, set.absorbers(), set.layout().excitationPoint(), "display", omega)[0];
            Complex[] parts = ModalDirectSolve.modeParts(modes, set.absorbers(), set.layout().excitationPoint(), "display",
                    omega);
            double f = set.forceAmplitude();
            assertEquals(Unit.MILLIMETRE.fromSi(f * x.abs()), after.getYData()[i], 1e-9 * after.getYData()[i]);
            for (int r = 0; r < 2; r++) {
                double expected = Math.min(Math.max(Unit.MILLIMETRE.fromSi(f * parts[r].abs()), floor), ceiling);
                double shown = (r == 0 ? first : second).getYData()[i];
                assertEquals(expected, shown, 1e-9 * expected, "mode " + r + " at " + omega);
            }
            checked++;
        }
        assertTrue(checked > 10);
    }
}
