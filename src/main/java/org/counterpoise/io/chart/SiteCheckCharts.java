package org.counterpoise.io.chart;

import java.awt.BasicStroke;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.commission.AsBuiltAbsorber;
import org.counterpoise.core.commission.AsBuiltFit;
import org.counterpoise.core.commission.AsBuiltSet;
import org.counterpoise.core.commission.AsBuiltSetFit;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.text.ValueText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The response measured with the absorber (or absorbers) fitted, as dots, against the design's
 * prediction and the model as built, as lines: magnitude on a logarithmic axis, in the file's unit.
 */
public final class SiteCheckCharts {
    /** Points of each drawn curve. */
    private static final int POINTS = 600;

    private SiteCheckCharts() {
    }

    /**
     * @param measured the lines fitted
     * @param structure the structure as designed
     * @param design the absorber as designed
     * @param built the absorber as built
     * @param unit the unit of the values shown
     * @param width pixels
     * @param height pixels
     * @return the chart
     */
    public static XYChart magnitude(MeasuredFrf measured, Structure structure, Tuning design, AsBuiltAbsorber built,
            FrfUnit unit, int width, int height) {
        double[] w = curveFrequencies(measured);
        Structure asMeasured = new Structure(structure.modalMass(),
                structure.modalMass() * built.structureFrequency() * built.structureFrequency(),
                structure.dampingRatio(), structure.modeShapeAtAbsorber());
        double[] designed = shown(AsBuiltFit.predicted(structure, design, w, unit.kind()), unit);
        double[] asBuilt = shown(AsBuiltFit.predicted(asMeasured,
                new Tuning(built.massRatio(), built.tuningRatio(), built.dampingRatio()), w, unit.kind()), unit);
        return chart(measured, w, designed, asBuilt, unit, "the absorber", width, height);
    }

    /**
     * The same chart for several absorbers at one point: the whole structure's modes with the absorbers
     * as designed, and with them as built on the structure as fitted (its target mode's frequency fitted
     * when freed), each the driving-point FRF at their point ({@link AsBuiltSetFit#predicted}).
     *
     * @param measured the lines fitted
     * @param set the absorbers as designed, with the structure
     * @param built the absorbers as built and the target mode's frequency used
     * @param unit the unit of the values shown
     * @param width pixels
     * @param height pixels
     * @return the chart
     */
    public static XYChart setMagnitude(MeasuredFrf measured, SeveralAbsorbers set, AsBuiltSet built, FrfUnit unit,
            int width, int height) {
        double[] w = curveFrequencies(measured);
        ModalStructure structure = set.layout().structure();
        ModalStructure asMeasured = structure.withFrequency(built.targetMode(), built.targetModeFrequency());
        List<PointAbsorber> asBuilt = new ArrayList<>();
        for (int j = 0; j < built.absorbers().size(); j++) {
            AsBuiltSet.Built b = built.absorbers().get(j);
            asBuilt.add(PointAbsorber.tuned(set.absorbers().get(j).point(), b.mass(), b.frequency(), b.dampingRatio()));
        }
        return chart(measured, w, shown(AsBuiltSetFit.predicted(structure, set.absorbers(), w, unit.kind()), unit),
                shown(AsBuiltSetFit.predicted(asMeasured, asBuilt, w, unit.kind()), unit), unit, "the absorbers", width,
                height);
    }

    /** Evenly spaced frequencies over the measured lines, rad/s. */
    private static double[] curveFrequencies(MeasuredFrf measured) {
        int n = measured.size();
        double[] w = new double[POINTS];
        for (int j = 0; j < POINTS; j++) {
            w[j] = measured.omega()[0] + (measured.omega()[n - 1] - measured.omega()[0]) * j / (POINTS - 1);
        }
        return w;
    }

    private static XYChart chart(MeasuredFrf measured, double[] w, double[] designed, double[] asBuilt, FrfUnit unit,
            String what, int width, int height) {
        String kind = unit.kind().id();
        XYChart c = new XYChartBuilder().width(width).height(height)
                .title("The " + kind + " with " + what + " fitted: measured, design and as built")
                .xAxisTitle("Frequency (Hz)")
                .yAxisTitle(ValueText.capitalised(kind) + " (" + ChartFactory.pretty(unit.symbol()) + ")")
                .build();
        ChartStyle.houseStyle(c.getStyler(), ChartTheme.LIGHT);
        int n = measured.size();
        double[] f = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = Unit.HERTZ.fromSi(measured.omega()[i]);
            y[i] = measured.value(i).abs() / unit.toSi();
        }
        double[] fm = new double[w.length];
        for (int j = 0; j < w.length; j++) {
            fm[j] = Unit.HERTZ.fromSi(w[j]);
        }
        XYSeries dots = c.addSeries("measured", f, y);
        dots.setMarker(SeriesMarkers.CIRCLE);
        dots.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        dots.setMarkerColor(ChartTheme.LIGHT.before());
        XYSeries d = c.addSeries("design", fm, designed);
        d.setMarker(SeriesMarkers.NONE);
        d.setLineColor(ChartTheme.LIGHT.after());
        d.setLineStyle(new BasicStroke(1.6f));
        XYSeries b = c.addSeries("as built (fitted)", fm, asBuilt);
        b.setMarker(SeriesMarkers.NONE);
        b.setLineColor(ChartTheme.LIGHT.alternative());
        b.setLineStyle(new BasicStroke(1.6f));
        c.getStyler().setMarkerSize(4);
        double low = Double.POSITIVE_INFINITY;
        double high = 0.0;
        for (double[] series : new double[][] {y, designed, asBuilt}) {
            for (double v : series) {
                if (v > 0) {
                    low = Math.min(low, v);
                    high = Math.max(high, v);
                }
            }
        }
        if (high > low) {
            ChartStyle.logAxis(c.getStyler(), false, low / 1.5, high * 1.5);
        }
        return c;
    }

    private static double[] shown(Complex[] si, FrfUnit unit) {
        double[] out = new double[si.length];
        for (int i = 0; i < si.length; i++) {
            out[i] = si[i].abs() / unit.toSi();
        }
        return out;
    }
}
