package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.system.ModalPeak;

/**
 * The exact H-infinity optimum of several absorbers of equal mass on one mode: the tunings and
 * dampings that minimise the peak of |X k1 / F| over the band, with a uniform spread (three
 * variables) or each absorber tuned and damped on its own (2n variables).
 *
 * <p>Method. The peak is the largest of finitely many smooth functions of the variables: the
 * interior maxima of |H|^2 (found exactly by the polynomial peak search on the exact rational H of
 * {@code ModalSystem}) and the band ends. From each seed, sequential linear programming in a trust
 * region ({@link MinimaxTrustRegion}, in {@link MinimaxSearch}) approaches a minimax point; Newton's method on its first-order
 * conditions ({@link MinimaxKkt}) then makes the active maxima equal to round-off. Seeds: for the
 * uniform spread, the certified single-absorber optimum of the same total mass ({@link
 * HInfinityOptimiser}; Den Hartog's equal-peak design when the structure is undamped and the band
 * open) split into n equal absorbers, unspread and spread by sqrt(mu) / 2 and sqrt(mu) with less damping, and the
 * two best points of the coarse scan; for individual tuning, the uniform optimum and the two best
 * scan points (a scan point whose peak is 20 % above a result already found is not pursued; the
 * uniform optimum that seeds the individual search is not certified itself). The
 * lowest result is certified ({@link AbsorberSetCertificate}): the active maxima
 * are equal to 1e-9, the first-order conditions hold, no point of the coarse global scan is lower
 * and no small random move lowers the peak. A scan point that is lower restarts the search from it
 * (at most twice).
 */
public final class AbsorberSetOptimiser {
    private AbsorberSetOptimiser() {
    }

    /**
     * @param problem the problem
     * @return the optimum with its certificate
     */
    public static AbsorberSetOptimum optimise(AbsorberSetProblem problem) {
        EvaluationCounter counter = new EvaluationCounter();
        AbsorberSetVariables v = new AbsorberSetVariables(problem);
        MinimaxSearch.Result result = search(v, counter, true);
        AbsorberSetDesign design = v.design(result.point());
        // The printed peak is the design's own, valued on the factored route (ModalPeak), which keeps its
        // accuracy where light absorbers swamp the search's pieces (found by an independent check: two
        // absorbers at mu = 5e-4 printed 55.857 where the design reaches 55.979). Higher by more than 1e-9:
        // that is printed, uncertified. Not yet enough at mu = 1e-4, where the factored route misses a
        // very sharp maximum too (101.9 printed, 150.8 reached; docs/several-modes.md).
        double own = ModalPeak.over(problem.system(design), problem.forcePoint(), problem.responsePoint(),
                problem.bandLow(), problem.bandHigh());
        AbsorberSetCertificate c = result.certificate();
        if (own > result.peak() * (1 + AbsorberSetCertificate.NOT_BEATEN)) {
            return new AbsorberSetOptimum(problem, design, own, new AbsorberSetCertificate(c.activePeaks(),
                    c.activeSpread(), c.stationarity(), c.scanPoints(), c.scanBest(), c.perturbations(),
                    c.perturbationLeast(), false), counter.count());
        }
        return new AbsorberSetOptimum(problem, design, result.peak(), c, counter.count());
    }

    /**
     * @param v the variables
     * @param counter counts transfer functions built
     * @param certify false for the uniform optimum that only seeds the individual search
     * @return the lowest point found (with its certificate when asked)
     */
    private static MinimaxSearch.Result search(AbsorberSetVariables v, EvaluationCounter counter, boolean certify) {
        List<double[]> scan = AbsorberSetScan.scan(v, counter);
        List<double[]> seeds = new ArrayList<>();
        AbsorberSetProblem problem = v.problem();
        if (problem.surroundings().isPresent()) {
            // the whole structure: the optimum on the target mode alone first (the design as the mode
            // alone sees it, always pursued, so the result is never above it on the whole structure)
            AbsorberSetOptimum alone = optimise(problem.modeAlone());
            counter.add(alone.evaluations());
            seeds.add(v.pointOf(alone.design()));
        }
        seeds.addAll(seeds(v, scan, counter));
        // the closed-form seeds are always pursued; the scan's two best (uniform only) only when promising
        int structured = problem.tuning() == AbsorberSetTuning.UNIFORM ? seeds.size() - Math.min(2, scan.size())
                : seeds.size();
        return MinimaxSearch.run(v, seeds, structured, scan, counter, certify);
    }

    private static List<double[]> seeds(AbsorberSetVariables v, List<double[]> scan, EvaluationCounter counter) {
        AbsorberSetProblem problem = v.problem();
        List<double[]> seeds = new ArrayList<>();
        if (problem.tuning() == AbsorberSetTuning.UNIFORM) {
            PeakOptimum single = HInfinityOptimiser.optimise(PeakProblem.free(ExcitationKind.FORCE,
                    ResponseKind.DISPLACEMENT, problem.massRatio(), problem.structureDamping(), problem.bandLow(),
                    problem.bandHigh()));
            Tuning t = single.tuning();
            counter.add(single.evaluations());
            double zeta = Math.max(t.dampingRatio(), 2 * AbsorberSetProblem.MIN_DAMPING);
            seeds.add(v.point(t.tuningRatio(), 0.0, zeta));
            if (problem.count() > 1) {
                // Spread seeds scale with sqrt(mu), as the coupled frequencies of one absorber do
                // (reference sheet, section 3: Omega^2 = 1 + mu/2 -/+ sqrt(mu + mu^2/4)); the
                // unspread design is symmetric in the spread, so it cannot leave it by itself.
                double root = Math.sqrt(problem.massRatio());
                seeds.add(v.point(t.tuningRatio(), Math.min(AbsorberSetProblem.MAX_SPREAD, 0.5 * root), zeta / 2));
                seeds.add(v.point(t.tuningRatio(), Math.min(AbsorberSetProblem.MAX_SPREAD, root), zeta / 3));
            }
        } else {
            // the uniform optimum as found, without its certificate (a seed needs none)
            AbsorberSetVariables uniform = new AbsorberSetVariables(problem.with(AbsorberSetTuning.UNIFORM));
            seeds.add(v.individualPoint(uniform.design(search(uniform, counter, false).point())));
            return seeds; // the scan's random points are far coarser; one that beats the result restarts it
        }
        for (int i = 0; i < Math.min(2, scan.size()); i++) {
            seeds.add(Arrays.copyOf(scan.get(i), scan.get(i).length - 1));
        }
        return seeds;
    }
}
