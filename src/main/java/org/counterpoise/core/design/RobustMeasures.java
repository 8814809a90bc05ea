package org.counterpoise.core.design;

import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.robust.BuildSample;
import org.counterpoise.core.robust.Mistuning;
import org.counterpoise.core.robust.RobustCriterion;
import org.counterpoise.core.robust.WorstCase;

/**
 * How any tuning of a study fares over the study's tolerances: its worst case and its 95th
 * percentile. The one place the comparison of methods and the robust methods ask these figures.
 *
 * <p>The worst case is over the three ranges of {@code study.robustness().ranges()} (structure
 * natural frequency, absorber natural frequency, absorber damping coefficient), exact to about
 * 1e-9 relative ({@link WorstCase}). The percentile is over {@value #PERCENTILE_SAMPLES} builds of
 * a {@link BuildSample}: drawn from the project's tolerance distributions
 * ({@code study.robustness().tolerances()}) when any is given, otherwise uniformly and
 * independently over the three ranges, which is an assumption (common practice when only ranges
 * are known, no source). The draws are fixed by the study's seed and shared by every tuning
 * (common random numbers), so the figure repeats exactly and an optimiser can minimise it; as an
 * estimate of the true percentile its rank uncertainty is the binomial one, sqrt(0.95 x 0.05 / N)
 * = 0.5 % in probability for N = {@value #PERCENTILE_SAMPLES}.
 */
public final class RobustMeasures {
    /** Builds of the percentile. */
    static final int PERCENTILE_SAMPLES = 2048;
    /** The percentile's probability. */
    static final double PERCENTILE = 0.95;

    private RobustMeasures() {
    }

    /**
     * @param study the study (structure, disturbance, response and ranges)
     * @param tuning any tuning
     * @return where and how bad its worst peak over the three ranges is, SI
     */
    public static WorstCase.Point worstCase(DesignStudy study, Tuning tuning) {
        return WorstCase.of(mistuning(study), Absorber.of(study.structure(), tuning), study.robustness().ranges());
    }

    /**
     * The 95th percentile (nearest rank) of the peak over the study's sample of builds (see the
     * class comment for the distributions).
     *
     * @param study the study
     * @param tuning any tuning
     * @return the 95th percentile of the peak over the band, SI
     */
    public static double percentile95(DesignStudy study, Tuning tuning) {
        return sample(study).percentile(mistuning(study), Absorber.of(study.structure(), tuning), PERCENTILE);
    }

    /** @return the worst case over the three ranges, as a criterion to minimise */
    static RobustCriterion worstCaseCriterion(DesignStudy study) {
        return RobustCriterion.worstCase(mistuning(study), study.robustness().ranges());
    }

    /** @return the 95th percentile over the study's builds, as a criterion to minimise */
    static RobustCriterion percentileCriterion(DesignStudy study) {
        return RobustCriterion.percentile(mistuning(study), sample(study), PERCENTILE);
    }

    /** @return the study's builds for the percentile */
    static BuildSample sample(DesignStudy study) {
        RobustnessSettings r = study.robustness();
        return BuildSample.of(r.tolerances(), r.ranges(), PERCENTILE_SAMPLES, r.seed());
    }

    static Mistuning mistuning(DesignStudy study) {
        return new Mistuning(study.structure(), study.excitation(), study.response());
    }
}
