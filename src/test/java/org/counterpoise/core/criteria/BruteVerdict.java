package org.counterpoise.core.criteria;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationOrder;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;

/**
 * The verdict by brute force over the {@link NewtonReference} responses, written from the
 * definitions only: r.m.s. of a harmonic = amplitude / sqrt 2, peak-to-peak = 2 x amplitude, and
 * for several harmonics at distinct frequencies the r.m.s. of the sum = sqrt(sum of squared r.m.s.)
 * and the peak of the sum at most the sum of amplitudes (Harris and Piersol 2002, Shock and
 * Vibration Handbook, 5th ed., ch. 1); a limit curve is straight between its points on log-log axes
 * and held outside them. Orders are judged each on its own here (the callers use orders more than
 * a third of an octave apart) or all together.
 */
final class BruteVerdict {
    private BruteVerdict() {
    }

    /** @return {worst angular frequency of the design order, utilisation} */
    static double[] utilisation(Criterion criterion, Structure structure, Tuning tuning, Excitation excitation) {
        NewtonReference newton = new NewtonReference(structure, tuning);
        List<ExcitationOrder> orders = excitation.orders();
        FrequencyWeighting weighting = criterion.weighting().orElse(null);
        AmplitudeConvention convention = criterion.convention();
        List<LimitCurve.Point> points = criterion.limit().points();
        DoubleUnaryOperator u = w -> {
            double[] a = newton.amplitudes(criterion.quantity(), orders, weighting, w);
            if (criterion.combination() == OrderCombination.TOGETHER) {
                return combined(convention, a) / points.get(0).limit();
            }
            double worst = 0;
            for (int j = 0; j < a.length; j++) {
                double hertz = orders.get(j).frequencyFactor() * w / (2 * Math.PI);
                worst = Math.max(worst, harmonic(convention, a[j]) / limitAt(points, hertz));
            }
            return worst;
        };
        return NewtonReference.maximise(u, excitation.band().low(), excitation.band().high());
    }

    /** @return one harmonic of that amplitude in the convention */
    static double harmonic(AmplitudeConvention convention, double amplitude) {
        return switch (convention) {
            case PEAK -> amplitude;
            case RMS -> amplitude / Math.sqrt(2);
            case PEAK_TO_PEAK -> 2 * amplitude;
        };
    }

    /** @return harmonics at distinct frequencies combined in the convention */
    static double combined(AmplitudeConvention convention, double[] amplitudes) {
        double sum = 0;
        double squares = 0;
        for (double a : amplitudes) {
            sum += a;
            squares += a * a;
        }
        return convention == AmplitudeConvention.RMS ? Math.sqrt(squares / 2) : harmonic(convention, sum);
    }

    /** @return the limit at a frequency: log-log straight lines between the points, ends held */
    static double limitAt(List<LimitCurve.Point> points, double hertz) {
        if (hertz <= points.get(0).frequency()) {
            return points.get(0).limit();
        }
        for (int i = 0; i + 1 < points.size(); i++) {
            LimitCurve.Point a = points.get(i);
            LimitCurve.Point b = points.get(i + 1);
            if (hertz <= b.frequency()) {
                double t = Math.log(hertz / a.frequency()) / Math.log(b.frequency() / a.frequency());
                return Math.exp(Math.log(a.limit()) + t * Math.log(b.limit() / a.limit()));
            }
        }
        return points.get(points.size() - 1).limit();
    }
}
