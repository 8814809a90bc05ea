package org.counterpoise.core.realisation;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.TreeSet;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;

/**
 * The predicted response a technician compares readings against: about fifteen forcing frequencies
 * from below the band (and below the lower coupled natural frequency) to above it (and above the
 * upper one), always holding the band's ends, the running frequency, the two coupled natural
 * frequencies (undamped) and the exact peaks of the response with the absorber (damped); at each the study's response without and with the absorber and the absorber's stroke,
 * from the same transfer functions the design uses. With no damping anywhere the response with the
 * absorber and its stroke are unbounded (+infinity) at the two coupled natural frequencies; any other
 * frequency that falls exactly on an undamped resonance is moved off it by one part in 1e9, as the
 * design's curves do.
 */
public final class PredictedTable {
    /** Rows in the table (at least; the marked frequencies and evenly spaced ones). */
    static final int ROWS = 15;
    /** Rows closer than this fraction to a marked frequency are dropped (the marked one stays). */
    static final double CLOSEST = 0.02;

    private PredictedTable() {
    }

    /**
     * @param design the design
     * @return the rows, by ascending frequency, for the viscous design
     */
    public static List<PredictedPoint> of(DesignResult design) {
        return of(design, BuiltAbsorber.of(design, HardwareChoice.DEFAULT, Optional.empty()));
    }

    /**
     * @param design the design
     * @param fitted the absorber as built
     * @return the rows, by ascending frequency
     */
    static List<PredictedPoint> of(DesignResult design, BuiltAbsorber fitted) {
        Excitation e = design.study().excitation();
        SystemResponse bare = new SystemResponse(design.study().structure(), null, e.kind(), e.amplitude());
        ResponseKind kind = design.study().response();
        List<PredictedPoint> rows = new ArrayList<>();
        // with no damping anywhere the response with the absorber is unbounded at its two coupled natural
        // frequencies: said so, not valued a part in 1e9 off them (hundreds of metres of round-off)
        boolean undamped = fitted.hysteretic().isEmpty()
                && DamperSizing.fitted(design).transferFunction(kind).undamped();
        double[] coupled = design.coupledNaturalFrequencies();
        for (double w : frequencies(design, fitted.hysteretic().isEmpty() && !undamped)) {
            if (undamped && (w == coupled[0] || w == coupled[1])) {
                rows.add(new PredictedPoint(w, bare.amplitudeAt(kind, w), Double.POSITIVE_INFINITY,
                        Double.POSITIVE_INFINITY));
                continue;
            }
            double omega = w;
            if (Double.isInfinite(bare.amplitudeAt(kind, omega)) || Double.isInfinite(fitted.amplitudeAt(kind, omega))
                    || Double.isInfinite(fitted.amplitudeAt(ResponseKind.STROKE, omega))) {
                omega *= 1 + 1e-9;
            }
            rows.add(new PredictedPoint(omega, bare.amplitudeAt(kind, omega), fitted.amplitudeAt(kind, omega),
                    fitted.amplitudeAt(ResponseKind.STROKE, omega)));
        }
        return List.copyOf(rows);
    }

    /**
     * @param design the design
     * @param viscousPeaks whether to mark the exact peaks of the viscous design's response
     * @return the table's frequencies, rad/s, ascending: the marked ones (band ends, running
     *     frequency, coupled natural frequencies, peaks) and evenly spaced ones not too close to them
     */
    static double[] frequencies(DesignResult design, boolean viscousPeaks) {
        FrequencyBand band = design.study().excitation().band();
        double[] coupled = design.coupledNaturalFrequencies();
        TreeSet<Double> marked = new TreeSet<>(List.of(band.low(), band.high(),
                DamperSizing.runningFrequency(band), coupled[0], coupled[1]));
        double low = Math.min(0.8 * band.low(), 0.9 * coupled[0]);
        double high = Math.max(1.2 * band.high(), 1.1 * coupled[1]);
        // the damped peaks with the absorber, where a reading is most sensitive to the tuning
        SystemResponse viscous = DamperSizing.fitted(design);
        double omega1 = viscous.system().referenceFrequency();
        double[] peaks = viscousPeaks ? PeakFinder.interiorMaxima(viscous.transferFunction(design.study().response()),
                low / omega1, high / omega1) : new double[0];
        for (double g : peaks) {
            marked.add(g * omega1);
        }
        TreeSet<Double> all = new TreeSet<>(marked);
        // as many evenly spaced rows as it takes to reach about fifteen in all
        for (int even = ROWS - marked.size(); all.size() < ROWS && even <= 3 * ROWS; even++) {
            all = new TreeSet<>(marked);
            for (int i = 0; i < even; i++) {
                double w = low + (high - low) * i / (even - 1);
                Double below = marked.floor(w);
                Double above = marked.ceiling(w);
                boolean near = (below != null && w - below < CLOSEST * w)
                        || (above != null && above - w < CLOSEST * w);
                if (!near) {
                    all.add(w);
                }
            }
        }
        return all.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
