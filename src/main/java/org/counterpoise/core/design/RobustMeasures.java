package org.counterpoise.core.design;

import java.util.Arrays;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.robust.Mistuning;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.robust.WorstCase;

/**
 * How any tuning of a study fares over the study's tolerance ranges: its worst case and its 95th
 * percentile. The one place the comparison of methods and the robust methods ask these figures.
 *
 * <p>First version (lead's foundation): the worst case is over structure and absorber frequency
 * only ({@link WorstCase}); the percentile samples the three ranges uniformly. The robust slice
 * replaces both with the three-range versions.
 */
public final class RobustMeasures {
    /** Samples of the percentile. */
    static final int PERCENTILE_SAMPLES = 2048;

    private RobustMeasures() {
    }

    /**
     * @param study the study (structure, disturbance, response and ranges)
     * @param tuning any tuning
     * @return where and how bad its worst peak over the ranges is, SI
     */
    public static WorstCase.Point worstCase(DesignStudy study, Tuning tuning) {
        ToleranceRanges r = study.robustness().ranges();
        return WorstCase.of(mistuning(study), Absorber.of(study.structure(), tuning), r.structure(), r.absorber());
    }

    /**
     * The 95th percentile (nearest rank) of the peak when the structure frequency, absorber
     * frequency and absorber damping are each uniform over their range, independently; the draws
     * are fixed by the study's seed, so the figure repeats exactly.
     *
     * @param study the study
     * @param tuning any tuning
     * @return the 95th percentile of the peak over the band, SI
     */
    public static double percentile95(DesignStudy study, Tuning tuning) {
        ToleranceRanges r = study.robustness().ranges();
        Mistuning m = mistuning(study);
        Absorber a = Absorber.of(study.structure(), tuning);
        RandomGenerator random = new Well19937c(study.robustness().seed());
        double[][] draws = new double[PERCENTILE_SAMPLES][3];
        for (double[] d : draws) {
            for (int k = 0; k < 3; k++) {
                d[k] = 2 * random.nextDouble() - 1;
            }
        }
        double[] peaks = Arrays.stream(draws).parallel().mapToDouble(d -> {
            Absorber varied = new Absorber(a.mass(), a.stiffness(), a.damping() * (1 + r.damping() * d[2]));
            return m.peak(varied, 1 + r.structure() * d[0], 1 + r.absorber() * d[1]);
        }).toArray();
        Arrays.sort(peaks);
        return peaks[(int) Math.ceil(0.95 * peaks.length) - 1];
    }

    private static Mistuning mistuning(DesignStudy study) {
        return new Mistuning(study.structure(), study.excitation(), study.response());
    }
}
