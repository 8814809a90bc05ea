package org.counterpoise.core.design;

import java.util.stream.IntStream;
import org.counterpoise.core.optim.HInfinityOptimiser;
import org.counterpoise.core.optim.PeakProblem;
import org.counterpoise.core.response.ResponseScale;

/**
 * The least peak of the response that matters, over the study's band, that an optimally tuned
 * absorber of each mass ratio can achieve (exact H-infinity optimum): the curve an engineer picks a
 * mass from. SI values. Constraints of the study are ignored here.
 */
public final class AchievablePeak {
    private AchievablePeak() {
    }

    /**
     * @param study the study (its sizing and method are ignored)
     * @param massRatios the mass ratios
     * @return the optimum peak at each, SI
     */
    public static double[] overMassRatio(DesignStudy study, double[] massRatios) {
        double scale = ResponseScale.of(study.structure(), study.excitation().kind(), study.excitation().amplitude(),
                study.response());
        DesignStudy free = new DesignStudy(study.name(), study.structure(), study.excitation(), study.response(),
                AbsorberSizing.ofMassRatio(0.05), DesignMethod.EXACT_PEAK, false, study.strokeMargin());
        return IntStream.range(0, massRatios.length).parallel().mapToDouble(i -> {
            PeakProblem p = Designer.peakProblem(free, massRatios[i]);
            return scale * HInfinityOptimiser.optimise(p).peak();
        }).toArray();
    }

    /**
     * @param low smallest mass ratio
     * @param high largest mass ratio
     * @param points number of points (at least 2)
     * @return log-spaced mass ratios
     */
    public static double[] massRatios(double low, double high, int points) {
        double[] out = new double[points];
        for (int i = 0; i < points; i++) {
            out[i] = low * Math.pow(high / low, i / (points - 1.0));
        }
        return out;
    }
}
