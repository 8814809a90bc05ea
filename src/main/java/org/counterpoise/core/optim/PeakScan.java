package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.response.AbsorberAffineResponse;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.TransferFunctions;
import org.counterpoise.core.tuning.ClosedForm;
import org.counterpoise.core.tuning.ClosedForms;
import org.counterpoise.core.tuning.DenHartogEqualPeak;
import org.counterpoise.core.tuning.IoiIkeda;
import org.counterpoise.core.tuning.NishiharaAsamiExact;

/**
 * The band peak of a problem over grids of designs: the closed-form seeds, the coarse scan whose
 * best points seed the active-set search, and the scan of the whole search box that certifies an
 * optimum (see {@link HInfinityOptimiser}).
 *
 * <p>Why the scans are cheap without being weaker. A scan point matters only if its band peak
 * could be among the lowest (the seed scan keeps three) or below the optimum (the certificate).
 * The value of |H| at any one frequency of the band is a lower bound on the band peak, and
 * {@link AbsorberAffineResponse} gives it for about the cost of forty multiplications. A point
 * whose bound already exceeds the level that matters by {@link #BOUND_MARGIN} (far above the
 * round-off of either route) provably cannot matter, and its exact peak search is skipped; every
 * other point gets the exact search, so every decision is the one the full scan would take. The
 * frequencies tried are those where peaks sit: the maxima of the best design so far, the band
 * ends, the two undamped natural frequencies of the design, the structure's own and that of the
 * locked absorber.
 */
final class PeakScan {
    private static final int SEED_TUNINGS = 16;
    private static final int SEED_DAMPINGS = 10;
    private static final int BOX_TUNINGS = 48;
    private static final int BAND_TUNINGS = 12;
    private static final int BOX_DAMPINGS = 15;
    /** A lower bound must exceed the level that matters by this much (relative) to skip a point. */
    static final double BOUND_MARGIN = 1e-6;
    /** A point's value is exact when this flag (index 4) is 1, a lower bound when 0. */
    private static final int EXACT = 4;

    private PeakScan() {
    }

    /**
     * @return the exact band peak of the design (f, zeta) (fixed values override), +infinity
     *     outside the search box
     */
    static double peakOf(PeakProblem p, double f, double zeta, EvaluationCounter counter) {
        counter.add(1);
        if (!p.inBox(f, zeta)) {
            return Double.POSITIVE_INFINITY; // outside the search box: never built, never reported
        }
        return PeakFinder.over(p.transferFunction(f, zeta), p.bandLow(), p.bandHigh()).magnitude();
    }

    /** The closed-form seeds: published optimum for the pair, and for a band one tuned inside it. */
    static List<double[]> seeds(PeakProblem p) {
        List<double[]> seeds = new ArrayList<>();
        double mu = p.massRatio();
        Tuning base = ClosedForms.equalPeak(p.excitation(), p.response(), mu).map(ClosedForm::tuning)
                .orElse(DenHartogEqualPeak.tuning(mu));
        if (p.structureDamping() > 0 && p.excitation() == ExcitationKind.FORCE
                && p.response() == ResponseKind.DISPLACEMENT) {
            base = IoiIkeda.tuning(mu, Math.min(p.structureDamping(), 0.1));
        }
        seeds.add(new double[] {fixedOr(p.fixedTuning(), base.tuningRatio()),
            fixedOr(p.fixedDamping(), base.dampingRatio())});

        if (!p.allFrequencies()) {
            double top = Double.isInfinite(p.bandHigh()) ? 2 * Math.max(p.bandLow(), 0.5) : p.bandHigh();
            double centre = 0.5 * (p.bandLow() + top);
            seeds.add(new double[] {fixedOr(p.fixedTuning(), centre), fixedOr(p.fixedDamping(), 0.3 * base.dampingRatio())});
            seeds.add(new double[] {fixedOr(p.fixedTuning(), centre), fixedOr(p.fixedDamping(), base.dampingRatio())});
        }
        return seeds;
    }

    static double fixedOr(double fixed, double value) {
        return Double.isNaN(fixed) ? value : fixed;
    }

    /**
     * A coarse scan of the band peak over tuning inside and around the band and damping over three
     * decades, whose three best points seed the active-set search: over a band the optimum can sit
     * far from any closed form (tuned inside the band, lightly damped).
     *
     * @return the three lowest points {f, zeta, peak}, lowest first (grid order among equals)
     */
    static List<double[]> seedScan(PeakProblem p, EvaluationCounter counter) {
        double top = Double.isInfinite(p.bandHigh()) ? Math.max(2.0, 2 * p.bandLow()) : p.bandHigh();
        double fLow = Math.max(0.05, 0.7 * Math.min(p.bandLow(), 1.0));
        double fHigh = Math.max(1.2, 1.2 * top);
        Bounds bounds = new Bounds(p, new double[0]);
        double[] lowest = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        List<double[]> points = new ArrayList<>();
        for (int i = 0; i < SEED_TUNINGS; i++) {
            double f = Double.isNaN(p.fixedTuning()) ? fLow * Math.pow(fHigh / fLow, i / (SEED_TUNINGS - 1.0))
                    : p.fixedTuning();
            for (int j = 0; j < SEED_DAMPINGS; j++) {
                double zeta = Double.isNaN(p.fixedDamping()) ? 0.002 * Math.pow(500, j / (SEED_DAMPINGS - 1.0))
                        : p.fixedDamping();
                double third = lowest[2];
                if (Double.isFinite(third) && bounds.exceeds(f, zeta, third * (1 + BOUND_MARGIN))) {
                    continue; // provably above three points already found: never among the three lowest
                }
                double peak = peakOf(p, f, zeta, counter);
                points.add(new double[] {f, zeta, peak});
                insertLowest(lowest, peak);
            }
        }
        points.sort((a, b) -> Double.compare(a[2], b[2]));
        return new ArrayList<>(points.subList(0, Math.min(3, points.size())));
    }

    private static void insertLowest(double[] lowest, double value) {
        for (int i = 0; i < lowest.length; i++) {
            if (value < lowest[i]) {
                System.arraycopy(lowest, i, lowest, i + 1, lowest.length - i - 1);
                lowest[i] = value;
                return;
            }
        }
    }

    /**
     * The coarse global scan that certifies an optimum: the band peak on a grid over the whole
     * search box (48 tunings log-spaced over [minTuning, maxTuning], plus 12 spread over the band
     * itself, times the damping 0 and 15 values log-spaced over [1e-3, MAX_DAMPING]), and the
     * classical designs (Den Hartog, the published equal-peak form of the pair, Ioi and Ikeda,
     * Nishihara and Asami) where they lie in the box. A point whose lower bound exceeds
     * {@code optimum} (by {@link #BOUND_MARGIN}) keeps the bound instead of its exact peak.
     *
     * @param optimum the band peak of the best design found
     * @param optimumAt the best design {f, zeta}: its maxima are the first frequencies tried
     */
    static GlobalScan global(PeakProblem p, EvaluationCounter counter, double optimum, double[] optimumAt) {
        double[] frequencies = PeakFinder.interiorMaxima(p.transferFunction(optimumAt[0], optimumAt[1]),
                p.bandLow(), p.bandHigh());
        Bounds bounds = new Bounds(p, frequencies);
        double level = optimum * (1 + BOUND_MARGIN);
        List<double[]> points = new ArrayList<>();
        for (double[] design : globalDesigns(p)) {
            double f = design[0];
            double zeta = design[1];
            boolean skip = Double.isFinite(level) && bounds.exceeds(f, zeta, level);
            double value = skip ? level : peakOf(p, f, zeta, counter);
            points.add(new double[] {f, zeta, value, points.size(), skip ? 0 : 1});
        }
        return new GlobalScan(p, counter, points);
    }

    /** The designs of the global scan in grid order, classical designs last. */
    private static List<double[]> globalDesigns(PeakProblem p) {
        List<Double> tunings = !Double.isNaN(p.fixedTuning()) ? List.of(p.fixedTuning())
                : tunings(p, BOX_TUNINGS, BAND_TUNINGS);
        List<Double> dampings = new ArrayList<>();
        if (!Double.isNaN(p.fixedDamping())) {
            dampings.add(p.fixedDamping());
        } else {
            dampings.add(0.0);
            for (int j = 0; j < BOX_DAMPINGS; j++) {
                dampings.add(1e-3 * Math.pow(PeakProblem.MAX_DAMPING / 1e-3, j / (BOX_DAMPINGS - 1.0)));
            }
        }
        List<double[]> designs = new ArrayList<>();
        for (double f : tunings) {
            for (double zeta : dampings) {
                designs.add(new double[] {f, zeta});
            }
        }
        for (Tuning t : classicalDesigns(p)) {
            designs.add(new double[] {fixedOr(p.fixedTuning(), t.tuningRatio()), fixedOr(p.fixedDamping(), t.dampingRatio())});
        }
        return designs;
    }

    /**
     * Tunings of a scan: {@code box} log-spaced over the search box, then {@code inBand} spread
     * over the band (centres of equal parts; an open band taken up to twice its low end, at least 1).
     */
    static List<Double> tunings(PeakProblem p, int box, int inBand) {
        List<Double> tunings = new ArrayList<>();
        for (int i = 0; i < box; i++) {
            tunings.add(p.minTuning() * Math.pow(p.maxTuning() / p.minTuning(), i / (box - 1.0)));
        }
        if (!p.allFrequencies()) {
            double top = Double.isFinite(p.bandHigh()) ? p.bandHigh() : 2 * Math.max(p.bandLow(), 0.5);
            for (int i = 0; i < inBand; i++) {
                double f = p.bandLow() + (top - p.bandLow()) * (i + 0.5) / inBand;
                if (f >= p.minTuning() && f <= p.maxTuning()) {
                    tunings.add(f);
                }
            }
        }
        return tunings;
    }

    /** The published designs that apply to the problem's pair and mass ratio. */
    private static List<Tuning> classicalDesigns(PeakProblem p) {
        double mu = p.massRatio();
        List<Tuning> out = new ArrayList<>();
        out.add(DenHartogEqualPeak.tuning(mu));
        ClosedForms.equalPeak(p.excitation(), p.response(), mu).map(ClosedForm::tuning).ifPresent(out::add);
        if (p.excitation() == ExcitationKind.FORCE && p.response() == ResponseKind.DISPLACEMENT) {
            out.add(NishiharaAsamiExact.tuning(mu));
            if (p.structureDamping() > 0) {
                out.add(IoiIkeda.tuning(mu, Math.min(p.structureDamping(), 0.1)));
            }
        }
        return out;
    }

    /**
     * The points of the global scan, ordered by value (grid order among equals, as a stable sort
     * of the full scan would leave them). Points that provably cannot beat the optimum hold a lower
     * bound; {@link #resolved()} replaces the bounds by exact peaks when every value is wanted.
     */
    static final class GlobalScan {
        private static final Comparator<double[]> ORDER =
                Comparator.<double[]>comparingDouble(point -> point[2]).thenComparingDouble(point -> point[3]);
        private final PeakProblem problem;
        private final EvaluationCounter counter;
        private final List<double[]> points;

        private GlobalScan(PeakProblem problem, EvaluationCounter counter, List<double[]> points) {
            this.problem = problem;
            this.counter = counter;
            this.points = points;
            points.removeIf(point -> point[EXACT] == 1 && !Double.isFinite(point[2]));
            points.sort(ORDER);
        }

        /** @return the lowest point whose exact peak is below {@code level}, or null */
        double[] firstBelow(double level) {
            for (double[] point : points) {
                if (point[2] < level) {
                    return point;
                }
            }
            return null;
        }

        void remove(double[] point) {
            points.remove(point);
        }

        /** @return the lowest value (exact, or a bound above the optimum); +infinity when empty */
        double lowest() {
            double lowest = Double.POSITIVE_INFINITY;
            for (double[] point : points) {
                lowest = Math.min(lowest, point[2]);
            }
            return lowest;
        }

        /** @return every remaining point with its exact peak, finite ones only, lowest first */
        List<double[]> resolved() {
            for (double[] point : points) {
                if (point[EXACT] == 0) {
                    point[2] = peakOf(problem, point[0], point[1], counter);
                    point[EXACT] = 1;
                }
            }
            points.removeIf(point -> !Double.isFinite(point[2]));
            points.sort(ORDER);
            return points;
        }
    }

    /** Cheap lower bounds on the band peak of a design: |H| at frequencies where peaks sit. */
    private static final class Bounds {
        private final PeakProblem problem;
        private final AbsorberAffineResponse response;
        private final double[] fixedFrequencies;
        private final double[] frequencies;
        private int lastHit;

        Bounds(PeakProblem p, double[] maxima) {
            this.problem = p;
            this.response = TransferFunctions.affineInAbsorber(p.excitation(), p.response(), p.structureDamping(),
                    p.massRatio());
            List<Double> fixed = new ArrayList<>();
            for (double g : maxima) {
                fixed.add(g);
            }
            fixed.add(p.bandLow());
            fixed.add(p.bandHigh());
            fixed.add(1.0);
            fixed.add(1.0 / Math.sqrt(1.0 + p.massRatio()));
            this.fixedFrequencies = fixed.stream().mapToDouble(Double::doubleValue).toArray();
            this.frequencies = new double[fixedFrequencies.length + 2];
        }

        /** @return true when the band peak of (f, zeta) is provably above {@code level} */
        boolean exceeds(double f, double zeta, double level) {
            if (!problem.inBox(f, zeta)) {
                return false; // the exact route answers at once
            }
            double fe = fixedOr(problem.fixedTuning(), f);
            double ze = fixedOr(problem.fixedDamping(), zeta);
            System.arraycopy(fixedFrequencies, 0, frequencies, 0, fixedFrequencies.length);
            // undamped natural frequencies of the pair: x^2 - x (1 + f^2 (1 + mu)) + f^2 = 0, x = g^2
            double b = 1 + fe * fe * (1 + problem.massRatio());
            double root = Math.sqrt(Math.max(b * b - 4 * fe * fe, 0.0));
            frequencies[fixedFrequencies.length] = Math.sqrt(0.5 * (b - root));
            frequencies[fixedFrequencies.length + 1] = Math.sqrt(0.5 * (b + root));
            double squared = level * level;
            int n = frequencies.length;
            for (int k = 0; k < n; k++) {
                int i = (lastHit + k) % n;
                double g = frequencies[i];
                if (g > 0 && g >= problem.bandLow() && g <= problem.bandHigh() && Double.isFinite(g)
                        && response.magnitudeSquared(fe, ze, g) > squared) {
                    lastHit = i;
                    return true;
                }
            }
            return false;
        }
    }
}
