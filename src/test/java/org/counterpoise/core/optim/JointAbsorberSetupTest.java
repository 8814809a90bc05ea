package org.counterpoise.core.optim;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.testing.DenseSweep;
import org.counterpoise.testing.ModalDirectSolve;
import org.junit.jupiter.api.Test;

/**
 * The general form of one absorber per mode designed jointly: three modes of different damping
 * ratios, the force at one point, the displacement at another, each absorber at its own point, SI
 * units (an invented frame). Checked against the dense complex LU solve of the equations of motion
 * (Commons Math; {@link ModalDirectSolve}, which shares nothing with the polynomial route), swept
 * densely over the band with every sampled maximum refined; and the scale invariance of the units
 * (the same structure in SI and scaled to its lowest mode designs the same absorbers).
 */
class JointAbsorberSetupTest {
    private static final double HZ = 2 * Math.PI;

    /** Bending 9 Hz, twisting 21 Hz, sway 40 Hz; damping ratios 2 %, 1 %, 2 %. */
    static ModalStructure frame(double frequencyScale, double massScale) {
        return new ModalStructure(List.of(
                new Mode(9 * HZ / frequencyScale, 0.02, 1500 / massScale, Map.of("mid", 1.0, "edge", 0.6, "foot", 0.1)),
                new Mode(21 * HZ / frequencyScale, 0.01, 800 / massScale, Map.of("mid", 0.2, "edge", 1.0, "foot", 0.1)),
                new Mode(40 * HZ / frequencyScale, 0.02, 900 / massScale, Map.of("mid", 0.3, "edge", -0.2, "foot", 0.0))));
    }

    private static JointAbsorberSetup setup(double frequencyScale, double massScale) {
        return new JointAbsorberSetup(frame(frequencyScale, massScale), List.of(0, 1), List.of("mid", "edge"), "edge",
                "mid", 60 / massScale, 6 * HZ / frequencyScale, 25 * HZ / frequencyScale);
    }

    @Test
    void jointAndSequentialPeaksEqualADenseSweepOfTheDenseSolve() {
        JointAbsorberSetup s = setup(1, 1);
        JointAbsorberResult r = JointAbsorberOptimiser.optimise(s);
        assertTrue(r.certificate().certified(), r.certificate().toString());
        assertTrue(r.peak() <= r.sequentialPeak() * (1 + 1e-12), r.peak() + " > " + r.sequentialPeak());
        assertEquals(r.peak(), denseSweepPeak(s, r.design(), 40_000), 1e-9 * r.peak(), "joint peak");
        assertEquals(r.sequentialPeak(), denseSweepPeak(s, r.sequentialDesign(), 40_000), 1e-9 * r.sequentialPeak(),
                "sequential peak");
        assertEquals(r.peak(), s.peak(r.design()), 1e-9 * r.peak(), "the search's peak is the setup's exact peak");
        // the mass split: equal mass ratios on each mode as seen at its absorber's point (1500 / 1^2, 800 / 1^2)
        assertEquals(60 * 1500 / 2300.0, r.design().massRatios().get(0), 1e-12);
        assertEquals(60 * 800 / 2300.0, r.design().massRatios().get(1), 1e-12);
    }

    /** The same structure in SI and on the scales of its lowest mode: the same design, peaks by k_ref. */
    @Test
    void theUnitsDoNotMatter() {
        double w1 = 9 * HZ;
        double m1 = 1500;
        JointAbsorberResult si = JointAbsorberOptimiser.optimise(setup(1, 1));
        JointAbsorberResult scaled = JointAbsorberOptimiser.optimise(setup(w1, m1));
        double k1 = m1 * w1 * w1;
        assertEquals(si.peak() * k1, scaled.peak(), 1e-7 * scaled.peak());
        assertEquals(si.sequentialPeak() * k1, scaled.sequentialPeak(), 1e-9 * scaled.sequentialPeak());
        for (int j = 0; j < 2; j++) {
            assertEquals(si.sequentialDesign().tuningRatios().get(j) / w1, scaled.sequentialDesign().tuningRatios().get(j),
                    1e-9 * scaled.sequentialDesign().tuningRatios().get(j));
            assertEquals(si.design().tuningRatios().get(j) / w1, scaled.design().tuningRatios().get(j),
                    1e-4 * scaled.design().tuningRatios().get(j));
        }
    }

    @Test
    void badSetupsAreRefusedInPlainWords() {
        ModalStructure frame = frame(1, 1);
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> new JointAbsorberSetup(frame,
                List.of(1, 0), List.of("mid", "edge"), "edge", "mid", 60, 0, 100));
        assertEquals("modes", e.field());
        e = assertThrows(InvalidInputException.class, () -> new JointAbsorberSetup(frame, List.of(0, 2),
                List.of("mid", "foot"), "edge", "mid", 60, 0, 100));
        assertEquals("absorber point", e.field());
        e = assertThrows(InvalidInputException.class, () -> new JointAbsorberSetup(frame, List.of(0, 1),
                List.of("mid", "edge"), "edge", "mid", 0, 0, 100));
        assertEquals("absorber mass", e.field());
    }

    /** Peak over the band by the dense solve: a sweep, every sampled local maximum refined by golden section. */
    static double denseSweepPeak(JointAbsorberSetup s, AbsorberSetDesign d, int samples) {
        List<PointAbsorber> absorbers = new ArrayList<>();
        for (int j = 0; j < d.count(); j++) {
            absorbers.add(PointAbsorber.tuned(s.absorberPoints().get(j), d.massRatios().get(j), d.tuningRatios().get(j),
                    d.dampingRatios().get(j)));
        }
        DoubleUnaryOperator magnitude = w -> ModalDirectSolve.solve(s.structure().modes(), absorbers,
                s.excitationPoint(), s.responsePoint(), w)[0].abs();
        double low = s.bandLow();
        double high = s.bandHigh();
        return DenseSweep.everyMaximum(magnitude, low, high, samples);
    }
}
