package org.counterpoise.core.optim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * Sets on the whole structure and spillover limits on random invented structures (2 or 3 modes,
 * three named points, the force, the response and the absorbers at random points, bands around the
 * target mode), each design judged by an independent route: the dense complex LU solve of the
 * equations of motion (Commons Math, {@code ModalDirectSolve}), swept densely. Per case: the reported
 * peak is the dense solve's; the design is not above the set designed on the target mode alone put on
 * the same structure; no small random move lowers it; with a spillover limit at 80 % of what the
 * unlimited set leaves near each other mode, every limit is kept when the result says so, and the
 * band peak is not below the unlimited one.
 */
class WholeStructureRandomTest {
    private static final String[] POINTS = {"a", "b", "c"};

    private static List<PointAbsorber> si(AbsorberSetDesign d, double mass, double wr, String at) {
        List<PointAbsorber> out = new ArrayList<>();
        for (int j = 0; j < d.count(); j++) {
            out.add(PointAbsorber.tuned(at, d.massRatios().get(j) * mass, d.tuningRatios().get(j) * wr,
                    d.dampingRatios().get(j)));
        }
        return out;
    }

    private static double sweep(ModalStructure s, List<PointAbsorber> a, String force, String response, double low,
            double high) {
        return DenseSweep.everyMaximum(w -> ModalDirectSolve.solve(s.modes(), a, force, response, w)[0].abs(), low,
                high, 4000);
    }

    @Test
    void randomStructuresAgainstTheDenseSolve() {
        Random random = new Random(5);
        for (int trial = 0; trial < 12; trial++) {
            int n = 2 + random.nextInt(2);
            List<Mode> modes = new ArrayList<>();
            double f = 8 + 4 * random.nextDouble();
            for (int r = 0; r < n; r++) {
                Map<String, Double> shape = new HashMap<>();
                for (String p : POINTS) {
                    shape.put(p, 0.2 + random.nextDouble());
                }
                modes.add(new Mode(2 * Math.PI * f, 0.005 + 0.02 * random.nextDouble(), 500 + 2000 * random.nextDouble(),
                        shape));
                f *= 1.1 + 0.5 * random.nextDouble();
            }
            ModalStructure structure = new ModalStructure(modes);
            String at = POINTS[random.nextInt(3)];
            String force = POINTS[random.nextInt(3)];
            String response = POINTS[random.nextInt(3)];
            Mode target = structure.modes().get(0);
            double wr = target.naturalFrequency();
            double mass = target.massSeenAt(at);
            double mu = 0.02 + 0.06 * random.nextDouble();
            double gl = 0.85 + 0.1 * random.nextDouble();
            double gh = 1.05 + 0.1 * random.nextDouble();
            int count = 2 + random.nextInt(2);
            AbsorberSetTuning tuning = random.nextBoolean() ? AbsorberSetTuning.UNIFORM : AbsorberSetTuning.INDIVIDUAL;
            AbsorberSetProblem alone = new AbsorberSetProblem(count, mu, target.dampingRatio(), gl, gh, tuning);
            AbsorberSetProblem whole = alone.on(SetSurroundings.scaled(structure, 0, at, force, response));
            String label = "trial " + trial + " (" + n + " modes, " + count + " " + tuning + ")";

            AbsorberSetOptimum o = AbsorberSetOptimiser.optimise(whole);
            double stiffness = mass * wr * wr;
            List<PointAbsorber> a = si(o.design(), mass, wr, at);
            double peak = sweep(structure, a, force, response, gl * wr, gh * wr);
            assertEquals(peak, o.peak() / stiffness, 1e-7 * peak, label + ": the reported peak is the dense solve's");
            double modeAlone = sweep(structure, si(AbsorberSetOptimiser.optimise(alone).design(), mass, wr, at), force,
                    response, gl * wr, gh * wr);
            assertTrue(peak <= modeAlone * (1 + 1e-7), label + ": " + peak + " above the mode-alone set's " + modeAlone);
            for (int i = 0; i < 12; i++) {
                // a move within the tuning rule: each absorber's own (individual), or the centre, the
                // spread and the one damping ratio (uniform, Xu and Igusa 1992)
                List<PointAbsorber> moved = new ArrayList<>();
                double first = a.get(0).frequency();
                double last = a.get(count - 1).frequency();
                double centre = (first + last) / 2 * (1 + 0.01 * (2 * random.nextDouble() - 1));
                double spread = (last - first) / ((first + last) / 2) * (1 + 0.02 * (2 * random.nextDouble() - 1));
                double common = 1 + 0.02 * (2 * random.nextDouble() - 1);
                for (int j = 0; j < count; j++) {
                    PointAbsorber x = a.get(j);
                    double zeta = x.damping() / (2 * x.mass() * x.frequency());
                    boolean own = tuning == AbsorberSetTuning.INDIVIDUAL;
                    double frequency = own ? x.frequency() * (1 + 0.01 * (2 * random.nextDouble() - 1))
                            : centre * (1 + spread * ((double) j / (count - 1) - 0.5));
                    moved.add(PointAbsorber.tuned(at, x.mass(), frequency,
                            zeta * (own ? 1 + 0.02 * (2 * random.nextDouble() - 1) : common)));
                }
                assertTrue(sweep(structure, moved, force, response, gl * wr, gh * wr) >= peak * (1 - 1e-6),
                        label + ": a random move lowers the peak");
            }

            // spillover limits at 80 % of what the unlimited set leaves near each other mode
            List<SpilloverLimitedOptimiser.Window> windows = new ArrayList<>();
            List<double[]> spans = new ArrayList<>();
            for (int r = 1; r < n; r++) {
                double low = Math.sqrt(structure.modes().get(r - 1).naturalFrequency()
                        * structure.modes().get(r).naturalFrequency());
                double high = r + 1 < n ? Math.sqrt(structure.modes().get(r).naturalFrequency()
                        * structure.modes().get(r + 1).naturalFrequency()) : 6 * structure.modes().get(r).naturalFrequency();
                double left = sweep(structure, a, force, response, low, high);
                spans.add(new double[] {low, high, 0.8 * left});
                windows.add(new SpilloverLimitedOptimiser.Window(low / wr, high / wr, 0.8 * left * stiffness));
            }
            SpilloverLimitedOptimiser.Result limited = SpilloverLimitedOptimiser.optimise(whole, windows);
            List<PointAbsorber> b = si(limited.design(), mass, wr, at);
            double limitedPeak = sweep(structure, b, force, response, gl * wr, gh * wr);
            assertEquals(limitedPeak, limited.peak() / stiffness, 1e-7 * limitedPeak, label + ": limited peak");
            assertTrue(limitedPeak >= peak * (1 - 1e-7), label + ": the limited set below the unlimited optimum");
            for (int k = 0; k < spans.size(); k++) {
                double[] span = spans.get(k);
                double kept = sweep(structure, b, force, response, span[0], span[1]);
                assertEquals(kept, limited.windowPeaks().get(k) / stiffness, 1e-6 * kept, label + ": window " + k);
                if (limited.met()) {
                    assertTrue(kept <= span[2] * (1 + 1e-6), label + ": window " + k + " " + kept + " above " + span[2]);
                }
            }
            System.out.printf("%s: peak %.6g (mode alone %.6g), limited %.6g met %s certified %s%n", label, peak,
                    modeAlone, limitedPeak, limited.met(), limited.certificate() == null ? "-"
                            : limited.certificate().certified());
        }
    }
}
