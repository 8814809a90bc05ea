package org.counterpoise.core.optim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.response.ResponseKind;
import org.junit.jupiter.api.Test;

/**
 * The stroke limit holds over the run-up [0, g_top] (every machine passes through the lower coupled
 * frequency as it starts and stops). Checked against an independent brute force written here: the
 * equations of motion of the two masses (non-dimensional: m1 = k1 = omega1 = 1, force 1, or g^2 for
 * an unbalance) solved at each frequency by Cramer's rule, the peaks over the band and over the
 * run-up found by dense sampling (300 and 800 frequencies) with each sampled maximum refined by a
 * golden-section search; for each tuning the least damping whose run-up stroke is within the
 * limit by bisection, and the best damping at or above it by a scan and a ternary search; the
 * tuning over 160 log-spaced values of the search box, then zooming scans (800 tunings, then 40
 * six times) between the neighbours of the best, around the two best of the first scan. Nothing from the production algebra is used by the brute force.
 */
class StrokeLimitedOptimumTest {

    /** One non-dimensional problem of the brute force (force, or unbalance: force g^2). */
    private record Case(ExcitationKind excitation, ResponseKind response, double mu, double zeta1, double low,
            double high) {
        PeakProblem problem() {
            return PeakProblem.free(excitation, response, mu, zeta1, low, high);
        }
    }

    /** {|response|, |stroke|} at frequency ratio g for the design (f, zeta), by Cramer's rule. */
    private static double[] direct(Case c, double f, double zeta, double g) {
        double force = c.excitation == ExcitationKind.UNBALANCE ? g * g : 1.0;
        // K = k2 + i g c2 with k2 = mu f^2, c2 = 2 zeta mu f; the two rows of the dynamic stiffness
        double kr = c.mu * f * f;
        double ki = 2 * zeta * c.mu * f * g;
        double a11r = 1 - g * g + kr;
        double a11i = 2 * c.zeta1 * g + ki;
        double a22r = kr - c.mu * g * g;
        double a22i = ki;
        // det = a11 a22 - K^2
        double detr = a11r * a22r - a11i * a22i - (kr * kr - ki * ki);
        double deti = a11r * a22i + a11i * a22r - 2 * kr * ki;
        double det2 = detr * detr + deti * deti;
        // X1 = F a22 / det, X2 = F K / det, stroke X1 - X2 = F (a22 - K) / det = F (-mu g^2) / det
        double x1 = force * Math.sqrt((a22r * a22r + a22i * a22i) / det2);
        double stroke = force * c.mu * g * g / Math.sqrt(det2);
        double response = switch (c.response) {
            case DISPLACEMENT -> x1;
            case ACCELERATION -> g * g * x1;
            default -> throw new IllegalArgumentException("not in this brute force: " + c.response);
        };
        return new double[] {response, stroke};
    }

    /** The largest |.| (index 0 response, 1 stroke) over [low, high] by sampling and golden refinement. */
    private static double sampledPeak(Case c, double f, double zeta, int index, double low, double high, int samples) {
        double[] g = new double[samples];
        double[] v = new double[samples];
        for (int i = 0; i < samples; i++) {
            g[i] = low + (high - low) * i / (samples - 1.0);
            v[i] = direct(c, f, zeta, g[i])[index];
        }
        double best = Math.max(v[0], v[samples - 1]);
        for (int i = 1; i < samples - 1; i++) {
            if (v[i] >= v[i - 1] && v[i] >= v[i + 1]) {
                best = Math.max(best, golden(c, f, zeta, index, g[i - 1], g[i + 1]));
            }
        }
        return best;
    }

    private static double golden(Case c, double f, double zeta, int index, double a, double b) {
        double r = (Math.sqrt(5) - 1) / 2;
        double x1 = b - r * (b - a);
        double x2 = a + r * (b - a);
        double f1 = direct(c, f, zeta, x1)[index];
        double f2 = direct(c, f, zeta, x2)[index];
        for (int k = 0; k < 80 && b - a > 1e-15 * b; k++) {
            if (f1 < f2) {
                a = x1;
                x1 = x2;
                f1 = f2;
                x2 = a + r * (b - a);
                f2 = direct(c, f, zeta, x2)[index];
            } else {
                b = x2;
                x2 = x1;
                f2 = f1;
                x1 = b - r * (b - a);
                f1 = direct(c, f, zeta, x1)[index];
            }
        }
        return Math.max(f1, f2);
    }

    /** Brute-force run-up stroke of a design: over [0, g_high]. */
    private static double sampledStroke(Case c, double f, double zeta) {
        return sampledPeak(c, f, zeta, 1, 0.0, c.high, 800);
    }

    /**
     * The brute-force best feasible design at tuning f: {zeta, peak}. The least damping whose
     * sampled run-up stroke is within the limit is found by 60 bisections after a scan of 40
     * dampings; the band peak is then minimised over the dampings at or above it (a scan of 40
     * and a golden-section refinement).
     */
    private static double[] bestAt(Case c, double f, double limit) {
        int nz = 40;
        double previous = 0.0;
        double least = Double.NaN;
        if (sampledStroke(c, f, 0.0) <= limit) {
            least = 0.0;
        }
        for (int j = 0; j < nz && Double.isNaN(least); j++) {
            double zeta = 1e-6 * Math.pow(PeakProblem.MAX_DAMPING / 1e-6, j / (nz - 1.0));
            if (sampledStroke(c, f, zeta) <= limit) {
                double a = previous;
                double b = zeta;
                for (int k = 0; k < 60; k++) {
                    double m = 0.5 * (a + b);
                    if (sampledStroke(c, f, m) <= limit) {
                        b = m;
                    } else {
                        a = m;
                    }
                }
                least = b;
            }
            previous = zeta;
        }
        if (Double.isNaN(least)) {
            return new double[] {Double.NaN, Double.POSITIVE_INFINITY};
        }
        double[] best = {least, sampledPeak(c, f, least, 0, c.low, c.high, 300)};
        double low = Math.log(Math.max(least, 1e-7));
        double high = Math.log(PeakProblem.MAX_DAMPING);
        int at = -1;
        double[] zs = new double[nz];
        for (int j = 0; j < nz; j++) {
            zs[j] = Math.exp(low + (high - low) * (j + 1) / nz);
            double v = sampledPeak(c, f, zs[j], 0, c.low, c.high, 300);
            if (v < best[1]) {
                best = new double[] {zs[j], v};
                at = j;
            }
        }
        if (at >= 0) {
            double a = at == 0 ? least : zs[at - 1];
            double b = at == nz - 1 ? zs[at] : zs[at + 1];
            for (int k = 0; k < 100; k++) {
                double m1 = a + (b - a) / 3;
                double m2 = b - (b - a) / 3;
                if (sampledPeak(c, f, m1, 0, c.low, c.high, 300) < sampledPeak(c, f, m2, 0, c.low, c.high, 300)) {
                    b = m2;
                } else {
                    a = m1;
                }
            }
            double v = sampledPeak(c, f, 0.5 * (a + b), 0, c.low, c.high, 300);
            if (v < best[1]) {
                best = new double[] {0.5 * (a + b), v};
            }
        }
        return best;
    }

    /** The brute-force constrained optimum {f, zeta, peak}: 160 tunings, then zooming scans near the two best. */
    private static double[] bruteForce(Case c, double limit) {
        PeakProblem p = c.problem();
        int nf = 160;
        double[] fs = new double[nf];
        double[] values = new double[nf];
        Integer[] order = new Integer[nf];
        for (int i = 0; i < nf; i++) {
            fs[i] = p.minTuning() * Math.pow(p.maxTuning() / p.minTuning(), i / (nf - 1.0));
            values[i] = bestAt(c, fs[i], limit)[1];
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> Double.compare(values[a], values[b]));
        double[] best = {Double.NaN, Double.NaN, Double.POSITIVE_INFINITY};
        for (int n = 0; n < 2; n++) {
            int i = order[n];
            // zooming scans between the neighbours of the best: 800 tunings, then 40 six times (the
            // best feasible peak at a tuning jumps where a piece of the feasible dampings appears,
            // and its minimum can sit in a valley 1e-4 wide beside such a jump, so no search that
            // assumes one minimum between two points is used)
            double a = fs[Math.max(i - 1, 0)];
            double b = fs[Math.min(i + 1, nf - 1)];
            for (int round = 0; round < 7; round++) {
                int fine = round == 0 ? 800 : 40;
                double centre = a;
                double roundBest = Double.POSITIVE_INFINITY;
                for (int k = 0; k <= fine; k++) {
                    double f = a + (b - a) * k / fine;
                    double[] at = bestAt(c, f, limit);
                    if (at[1] < roundBest) {
                        roundBest = at[1];
                        centre = f;
                    }
                    if (at[1] < best[2]) {
                        best = new double[] {f, at[0], at[1]};
                    }
                }
                double step = (b - a) / fine;
                a = Math.max(centre - step, a);
                b = Math.min(centre + step, b);
            }
        }
        return best;
    }

    private static double runUpStroke(PeakProblem p, PeakOptimum o) {
        return PeakFinder.over(p.strokeTransferFunction(o.tuning().tuningRatio(), o.tuning().dampingRatio()), 0.0,
                p.strokeTop()).magnitude();
    }

    private static ActiveConstraint agreesWithBruteForce(Case c, double limitFactor) {
        PeakProblem free = c.problem();
        PeakOptimum unlimited = HInfinityOptimiser.optimise(free);
        double limit = limitFactor * free.withStrokeLimit(1.0).strokePeak(unlimited.tuning().tuningRatio(),
                unlimited.tuning().dampingRatio());
        PeakProblem limited = free.withStrokeLimit(limit);
        PeakOptimum o = HInfinityOptimiser.optimise(limited);
        assertTrue(o.converged(), c + ": certified");
        // the run-up stroke (exact peak search over [0, g_high]) is within the limit, and on it when
        // the limit is the active constraint (a feasible optimum off the limit is possible too)
        assertTrue(runUpStroke(limited, o) <= limit * (1 + 1e-9), c + ": run-up stroke " + runUpStroke(limited, o));
        if (o.activeConstraint() == ActiveConstraint.STROKE_LIMIT) {
            assertEquals(limit, runUpStroke(limited, o), 1e-9 * limit, c.toString());
        }
        double[] brute = bruteForce(c, limit);
        // the brute force finds nothing feasible lower, and its best agrees to 1e-9 (measured: 2e-13)
        assertTrue(brute[2] >= o.peak() * (1 - 1e-9), c + ": brute force " + brute[2] + " below " + o.peak());
        assertEquals(o.peak(), brute[2], 1e-9 * o.peak(), c + ": brute force at f " + brute[0] + " zeta " + brute[1]
                + ", optimiser at " + o.tuning());
        return o.activeConstraint();
    }

    @Test
    void bandAroundTheResonance() {
        assertEquals(ActiveConstraint.STROKE_LIMIT, agreesWithBruteForce(
                new Case(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.05, 0.02, 0.85, 1.15), 0.7));
    }

    @Test
    void bandAboveTheResonanceAccelerationLikeTheCompressorPreset() {
        assertEquals(ActiveConstraint.STROKE_LIMIT, agreesWithBruteForce(
                new Case(ExcitationKind.FORCE, ResponseKind.ACCELERATION, 0.1, 0.015, 0.94, 1.07), 0.6));
    }

    @Test
    void unbalanceOverABandAboveTheResonance() {
        assertEquals(ActiveConstraint.STROKE_LIMIT, agreesWithBruteForce(
                new Case(ExcitationKind.UNBALANCE, ResponseKind.DISPLACEMENT, 0.08, 0.03, 1.2, 1.5), 0.8));
    }

    /**
     * Seeded random problems (force or unbalance, displacement or acceleration, mass ratio 0.02 to
     * 0.2, structure damping 0.005 to 0.05, bands around, above and below the resonance, limits 30 %
     * to 95 % of the free optimum's run-up stroke): 1 by default, {@code -DstrokeCases=N} for more.
     * A limit no damping meets is refused with its reason (checked below), not counted.
     */
    @Test
    void randomProblemsAgreeWithTheBruteForce() {
        int cases = Integer.getInteger("strokeCases", 1);
        Random r = new Random(1203L);
        int done = 0;
        for (int i = 0; done < cases && i < 10 * cases; i++) {
            ExcitationKind e = r.nextBoolean() ? ExcitationKind.FORCE : ExcitationKind.UNBALANCE;
            ResponseKind response = r.nextBoolean() ? ResponseKind.DISPLACEMENT : ResponseKind.ACCELERATION;
            double mu = 0.02 + 0.18 * r.nextDouble();
            double zeta1 = 0.005 + 0.045 * r.nextDouble();
            double low = switch (r.nextInt(3)) {
                case 0 -> 0.8 + 0.15 * r.nextDouble();
                case 1 -> 1.1 + 0.4 * r.nextDouble();
                default -> 0.4 + 0.3 * r.nextDouble();
            };
            double high = low * (1.05 + 0.3 * r.nextDouble());
            double factor = 0.3 + 0.65 * r.nextDouble();
            try {
                agreesWithBruteForce(new Case(e, response, mu, zeta1, low, high), factor);
                done++;
            } catch (InvalidInputException unreachable) {
                assertEquals("stroke limit", unreachable.field());
            }
        }
        assertEquals(cases, done);
    }

    @Test
    void aLooseLimitGivesTheUnconstrainedOptimum() {
        PeakProblem free = new Case(ExcitationKind.FORCE, ResponseKind.DISPLACEMENT, 0.05, 0.02, 0.85, 1.15).problem();
        PeakOptimum unlimited = HInfinityOptimiser.optimise(free);
        double stroke = free.withStrokeLimit(1.0).strokePeak(unlimited.tuning().tuningRatio(),
                unlimited.tuning().dampingRatio());
        PeakOptimum loose = HInfinityOptimiser.optimise(free.withStrokeLimit(stroke * 1.01));
        assertEquals(unlimited.tuning(), loose.tuning());
        assertEquals(unlimited.peak(), loose.peak(), 0.0);
        assertEquals(ActiveConstraint.NONE, loose.activeConstraint());
    }
}
