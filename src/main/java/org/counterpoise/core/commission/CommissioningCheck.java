package org.counterpoise.core.commission;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.design.AbsorberSizing;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.realisation.PredictedPoint;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.Realiser;

/**
 * The commissioning check: the frequency response measured at the absorber's point with the
 * absorber fitted, against the design's prediction and against the absorber as built (fitted to
 * the measurement, {@link AsBuiltFit}), with the trim that brings it to the design
 * ({@link TrimCorrection}).
 *
 * <p>The absorber frequency the structure needs is the design's; when the fit freed the structure's
 * frequency, it is the design the project's method makes for the structure as measured, with the
 * absorber's mass as built ({@link #targetTuningRatio}). Scaling the design's tuning ratio with the
 * structure is right only for a design over all frequencies: at one speed, or over a band, the
 * forcing sets the tuning, and a trim scaled with a structure 5 % off raised the peak 5 to 6 times on
 * every shipped preset with one speed (a check of this program's own, 5 Dec 2026). A trim that would
 * not lower the peak is never advised ({@link CommissioningWarning#TRIM_DOES_NOT_HELP}).
 *
 * @param built the absorber as built
 * @param trim what to do about it
 * @param rows the measured response beside the predicted at the predicted table's frequencies that
 *     lie inside the measurement, magnitudes of the measured FRF kind, SI
 * @param measuredPeakFrequency the frequency of the largest measured line, rad/s
 * @param measuredPeak its magnitude
 * @param designPeakFrequency the frequency of the largest magnitude the design predicts at the measured lines, rad/s
 * @param designPeak that magnitude
 * @param response the response that matters over the band: as designed, as built, after the trim
 * @param absorberMass the absorber mass the check holds (weighed, or the design's), kg
 */
public record CommissioningCheck(AsBuiltAbsorber built, TrimCorrection trim, List<Row> rows,
        double measuredPeakFrequency, double measuredPeak, double designPeakFrequency, double designPeak,
        BuiltResponse response, double absorberMass) {

    /** Copies the rows. */
    public CommissioningCheck {
        rows = List.copyOf(rows);
    }

    /**
     * One frequency of the comparison.
     *
     * @param frequency rad/s
     * @param measured the measured magnitude (linear between the two nearest lines)
     * @param design the design's predicted magnitude
     * @param asBuilt the magnitude of the model with the absorber as built
     */
    public record Row(double frequency, double measured, double design, double asBuilt) {
    }

    /**
     * @param design the design
     * @param realisation its hardware (the trim plan and part tolerances)
     * @param measured the driving-point FRF at the absorber's point with the absorber fitted
     * @param freeStructure whether to fit the structure's natural frequency too
     * @param weighed the absorber's mass as weighed with its fitted plates, kg; empty: the design's
     * @return the check
     */
    public static CommissioningCheck of(DesignResult design, Realisation realisation, MeasuredFrf measured,
            boolean freeStructure, OptionalDouble weighed) {
        Structure structure = design.study().structure();
        Tuning tuning = design.tuning();
        double mass = weighed.orElse(design.absorber().mass());
        Checks.positive("absorber mass as weighed", mass);
        Tuning held = new Tuning(mass / structure.effectiveMass(), tuning.tuningRatio(), tuning.dampingRatio());
        AsBuiltAbsorber built = AsBuiltFit.fit(structure, held, measured, freeStructure);
        TrimCorrection trim = TrimCorrection.of(built, targetTuningRatio(design, realisation, built, mass),
                tuning.dampingRatio(),
                mass, realisation.trim(), realisation.tolerances());
        BuiltResponse response = BuiltResponse.of(design, built, trim, mass, realisation.trim().plateMass());
        if (trim.advised() && trim.platesToAdd() != 0 && response.afterTrim() > response.asBuilt()) {
            trim = trim.notHelping();
            response = response.withoutTrim();
        }
        Structure asMeasured = AsBuiltFit.withFrequency(structure, built.structureFrequency());
        Tuning asBuilt = new Tuning(built.massRatio(), built.tuningRatio(), built.dampingRatio());
        double[] w = measured.omega();
        Complex[] predicted = AsBuiltFit.predicted(structure, tuning, w, measured.kind());
        int measuredAt = 0;
        int designAt = 0;
        for (int i = 0; i < w.length; i++) {
            measuredAt = measured.value(i).abs() > measured.value(measuredAt).abs() ? i : measuredAt;
            designAt = predicted[i].abs() > predicted[designAt].abs() ? i : designAt;
        }
        List<Row> rows = new ArrayList<>();
        for (PredictedPoint p : realisation.predicted()) {
            double f = p.frequency();
            if (f < w[0] || f > w[w.length - 1]) {
                continue;
            }
            double[] at = {f};
            rows.add(new Row(f, interpolated(measured, f),
                    AsBuiltFit.predicted(structure, tuning, at, measured.kind())[0].abs(),
                    AsBuiltFit.predicted(asMeasured, asBuilt, at, measured.kind())[0].abs()));
        }
        return new CommissioningCheck(built, trim, rows, w[measuredAt], measured.value(measuredAt).abs(), w[designAt],
                predicted[designAt].abs(), response, mass);
    }

    /**
     * @param design the design
     * @param realisation its hardware: an elastomer element is tuned to its own optimum (the hysteretic
     *     absorber's, as the sheet's procedure says), not the viscous design's
     * @param built the absorber as built, on the structure as fitted
     * @param mass the absorber's mass as built, kg
     * @return the tuning ratio, on the structure as fitted, of the absorber frequency it needs: the
     *     design's (or its element's) when the structure was held; else that of the design the project's
     *     method makes for the structure as measured, with this mass, realised with the same hardware
     *     (the design's ratio if that design is refused)
     */
    static double targetTuningRatio(DesignResult design, Realisation realisation, AsBuiltAbsorber built,
            double mass) {
        Structure structure = design.study().structure();
        if (built.structureFrequencySd().isEmpty() || built.structureFrequency() == structure.naturalFrequency()) {
            return ownTuningRatio(design, realisation);
        }
        Structure measured = AsBuiltFit.withFrequency(structure, built.structureFrequency());
        try {
            DesignResult again = Designer.design(design.study().withStructure(measured)
                    .withSizing(AbsorberSizing.ofMass(mass), design.study().constraints()));
            if (realisation.elastomer().isPresent()) {
                return ownTuningRatio(again, Realiser.realise(again, realisation.choice()));
            }
            return again.absorber().naturalFrequency() / built.structureFrequency();
        } catch (CoreException e) {
            // a constraint the measured structure cannot meet: the design's own tuning ratio, as before
            return ownTuningRatio(design, realisation);
        }
    }

    /** The ratio the absorber is tuned to: the element's own optimum for an elastomer, else the design's. */
    private static double ownTuningRatio(DesignResult design, Realisation realisation) {
        return realisation.elastomer().map(e -> e.optimum().tuningRatio()).orElse(design.tuning().tuningRatio());
    }

    /** The measured magnitude at f, linear between the lines on either side. */
    static double interpolated(MeasuredFrf measured, double f) {
        double[] w = measured.omega();
        int i = 1;
        while (i < w.length - 1 && w[i] < f) {
            i++;
        }
        double a = measured.value(i - 1).abs();
        double b = measured.value(i).abs();
        double t = (f - w[i - 1]) / (w[i] - w[i - 1]);
        return a + Math.max(0.0, Math.min(1.0, t)) * (b - a);
    }
}
