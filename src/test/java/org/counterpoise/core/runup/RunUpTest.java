package org.counterpoise.core.runup;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.atomic.AtomicReference;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.Messages;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.response.SystemResponse;
import org.counterpoise.core.tuning.DenHartogEqualPeak;
import org.counterpoise.testing.DirectSolve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Checks of the time-domain run-up against routes outside it: the frequency response (exact
 * peaks and a direct complex solve), energy conservation, the stationary-phase asymptotics of an
 * undamped passage, and the published passage-through-resonance approximation.
 */
class RunUpTest {
    /** An invented structure: 1000 kg at 10 Hz, 2 % damping, absorber at the antinode. */
    private static final Structure STRUCTURE = Structure.of(1000.0, 1000.0 * Math.pow(2 * Math.PI * 10, 2), 0.02);
    /** Den Hartog's equal-peak absorber for mu = 0.05 (core.tuning, itself checked against the book). */
    private static final Tuning TUNING = DenHartogEqualPeak.tuning(0.05);
    private static final double OMEGA1 = STRUCTURE.naturalFrequency();

    @ParameterizedTest
    @EnumSource(value = ExcitationKind.class, names = {"FORCE", "UNBALANCE", "BASE_DISPLACEMENT"})
    void constantSpeedSettlesOnTheFrequencyResponse(ExcitationKind kind) {
        // Check (4): the right-hand side against the frequency domain. At a constant speed the
        // transient decays (as e^(-zeta omega t); after 12 s below 1e-10 for the slowest mode
        // here) and what remains must be the steady state of the SAME model, computed two ways:
        // SystemResponse (production algebra) and DirectSolve (complex 2x2 solve in the test).
        double omega = 0.93 * OMEGA1;
        double amplitude = switch (kind) {
            case FORCE -> 1000.0;
            case UNBALANCE -> 0.05;
            default -> 1e-4;
        };
        RunUpResult r = RunUp.simulate(STRUCTURE, TUNING, kind, amplitude, SpeedRamp.constant(omega, 12.0),
                RunUp.Start.REST, ProgressListener.NONE);
        SystemResponse response = new SystemResponse(STRUCTURE, TUNING, kind, amplitude);
        Absorber a = Absorber.of(STRUCTURE, TUNING);
        Complex force = new Complex(kind == ExcitationKind.FORCE ? amplitude
                : kind == ExcitationKind.UNBALANCE ? amplitude * omega * omega : 0.0);
        Complex base = new Complex(kind == ExcitationKind.BASE_DISPLACEMENT ? amplitude : 0.0);
        Complex[] x = DirectSolve.solve(STRUCTURE.effectiveMass(), STRUCTURE.effectiveStiffness(),
                STRUCTURE.effectiveDampingCoefficient(), a.mass(), a.stiffness(), a.damping(), omega, force, base);
        double[] direct = {x[0].abs(), omega * x[0].abs(), omega * omega * x[0].abs(), x[1].subtract(x[0]).abs(),
            a.stiffness() * x[1].subtract(x[0]).abs()};
        ResponseKind[] kinds = {ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY, ResponseKind.ACCELERATION,
            ResponseKind.STROKE, ResponseKind.SPRING_FORCE};
        for (int i = 0; i < kinds.length; i++) {
            double[] envelope = r.envelope().of(kinds[i]);
            double settled = envelope[envelope.length - 2];
            assertEquals(direct[i], response.amplitudeAt(kinds[i], omega), 1e-9 * direct[i], kinds[i] + " routes");
            // Measured 1.1e-8 (the integrator's tolerance; the sinusoid through the top three
            // samples is exact for a steady response).
            assertEquals(direct[i], settled, 5e-8 * direct[i], kinds[i] + " time domain vs direct solve");
        }
    }

    @ParameterizedTest
    @EnumSource(value = ExcitationKind.class, names = {"FORCE", "UNBALANCE", "BASE_DISPLACEMENT"})
    void startingInTheSteadyStateAtConstantSpeedStaysThere(ExcitationKind kind) {
        // The run-down's initial state (frequency response turned to the time-domain phase) must
        // be the periodic solution itself: at constant speed no transient appears, so every
        // window of the envelope equals the steady amplitude (DirectSolve is the reference).
        double omega = 1.07 * OMEGA1;
        RunUpResult r = RunUp.simulate(STRUCTURE, TUNING, kind, 1.0, SpeedRamp.constant(omega, 2.0),
                RunUp.Start.STEADY_STATE, ProgressListener.NONE);
        Absorber a = Absorber.of(STRUCTURE, TUNING);
        Complex force = new Complex(kind == ExcitationKind.FORCE ? 1.0 : kind == ExcitationKind.UNBALANCE ? omega * omega : 0.0);
        Complex base = new Complex(kind == ExcitationKind.BASE_DISPLACEMENT ? 1.0 : 0.0);
        Complex[] x = DirectSolve.solve(STRUCTURE.effectiveMass(), STRUCTURE.effectiveStiffness(),
                STRUCTURE.effectiveDampingCoefficient(), a.mass(), a.stiffness(), a.damping(), omega, force, base);
        double displacement = x[0].abs();
        double stroke = x[1].subtract(x[0]).abs();
        double[] d = r.envelope().of(ResponseKind.DISPLACEMENT);
        double[] s = r.envelope().of(ResponseKind.STROKE);
        for (int i = 0; i < d.length - 1; i++) {
            assertEquals(displacement, d[i], 5e-8 * displacement, "displacement, window " + i);
            assertEquals(stroke, s[i], 5e-8 * stroke, "stroke, window " + i);
        }
    }

    @Test
    void aVerySlowRunUpReproducesTheSteadyStatePeak() {
        // Check (1): sweep rate eta = alpha/omega1^2 = 1e-5 (about 12 000 forcing cycles up to
        // 1.25 omega1); the steady-state peaks are SystemResponse's exact peaks over the same speeds.
        SpeedRamp ramp = SpeedRamp.runUp(1.25 * OMEGA1, 1e-5 * OMEGA1 * OMEGA1);
        RunUpComparison c = RunUpComparison.of(STRUCTURE, TUNING, ExcitationKind.UNBALANCE, 0.05, ramp,
                RunUp.Start.REST, ProgressListener.NONE);
        for (ResponseKind k : RunUp.quantities(true)) {
            ResponsePeak steady = c.steadyWithAbsorber().get(k);
            TransientPeak peak = c.withAbsorber().peak(k).orElseThrow();
            assertEquals(steady.value(), peak.value(), 0.01 * steady.value(), "with absorber " + k);
            assertTrue(peak.value() <= steady.value() * 1.001, k + " a slow transit does not exceed the steady state");
        }
        for (ResponseKind k : RunUp.quantities(false)) {
            ResponsePeak steady = c.steadyWithoutAbsorber().get(k);
            TransientPeak peak = c.withoutAbsorber().peak(k).orElseThrow();
            assertEquals(steady.value(), peak.value(), 0.01 * steady.value(), "without absorber " + k);
            assertEquals(steady.frequency(), peak.speed(), 0.01 * steady.frequency(), "speed at the peak " + k);
        }
    }

    @Test
    void aVerySlowRunDownReproducesTheSteadyStatePeakAndStartsInTheSteadyState() {
        SpeedRamp ramp = SpeedRamp.runDown(1.25 * OMEGA1, 1e-5 * OMEGA1 * OMEGA1);
        RunUpResult r = RunUp.simulate(STRUCTURE, null, ExcitationKind.FORCE, 1000.0, ramp,
                RunUp.Start.STEADY_STATE, ProgressListener.NONE);
        SystemResponse response = new SystemResponse(STRUCTURE, null, ExcitationKind.FORCE, 1000.0);
        double first = r.envelope().of(ResponseKind.DISPLACEMENT)[0];
        double atTop = response.amplitudeAt(ResponseKind.DISPLACEMENT, 1.25 * OMEGA1);
        assertEquals(atTop, first, 1e-3 * atTop, "the run-down starts in the steady state at the top speed");
        ResponsePeak steady = response.peakBetween(ResponseKind.DISPLACEMENT, 0.0, 1.25 * OMEGA1);
        TransientPeak peak = r.peak(ResponseKind.DISPLACEMENT).orElseThrow();
        assertEquals(steady.value(), peak.value(), 0.01 * steady.value());
        assertEquals(steady.frequency(), peak.speed(), 0.01 * steady.frequency());
    }

    @Test
    void undampedRunUpConservesEnergy() {
        // Check (3): with no damping anywhere, the work done by the unbalance force (centrifugal
        // and tangential terms) on the structure equals the kinetic plus potential energy at the
        // end: W = 1/2 m1 v1^2 + 1/2 m2 v2^2 + 1/2 k1 x1^2 + 1/2 k2 (x2 - x1)^2. W is integrated
        // along the solution as a fifth state, at a tolerance far below the production one.
        Structure s = Structure.of(1000.0, STRUCTURE.modalStiffness(), 0.0);
        Tuning t = new Tuning(0.05, 0.95, 0.0);
        SpeedRamp ramp = SpeedRamp.runUp(1.25 * OMEGA1, 1e-3 * OMEGA1 * OMEGA1);
        RunUpEquations eq = new RunUpEquations(s, t, ExcitationKind.UNBALANCE, 0.05, ramp);
        FirstOrderDifferentialEquations withWork = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 5;
            }

            @Override
            public void computeDerivatives(double time, double[] y, double[] yDot) {
                eq.computeDerivatives(time, y, yDot);
                yDot[4] = eq.force(time) * y[1];
            }
        };
        double[] y = new double[5];
        new DormandPrince853Integrator(1e-9, 1e-3, 1e-14, 1e-12).integrate(withWork, 0.0, y, ramp.duration(), y);
        Absorber a = Absorber.of(s, t);
        double energy = 0.5 * s.effectiveMass() * y[1] * y[1] + 0.5 * a.mass() * y[3] * y[3]
                + 0.5 * s.effectiveStiffness() * y[0] * y[0] + 0.5 * a.stiffness() * (y[2] - y[0]) * (y[2] - y[0]);
        assertTrue(energy > 0.0);
        assertEquals(y[4], energy, 1e-7 * energy, "work done = energy stored");
    }

    @Test
    void unbalanceForceIsMinusMassTimesTheAccelerationOfTheUnbalance() {
        // The tangential term and its sign: the unbalance at e (cos phi, sin phi) pushes the
        // structure with -m_u d^2/dt^2 (e cos phi(t)); the derivative is taken here by central
        // differences, independently of the formula in RunUpEquations.
        double unbalance = 0.05;
        SpeedRamp ramp = SpeedRamp.runUp(100.0, 40.0);
        RunUpEquations eq = new RunUpEquations(STRUCTURE, null, ExcitationKind.UNBALANCE, unbalance, ramp);
        double h = 1e-4;
        for (double t : new double[] {0.1, 0.77, 1.3, 2.01}) {
            double second = (Math.cos(ramp.phaseAt(t + h)) - 2 * Math.cos(ramp.phaseAt(t)) + Math.cos(ramp.phaseAt(t - h)))
                    / (h * h);
            double expected = -unbalance * second;
            assertEquals(expected, eq.force(t), 1e-5 * unbalance * ramp.speedAt(t) * ramp.speedAt(t), "t = " + t);
        }
        assertEquals(0.0, eq.force(0.0), 0.0, "no force at rest");
    }

    @Test
    void undampedPassageMatchesTheStationaryPhaseAsymptotics() {
        // Check (2a): x'' + x = cos(phi), phi = eta tau^2 / 2 (omega1 = 1, static deflection 1).
        // With x = Re(A e^{i tau}) and a slowly varying A (averaging), 2 i A' = e^{i(phi - tau)},
        // so A is a Fresnel integral around tau0 = 1/eta: far past resonance |A| -> sqrt(pi/(2 eta))
        // and, on the way, |A| reaches 1.1706 times that (the first maximum of the Cornu spiral,
        // intensity 1.3704, at u = 1.2172), at the speed 1 + 1.2172 sqrt(pi eta). Derived here
        // (stationary phase; Fresnel integral values from tables, common practice); the error of
        // the averaging is of order sqrt(eta), and for the peak it was measured below 1 %.
        Structure s = Structure.of(1.0, 1.0, 0.0);
        double eta = 1e-4;
        RunUpResult r = RunUp.simulate(s, null, ExcitationKind.FORCE, 1.0, SpeedRamp.runUp(1.2, eta),
                RunUp.Start.REST, ProgressListener.NONE);
        TransientPeak p = r.peak(ResponseKind.DISPLACEMENT).orElseThrow();
        double expectedPeak = 1.1706 * Math.sqrt(Math.PI / (2 * eta));
        assertEquals(expectedPeak, p.value(), 0.01 * expectedPeak, "undamped peak");
        double expectedSpeed = 1.0 + 1.2172 * Math.sqrt(Math.PI * eta);
        assertEquals(expectedSpeed - 1.0, p.speed() - 1.0, 0.1 * (expectedSpeed - 1.0), "speed of the peak");
        double[] envelope = r.envelope().of(ResponseKind.DISPLACEMENT);
        double after = envelope[envelope.length - 1];
        // Past resonance the free vibration sqrt(pi/(2 eta)) adds to the forced 1/(Omega^2 - 1) (at most 2.3 at 1.2).
        assertEquals(Math.sqrt(Math.PI / (2 * eta)), after, 0.03 * Math.sqrt(Math.PI / (2 * eta)), "after the passage");
    }

    @Test
    void dampedPassageFollowsThePublishedApproximation() {
        // Check (2b): peak amplification of a damped single-degree-of-freedom oscillator swept
        // through resonance at eta = alpha/omega_n^2, relative to the steady peak 1/(2 zeta):
        //   A_max / A_stat ~ 1 - exp(-2.5 zeta / sqrt(eta))
        // FROM MEMORY, in the form attributed to Lewis (1932), Trans. ASME 54, and used by Markert
        // and Seidler (2001), Int. J. Solids Struct. 38; the coefficient and the accuracy the
        // authors claim were not verified against the originals (searched on 3 Dec 2026 in the
        // stored public reference text for both papers by title, authors and formula, and for ISO 7626
        // on sweep rates: only the titles were found; docs/runup.md lists the queries). Measured disagreement with this
        // integration over zeta 0.005 to 0.05 and eta 1e-4 to 1e-2: at most 11 % of the ratio;
        // the assertion allows 13 %. The fast-sweep frequency shift tends to 1.2172 sqrt(pi eta)
        // = 2.16 sqrt(eta) (derived above), which the peak speed must approach from below.
        double[][] cases = {{0.005, 1e-3}, {0.01, 1e-3}, {0.02, 1e-4}, {0.02, 1e-3}, {0.05, 1e-3}, {0.005, 1e-2},
            {0.02, 1e-2}, {0.05, 1e-2}};
        for (double[] c : cases) {
            double zeta = c[0];
            double eta = c[1];
            RunUpResult r = RunUp.simulate(Structure.of(1.0, 1.0, zeta), null, ExcitationKind.FORCE, 1.0,
                    SpeedRamp.runUp(1.6, eta), RunUp.Start.REST, ProgressListener.NONE);
            TransientPeak p = r.peak(ResponseKind.DISPLACEMENT).orElseThrow();
            double ratio = p.value() * 2 * zeta * Math.sqrt(1 - zeta * zeta);
            double formula = 1 - Math.exp(-2.5 * zeta / Math.sqrt(eta));
            assertEquals(formula, ratio, 0.13 * formula, "zeta " + zeta + " eta " + eta);
            double shift = p.speed() - 1.0;
            assertTrue(shift > 0 && shift < 2.2 * Math.sqrt(eta), "shift " + shift + " at eta " + eta);
        }
    }

    @Test
    void defaultToleranceAgreesWithATightRun() {
        SpeedRamp ramp = SpeedRamp.runUp(1.25 * OMEGA1, 1e-3 * OMEGA1 * OMEGA1);
        RunUpResult normal = RunUp.simulate(STRUCTURE, TUNING, ExcitationKind.UNBALANCE, 0.05, ramp,
                RunUp.Start.REST, ProgressListener.NONE);
        RunUpResult tight = RunUp.simulate(STRUCTURE, TUNING, ExcitationKind.UNBALANCE, 0.05, ramp,
                RunUp.Start.REST, ProgressListener.NONE, 1e-11);
        for (ResponseKind k : RunUp.quantities(true)) {
            double a = normal.peak(k).orElseThrow().value();
            double b = tight.peak(k).orElseThrow().value();
            // Measured 8e-9 at the time of writing.
            assertEquals(b, a, 1e-7 * b, k.toString());
        }
    }

    @Test
    void progressReachesTheEndAndCancellingStops() {
        SpeedRamp ramp = SpeedRamp.runUp(1.25 * OMEGA1, 1e-2 * OMEGA1 * OMEGA1);
        AtomicReference<Double> last = new AtomicReference<>(0.0);
        RunUp.simulate(STRUCTURE, TUNING, ExcitationKind.FORCE, 1.0, ramp, RunUp.Start.REST, new ProgressListener() {
            @Override
            public void progress(double fraction) {
                assertTrue(fraction >= last.get());
                last.set(fraction);
            }
        });
        assertEquals(1.0, last.get(), 0.0);
        CoreException e = assertThrows(CoreException.class, () -> RunUp.simulate(STRUCTURE, TUNING,
                ExcitationKind.FORCE, 1.0, ramp, RunUp.Start.REST, new ProgressListener() {
                    @Override
                    public boolean cancelled() {
                        return true;
                    }
                }));
        assertEquals(Messages.CANCELLED, e.key());
    }

    @Test
    void baseAccelerationAndEndlessRampsAreRefusedWithTheField() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> RunUp.simulate(STRUCTURE, TUNING,
                ExcitationKind.BASE_ACCELERATION, 1.0, SpeedRamp.runUp(OMEGA1, 10.0), RunUp.Start.REST,
                ProgressListener.NONE));
        assertEquals("disturbance.kind", e.field());
        InvalidInputException slow = assertThrows(InvalidInputException.class, () -> RunUp.simulate(STRUCTURE, TUNING,
                ExcitationKind.FORCE, 1.0, SpeedRamp.runUp(OMEGA1, 1e-6), RunUp.Start.REST, ProgressListener.NONE));
        assertEquals("run_up.rate", slow.field());
    }
}
