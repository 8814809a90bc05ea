package org.counterpoise.core.commission;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.response.SystemResponse;

/**
 * The model against an operating measurement: the response at running speed that the site shows
 * against the one the design's model predicts for the project's disturbance, with or without the
 * absorber. The model is linear, so their ratio is the ratio of the disturbance the site shows to
 * the project's, and everything the disturbance drives (the absorber's stroke, its forces) scales
 * by it. That is the check that matters before the absorber is built: a disturbance larger than
 * assumed uses up the stroke clearance.
 *
 * <p>The line compared is the largest within {@link #WINDOW} of the running frequency (or at least
 * 1.5 line spacings, for coarse spectra); without a stated running frequency, the largest line in
 * the band widened by the same fraction. The limits are common practice, no source. The model is
 * evaluated at the running frequency (stated, or the project's single speed): an analyser shows a
 * tone between two lines on the nearer one, at that line's frequency but with the tone's amplitude
 * (with an amplitude-true window), and the response near resonance changes fast with frequency.
 * Only over a band without a stated speed is the line's frequency taken as the running frequency.
 */
public final class OperatingCheck {
    /** Half-width of the window searched about the running frequency, fraction of it. */
    static final double WINDOW = 0.03;
    /** The window is at least this many line spacings wide each side. */
    static final double WINDOW_LINES = 1.5;

    private OperatingCheck() {
    }

    /**
     * @param design the design
     * @param spectrum the operating spectrum at the absorber's point
     * @param running the running (forcing) frequency, rad/s; empty: the largest line in the band
     * @param withAbsorber whether the absorber was fitted when the spectrum was measured
     * @return the comparison
     */
    public static OperatingComparison of(DesignResult design, OperatingSpectrum spectrum, OptionalDouble running,
            boolean withAbsorber) {
        Line found = Line.of(design.study().excitation().band(), spectrum, running);
        int line = found.index();
        double omega = found.modelFrequency();
        Excitation e = design.study().excitation();
        SystemResponse model = new SystemResponse(design.study().structure(), withAbsorber ? design.tuning() : null,
                e.kind(), e.amplitude());
        double predicted = model.amplitudeAt(spectrum.kind(), omega);
        double measured = spectrum.amplitude()[line];
        if (!(predicted > 0) || Double.isInfinite(predicted) || !(measured > 0)) {
            throw new InvalidInputException("spectrum", "amplitude " + (measured > 0 ? "predicted unbounded" : "zero")
                    + " at the line compared", "a line with a response at running speed, off an undamped resonance");
        }
        double ratio = measured / predicted;
        List<CommissioningWarning> warnings = warnings(spectrum, line, ratio);
        int largest = spectrum.largestBetween(0.0, Double.MAX_VALUE);
        double strokeDesign = largestStroke(design);
        double strokeImplied = strokeDesign * ratio;
        if (strokeImplied > design.clearance()) {
            warnings.add(CommissioningWarning.STROKE_BEYOND_CLEARANCE);
        }
        return new OperatingComparison(omega, spectrum.omega()[line], spectrum.kind(), measured, predicted, ratio,
                e.amplitude() * ratio,
                strokeDesign, strokeImplied, design.clearance(), withAbsorber, warnings,
                spectrum.omega()[largest], spectrum.amplitude()[largest]);
    }

    /**
     * The line compared and the frequency the model is evaluated at.
     *
     * @param index the line's index in the spectrum
     * @param modelFrequency the running frequency: stated, the project's one speed, or else the line's, rad/s
     */
    record Line(int index, double modelFrequency) {
        /**
         * @param band the project's forcing band
         * @param spectrum the operating spectrum
         * @param running the running frequency stated, rad/s, or empty
         * @return the largest line within the window about the running frequency (or over the widened band)
         */
        static Line of(FrequencyBand band, OperatingSpectrum spectrum, OptionalDouble running) {
            double halfLines = WINDOW_LINES * spectrum.lineSpacing();
            int line;
            if (running.isPresent()) {
                double centre = running.getAsDouble();
                double half = Math.max(WINDOW * centre, halfLines);
                line = spectrum.largestBetween(centre - half, centre + half);
            } else {
                line = spectrum.largestBetween(Math.min(band.low() * (1 - WINDOW), band.low() - halfLines),
                        Math.max(band.high() * (1 + WINDOW), band.high() + halfLines));
            }
            if (line < 0) {
                throw new InvalidInputException("spectrum", "no line near the running speed",
                        "a spectrum with lines at and about the running frequency (" + (running.isPresent()
                                ? "the one given" : "the project's band") + ")");
            }
            // the model at the running frequency: stated, the project's one speed, or else the line's
            return new Line(line, running.isPresent() ? running.getAsDouble() : band.low() == band.high() ? band.low()
                    : spectrum.omega()[line]);
        }
    }

    /** The warnings on the ratio measured / predicted and on a larger line elsewhere in the spectrum. */
    static List<CommissioningWarning> warnings(OperatingSpectrum spectrum, int line, double ratio) {
        List<CommissioningWarning> warnings = new ArrayList<>();
        if (ratio > CommissioningWarning.DISAGREEMENT_FACTOR || ratio < 1 / CommissioningWarning.DISAGREEMENT_FACTOR) {
            warnings.add(CommissioningWarning.OPERATING_DISAGREES);
        }
        int largest = spectrum.largestBetween(0.0, Double.MAX_VALUE);
        if (largest != line && spectrum.amplitude()[largest] > CommissioningWarning.OTHER_LINE_FACTOR
                * spectrum.amplitude()[line]) {
            warnings.add(CommissioningWarning.OTHER_LINE_DOMINATES);
        }
        return warnings;
    }

    /** The larger of the stroke in band and over the run-up (the band's when the run-up's is unbounded). */
    private static double largestStroke(DesignResult design) {
        ResponsePeak runUp = design.strokeRunUp();
        double band = design.strokeInBand().value();
        return runUp.unbounded() ? band : Math.max(band, runUp.value());
    }
}
