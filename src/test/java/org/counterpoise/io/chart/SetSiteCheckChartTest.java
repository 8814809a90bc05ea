package org.counterpoise.io.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import org.counterpoise.core.commission.AsBuiltSet;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.io.commission.SetSiteCheck;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * The site check's chart of several absorbers (the invented gallery floor and its invented
 * measurement): its curves are the driving-point accelerance at the absorbers' point, checked at
 * every drawn point against the equations of motion of the modes and absorbers solved directly as a
 * dense complex system by Commons Math's LU ({@link ModalDirectSolve}), times -omega^2 (accelerance
 * from receptance, any vibration text), to 1e-9: the design's absorbers on the structure as designed,
 * the fitted absorbers on the structure as fitted; the dots are the file's lines.
 */
class SetSiteCheckChartTest {

    @Test
    void theCurvesAreTheWholeStructuresAccelerancesAsDesignedAndAsBuilt() {
        Project p = ProjectReader.read(Path.of("presets/gallery-floor-two-modes.json")).project();
        SeveralAbsorbers set = SeveralAbsorbersDesigner.design(Designer.design(p.toStudy()),
                SeveralModes.layout(p).orElseThrow());
        FrfUnit unit = FrfUnit.si(FrfKind.ACCELERANCE);
        SetSiteCheck check = SetSiteCheck.run("gallery", set, Path.of("presets/gallery-floor-fitted-frf.csv"), unit,
                all -> all, true, List.of(), List.of(), UnitSystem.SI);
        AsBuiltSet built = check.check().built();
        XYChart chart = SiteCheckCharts.setMagnitude(check.lines(), set, built, unit, 800, 500);
        String point = set.layout().absorberPoint();
        List<Mode> modes = set.layout().structure().modes();
        List<Mode> fitted = set.layout().structure().withFrequency(built.targetMode(), built.targetModeFrequency())
                .modes();
        List<PointAbsorber> asBuilt = built.absorbers().stream().map(b -> PointAbsorber.tuned(point, b.mass(),
                b.frequency(), b.dampingRatio())).toList();
        XYSeries design = chart.getSeriesMap().get("design");
        XYSeries asBuiltCurve = chart.getSeriesMap().get("as built (fitted)");
        for (int i = 0; i < design.getXData().length; i += 37) {
            double w = 2 * Math.PI * design.getXData()[i];
            double expected = w * w * ModalDirectSolve.solve(modes, set.absorbers(), point, point, w)[0].abs();
            assertEquals(expected, design.getYData()[i], 1e-9 * expected, "design at " + design.getXData()[i] + " Hz");
            double built_ = w * w * ModalDirectSolve.solve(fitted, asBuilt, point, point, w)[0].abs();
            assertEquals(built_, asBuiltCurve.getYData()[i], 1e-9 * built_, "as built at " + design.getXData()[i]);
        }
        XYSeries dots = chart.getSeriesMap().get("measured");
        assertEquals(check.lines().size(), dots.getXData().length);
        assertEquals(check.lines().value(10).abs(), dots.getYData()[10], 0.0);
    }
}
