package org.counterpoise.core.realisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.counterpoise.core.design.AbsorberSizing;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.testing.DirectSolve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The predicted table against an independent direct complex solve of the two-mass equations of motion. */
class PredictedTableTest {

    static List<Path> presets() {
        return Presets.files();
    }

    @ParameterizedTest
    @MethodSource("presets")
    void rowsMatchADirectComplexSolve(Path preset) {
        DesignResult d = Presets.design(preset);
        List<PredictedPoint> rows = PredictedTable.of(d);
        assertTrue(rows.size() >= 12 && rows.size() <= 18, preset + ": " + rows.size() + " rows");
        for (int i = 1; i < rows.size(); i++) {
            assertTrue(rows.get(i).frequency() > rows.get(i - 1).frequency(), "ascending");
        }
        FrequencyBand band = d.study().excitation().band();
        double[] coupled = d.coupledNaturalFrequencies();
        for (double marked : new double[] {band.low(), band.high(), band.centre(), coupled[0], coupled[1]}) {
            assertTrue(rows.stream().anyMatch(r -> Math.abs(r.frequency() - marked) <= 1e-8 * marked),
                    preset + ": no row at " + marked);
        }
        double peak = d.responseAfter().frequency(); // the exact peak in band, where it is interior to the band
        if (peak > band.low() * (1 + 1e-9) && peak < band.high() * (1 - 1e-9)) {
            assertTrue(rows.stream().anyMatch(r -> Math.abs(r.frequency() - peak) <= 1e-6 * peak), preset + ": peak");
        }
        assertTrue(rows.get(0).frequency() < Math.min(band.low(), coupled[0]));
        assertTrue(rows.get(rows.size() - 1).frequency() > Math.max(band.high(), coupled[1]));
        for (PredictedPoint r : rows) {
            double w = r.frequency();
            Complex base = base(d, w);
            Complex[] with = solve(d, w, true);
            Complex[] without = solve(d, w, false);
            ResponseKind kind = d.study().response();
            assertEquals(motion(kind, without[0], base, w), r.before(), 1e-9 * r.before(), preset + " before");
            assertEquals(motion(kind, with[0], base, w), r.after(), 1e-9 * r.after(), preset + " after");
            assertEquals(with[1].subtract(with[0]).abs(), r.stroke(), 1e-9 * r.stroke(), preset + " stroke");
        }
    }

    /**
     * With no damping anywhere (an undamped structure and the undamped absorber for one speed) the
     * response with the absorber and its stroke are unbounded at the two coupled natural frequencies,
     * omega^2 / omega1^2 = 1 + mu/2 -/+ sqrt(mu + mu^2/4) for an absorber tuned to the structure (the
     * roots of the undamped pair's characteristic equation Omega^4 - (1 + (1+mu) f^2) Omega^2 + f^2 = 0
     * at f = 1, as in Den Hartog 1956, Mechanical Vibrations, 4th ed., ch. 3; section from memory): the
     * table says so instead of valuing them a part in 1e9 away
     * (212 500 mm and 300 500 mm in two rows at 17.89 Hz before 5 Dec 2026). The damper's run-up
     * stroke is unbounded too (it read as the in-band stroke).
     */
    @Test
    void anUndampedDesignIsUnboundedAtItsCoupledFrequenciesAndNowhereElse() {
        double w1 = 2 * Math.PI * 20;
        Structure s = Structure.of(400, 400 * w1 * w1, 0.0);
        Excitation e = new Excitation(ExcitationKind.FORCE, 100, new FrequencyBand(w1, w1));
        double mu = 0.05;
        DesignResult d = Designer.design(new DesignStudy("invented undamped", s, e, ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofMassRatio(mu), DesignMethod.UNDAMPED_SINGLE_SPEED, false, 1.5));
        double lower = w1 * Math.sqrt(1 + mu / 2 - Math.sqrt(mu + mu * mu / 4));
        double upper = w1 * Math.sqrt(1 + mu / 2 + Math.sqrt(mu + mu * mu / 4));
        List<PredictedPoint> rows = PredictedTable.of(d);
        int unbounded = 0;
        for (PredictedPoint r : rows) {
            boolean atCoupled = Math.abs(r.frequency() - lower) <= 1e-9 * lower
                    || Math.abs(r.frequency() - upper) <= 1e-9 * upper;
            if (atCoupled) {
                unbounded++;
                assertTrue(Double.isInfinite(r.after()) && Double.isInfinite(r.stroke()), "at " + r.frequency());
                assertTrue(Double.isFinite(r.before()), "the bare structure is finite there");
            } else {
                // everywhere else finite and, away from the structure's own resonance, below a metre
                assertTrue(Double.isFinite(r.after()) && r.after() < 1.0, r.frequency() + ": " + r.after());
                assertTrue(Double.isFinite(r.stroke()) && r.stroke() < 1.0, r.frequency() + ": " + r.stroke());
            }
        }
        assertEquals(2, unbounded, "one row at each coupled natural frequency");
        DamperDesign damper = DamperSizing.size(d, HardwareChoice.DEFAULT, new ArrayList<>());
        assertTrue(Double.isInfinite(damper.runUpStroke()), "run-up stroke " + damper.runUpStroke());
        assertEquals(d.strokeInBand().value(), damper.strokeAmplitude(), 1e-15);
    }

    private static double motion(ResponseKind kind, Complex x1, Complex base, double w) {
        return switch (kind) {
            case DISPLACEMENT -> x1.abs();
            case VELOCITY -> w * x1.abs();
            case ACCELERATION -> w * w * x1.abs();
            case RELATIVE_DISPLACEMENT -> x1.subtract(base).abs();
            default -> throw new IllegalStateException("no preset reduces " + kind);
        };
    }

    private static Complex force(DesignResult d, double w) {
        Excitation e = d.study().excitation();
        return switch (e.kind()) {
            case FORCE -> new Complex(e.amplitude());
            case UNBALANCE -> new Complex(e.amplitude() * w * w);
            default -> Complex.ZERO;
        };
    }

    private static Complex base(DesignResult d, double w) {
        Excitation e = d.study().excitation();
        return switch (e.kind()) {
            case BASE_DISPLACEMENT -> new Complex(e.amplitude());
            case BASE_ACCELERATION -> new Complex(-e.amplitude() / (w * w));
            default -> Complex.ZERO;
        };
    }

    /** The physical equations with the SI masses, springs and dashpots (the bare structure solved on its own). */
    private static Complex[] solve(DesignResult d, double w, boolean withAbsorber) {
        Structure s = d.study().structure();
        Absorber a = d.absorber();
        double m1 = s.effectiveMass();
        double k1 = s.effectiveStiffness();
        double c1 = s.effectiveDampingCoefficient();
        if (!withAbsorber) {
            Complex rhs = force(d, w).add(base(d, w).multiply(new Complex(k1, c1 * w)));
            return new Complex[] {rhs.divide(new Complex(k1 - m1 * w * w, c1 * w)), Complex.ZERO};
        }
        return DirectSolve.solve(m1, k1, c1, a.mass(), a.stiffness(), a.damping(), w, force(d, w), base(d, w));
    }
}
