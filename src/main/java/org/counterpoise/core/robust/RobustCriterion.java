package org.counterpoise.core.robust;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.stream.IntStream;
import org.counterpoise.core.model.Absorber;

/**
 * What a robust design minimises: the k-th largest peak over a set of builds. The worst case over
 * the tolerance ranges is the largest (k = 1) over the continuum of the ranges; the 95th percentile
 * is the k-th largest over a fixed sample ({@link BuildSample}). Both are written so that
 * {@link RobustOptimiser} can minimise them by exchange: over any finite subset of the builds the
 * k-th largest is at most the criterion, for every design, so minimising over a subset gives a
 * lower bound, and the subset grows by the builds that are worst at the design found.
 */
public interface RobustCriterion {

    /** @return k: the criterion is the k-th largest peak (1 for the worst case) */
    int rank();

    /**
     * @return the relative accuracy the search closes its gap to: 1e-9 for the worst case; 1e-5 for
     *     a percentile, whose sampling uncertainty (0.5 % in probability) is far larger anyway
     */
    double accuracy();

    /**
     * @return true to search from every seed (cheap subsets: the worst case), false to search from
     *     the best seed only (the percentile, whose subset holds a hundred builds and more)
     */
    boolean searchFromEverySeed();

    /** @return builds to start the subset with (may be empty: the first evaluation supplies them) */
    List<VariedBuild> initialBuilds();

    /**
     * @param absorber a design
     * @return the criterion at it and the builds that decide it
     */
    Evaluation evaluate(Absorber absorber);

    /**
     * @param value the criterion, SI
     * @param deciding builds worst at this design (added to the exchange subset)
     * @param worstPoint where the worst case is, for the worst-case criterion
     */
    record Evaluation(double value, List<VariedBuild> deciding, Optional<WorstCase.Point> worstPoint) {
    }

    /**
     * @param m the mistuning model
     * @param ranges the three ranges
     * @return the worst case over them ({@link WorstCase})
     */
    static RobustCriterion worstCase(Mistuning m, ToleranceRanges ranges) {
        return new RobustCriterion() {
            @Override
            public int rank() {
                return 1;
            }

            @Override
            public double accuracy() {
                return 1e-9;
            }

            @Override
            public boolean searchFromEverySeed() {
                return true;
            }

            @Override
            public List<VariedBuild> initialBuilds() {
                // the corners of the box and the nominal build
                List<VariedBuild> out = new ArrayList<>();
                out.add(VariedBuild.of(m, 1, 1, 1));
                for (double s : ends(ranges.structure())) {
                    for (double a : ends(ranges.absorber())) {
                        for (double c : ends(ranges.damping())) {
                            out.add(VariedBuild.of(m, s, a, c));
                        }
                    }
                }
                return out;
            }

            @Override
            public Evaluation evaluate(Absorber absorber) {
                WorstCase.Point p = WorstCase.of(m, absorber, ranges);
                return new Evaluation(p.peak(), List.of(VariedBuild.of(m, p.structureFactor(), p.absorberFactor(),
                        p.dampingFactor())), Optional.of(p));
            }
        };
    }

    private static double[] ends(double range) {
        return range == 0 ? new double[] {1} : new double[] {1 - range, 1 + range};
    }

    /**
     * @param m the mistuning model
     * @param sample the builds
     * @param probability the percentile's probability (0.95)
     * @return the nearest-rank percentile of the peak over the sample
     */
    static RobustCriterion percentile(Mistuning m, BuildSample sample, double probability) {
        List<VariedBuild> builds = sample.builds(m);
        int n = builds.size();
        // nearest rank: the sorted sample at index ceil(p N) - 1, i.e. the k-th largest
        int k = n - Math.max((int) Math.ceil(probability * n), 1) + 1;
        return new RobustCriterion() {
            @Override
            public int rank() {
                return k;
            }

            @Override
            public double accuracy() {
                return 1e-5;
            }

            @Override
            public boolean searchFromEverySeed() {
                return false;
            }

            @Override
            public List<VariedBuild> initialBuilds() {
                return List.of();
            }

            @Override
            public Evaluation evaluate(Absorber absorber) {
                double[] peaks = new double[n];
                IntStream.range(0, n).parallel().forEach(i -> peaks[i] = builds.get(i).peak(absorber));
                Integer[] order = new Integer[n];
                Arrays.setAll(order, i -> i);
                // highest first; equal peaks in sample order, so the result is deterministic
                Arrays.sort(order, Comparator.comparingDouble((Integer i) -> -peaks[i]).thenComparingInt(i -> i));
                // the k that decide it and as many again below them, which may overtake them nearby
                List<VariedBuild> deciding = new ArrayList<>();
                for (int j = 0; j < Math.min(n, 3 * k / 2); j++) {
                    deciding.add(builds.get(order[j]));
                }
                return new Evaluation(peaks[order[k - 1]], deciding, Optional.empty());
            }
        };
    }
}
