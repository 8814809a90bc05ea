package org.counterpoise.core.robust;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.IntStream;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Structure;

/**
 * A fixed, seeded sample of builds for a percentile criterion. With tolerance distributions
 * ({@link ToleranceSet}, any given) each build draws the structure's mass and stiffness and the
 * absorber's mass, spring rate and damping as {@link MonteCarlo} does, from the same generator in
 * the same order (so the first N builds of a seed are the first N samples of the Monte Carlo run
 * with that seed). Without any, each build draws the structure frequency, absorber frequency and
 * absorber damping factors uniformly and independently over the {@link ToleranceRanges}: an
 * assumption (common practice when only ranges are known, no source). The raw draws (uniform or
 * normal numbers) are kept, not the values, so every design is judged on the same builds: common
 * random numbers, which an optimiser needs to compare two designs without sampling noise.
 */
public final class BuildSample {
    private final ToleranceSet tolerances;
    private final ToleranceRanges ranges;
    private final double[][] draws;

    private BuildSample(ToleranceSet tolerances, ToleranceRanges ranges, double[][] draws) {
        this.tolerances = tolerances;
        this.ranges = ranges;
        this.draws = draws;
    }

    /**
     * @param tolerances the distributions (used when any is given)
     * @param ranges the ranges (used otherwise, uniform)
     * @param samples number of builds (1 to 1 000 000)
     * @param seed random seed
     * @return the sample
     */
    public static BuildSample of(ToleranceSet tolerances, ToleranceRanges ranges, int samples, long seed) {
        Checks.inRange("samples", samples, 1, 1_000_000);
        RandomGenerator random = new Well19937c(seed);
        double[][] draws = new double[samples][];
        if (tolerances.anyGiven()) {
            Tolerance[] order = order(tolerances);
            for (int i = 0; i < samples; i++) {
                draws[i] = new double[5];
                for (int k = 0; k < 5; k++) {
                    draws[i][k] = switch (order[k].distribution()) {
                        case NONE -> 0;
                        case UNIFORM -> random.nextDouble();
                        case NORMAL -> random.nextGaussian();
                    };
                }
            }
            return new BuildSample(tolerances, ranges, draws);
        }
        for (int i = 0; i < samples; i++) {
            draws[i] = new double[] {2 * random.nextDouble() - 1, 2 * random.nextDouble() - 1,
                2 * random.nextDouble() - 1};
        }
        return new BuildSample(ToleranceSet.NONE, ranges, draws);
    }

    /** @return true when the builds come from tolerance distributions, false when uniform over the ranges */
    public boolean fromDistributions() {
        return tolerances.anyGiven();
    }

    /** @return number of builds */
    public int size() {
        return draws.length;
    }

    /**
     * @param m the mistuning model (nominal structure, disturbance, response)
     * @return every build, in sample order
     */
    public List<VariedBuild> builds(Mistuning m) {
        List<VariedBuild> out = new ArrayList<>(draws.length);
        for (double[] d : draws) {
            out.add(build(m, d));
        }
        return out;
    }

    private VariedBuild build(Mistuning m, double[] d) {
        if (!tolerances.anyGiven()) {
            return VariedBuild.of(m, 1 + ranges.structure() * d[0], 1 + ranges.absorber() * d[1],
                    1 + ranges.damping() * d[2]);
        }
        Tolerance[] order = order(tolerances);
        Structure s0 = m.structure();
        Structure s = new Structure(value(order[0], s0.modalMass(), d[0]), value(order[1], s0.modalStiffness(), d[1]),
                s0.dampingRatio(), s0.modeShapeAtAbsorber());
        return a -> m.peak(s, new Absorber(value(order[2], a.mass(), d[2]), value(order[3], a.stiffness(), d[3]),
                value(order[4], a.damping(), d[4])));
    }

    private static double value(Tolerance t, double nominal, double draw) {
        return switch (t.distribution()) {
            case NONE -> nominal;
            case UNIFORM -> t.sample(nominal, draw, 0);
            case NORMAL -> t.sample(nominal, 0, draw);
        };
    }

    private static Tolerance[] order(ToleranceSet t) {
        return new Tolerance[] {t.structureMass(), t.structureStiffness(), t.absorberMass(), t.absorberStiffness(),
            t.absorberDamping()};
    }

    /**
     * @param m the mistuning model
     * @param nominal the absorber as designed
     * @return the peak of every build, in sample order (computed on all cores; each a pure function
     *     of its draw, so the result does not depend on the thread count)
     */
    public double[] peaks(Mistuning m, Absorber nominal) {
        List<VariedBuild> builds = builds(m);
        double[] out = new double[builds.size()];
        IntStream.range(0, out.length).parallel()
                .forEach(i -> out[i] = builds.get(i).peak(nominal));
        return out;
    }

    /**
     * @param m the mistuning model
     * @param nominal the absorber as designed
     * @param p the probability (0.95 for the 95th percentile)
     * @return the nearest-rank percentile of the peak (the value at rank ceil(p N)), SI
     */
    public double percentile(Mistuning m, Absorber nominal, double p) {
        double[] sorted = peaks(m, nominal);
        Arrays.sort(sorted);
        return MonteCarlo.rank(sorted, p);
    }
}
