package org.counterpoise.core.runup;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.NotFoundException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.error.Messages;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponseScale;
import org.counterpoise.core.response.SystemResponse;

/**
 * Integrates {@link RunUpEquations} through a {@link SpeedRamp} and extracts the response
 * envelope and the peak of each quantity.
 *
 * <p><b>Integrator.</b> Commons Math's adaptive Dormand-Prince 8(5,3) ({@link
 * DormandPrince853Integrator}) with its dense output. The relative tolerance is
 * {@link #DEFAULT_TOLERANCE}; the absolute tolerance is the same fraction of the response's
 * reference scale ({@link ResponseScale}: F/k1, m_u e/m1 or U for displacements, times the
 * fastest frequency for velocities), so that the tiny motions near rest do not force tiny steps.
 * The step never exceeds a quarter of the shortest period in the problem, 2 pi / max(top forcing
 * frequency, bound of the natural frequencies), so that no forcing cycle is stepped over.
 *
 * <p><b>Envelope and peaks.</b> The dense output is sampled {@link #SAMPLES_PER_PERIOD} times per
 * shortest period. Each local maximum of |q| among the samples is refined from the three samples
 * around it by the sinusoid through them (exact for a pure sinusoid of any frequency; the parabola
 * through them where no sinusoid fits), and the largest value is the peak. The envelope is the
 * largest magnitude in each forcing cycle ({@link Envelope}). Quantities: structure
 * displacement, velocity and acceleration (absolute, at the absorber point) and, with the
 * absorber, stroke x2 - x1 and spring force k2 (x2 - x1).
 *
 * <p><b>Accuracy reached</b> (measured in RunUpTest, see docs/runup.md): the peaks of a run at the
 * default tolerance agree with a run at 1e-11 to 8e-9 relative; a constant-speed run settles on
 * the frequency response to 1.2e-8; a very slow ramp reproduces the steady-state peaks to 0.15 %.
 *
 * <p><b>Progress and cancellation.</b> Once per accepted step the listener gets the share of the
 * ramp done and is asked whether to stop; the thread's interrupt flag is honoured too. A stop
 * ends the run with a {@link CoreException} of key {@link Messages#CANCELLED}.
 */
public final class RunUp {
    /** Relative tolerance of the integrator (and absolute, relative to the response scale). */
    public static final double DEFAULT_TOLERANCE = 1e-8;

    /** Samples of the dense output per shortest period. */
    public static final int SAMPLES_PER_PERIOD = 32;

    /** The largest ramp integrated, in forcing cycles (about a minute of computing). */
    public static final double MAX_CYCLES = 1e6;

    /** How the structure is moving when the ramp starts. */
    public enum Start {
        /** At rest: zero displacements and velocities (a run-up from standstill). */
        REST,
        /** In the steady state at the ramp's start speed (a run-down from running speed). */
        STEADY_STATE
    }

    private RunUp() {
    }

    /**
     * @param withAbsorber true when the absorber is fitted
     * @return the quantities tracked: displacement, velocity, acceleration, and with the absorber
     *     stroke and spring force
     */
    public static List<ResponseKind> quantities(boolean withAbsorber) {
        return withAbsorber
                ? List.of(ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY, ResponseKind.ACCELERATION,
                        ResponseKind.STROKE, ResponseKind.SPRING_FORCE)
                : List.of(ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY, ResponseKind.ACCELERATION);
    }

    /**
     * Integrates with the default tolerance.
     * @param structure the structure
     * @param tuning the absorber, or null for the bare structure
     * @param kind force, unbalance or base displacement
     * @param amplitude SI drive amplitude
     * @param ramp the speed ramp
     * @param start the state at t = 0
     * @param listener progress and cancellation
     * @return peaks and envelope
     */
    public static RunUpResult simulate(Structure structure, Tuning tuning, ExcitationKind kind, double amplitude,
            SpeedRamp ramp, Start start, ProgressListener listener) {
        return simulate(structure, tuning, kind, amplitude, ramp, start, listener, DEFAULT_TOLERANCE);
    }

    /**
     * @param structure the structure
     * @param tuning the absorber, or null for the bare structure
     * @param kind force, unbalance or base displacement
     * @param amplitude SI drive amplitude
     * @param ramp the speed ramp
     * @param start the state at t = 0
     * @param listener progress and cancellation
     * @param tolerance relative tolerance of the integrator
     * @return peaks and envelope
     */
    public static RunUpResult simulate(Structure structure, Tuning tuning, ExcitationKind kind, double amplitude,
            SpeedRamp ramp, Start start, ProgressListener listener, double tolerance) {
        if (ramp.forcingCycles() > MAX_CYCLES) {
            refuseLong(ramp);
        }
        RunUpEquations equations = new RunUpEquations(structure, tuning, kind, amplitude, ramp);
        double fastest = Math.max(ramp.topSpeed(), equations.naturalFrequencyBound());
        double shortestPeriod = 2.0 * Math.PI / fastest;
        double length = ResponseScale.referenceLength(structure, kind, amplitude);
        int n = equations.getDimension();
        double[] absTol = new double[n];
        double[] relTol = new double[n];
        for (int i = 0; i < n; i++) {
            absTol[i] = tolerance * length * (i % 2 == 0 ? 1.0 : fastest);
            relTol[i] = tolerance;
        }
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(
                1e-12 * shortestPeriod, 0.25 * shortestPeriod, absTol, relTol);
        Sampler sampler = new Sampler(equations, shortestPeriod / SAMPLES_PER_PERIOD,
                2.0 * 2.0 * Math.PI / structure.naturalFrequency(), quantities(tuning != null), listener);
        integrator.addStepHandler(sampler);
        double[] y = initialState(structure, tuning, kind, amplitude, ramp, start, n);
        try {
            integrator.integrate(equations, 0.0, y, ramp.duration(), y);
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            // Commons Math signals an exhausted evaluation count (state) or a step below its minimum
            // (argument): on a linear model both mean the requested accuracy could not be held.
            throw new NotFoundException("run-up history", "the integration could not hold its accuracy over this ramp",
                    "try a slower or faster rate, or a lower final speed");
        }
        return sampler.result(ramp, tuning != null, integrator.getEvaluations());
    }

    /**
     * @param ramp a ramp of more than {@link #MAX_CYCLES} forcing cycles
     * @throws InvalidInputException always, on field run_up.rate, saying what is allowed
     */
    public static void refuseLong(SpeedRamp ramp) {
        throw new InvalidInputException("run_up.rate", String.format(Locale.ROOT,
                "a ramp of %.3g forcing cycles", ramp.forcingCycles()),
                "at most " + (long) MAX_CYCLES + " forcing cycles; choose a faster rate or a lower final speed");
    }

    private static double[] initialState(Structure structure, Tuning tuning, ExcitationKind kind, double amplitude,
            SpeedRamp ramp, Start start, int n) {
        double[] y = new double[n];
        if (start == Start.REST) {
            return y;
        }
        double omega = ramp.startSpeed();
        if (omega <= 0.0) {
            return y;
        }
        // The steady state is the frequency response (the one route, SystemResponse), turned to
        // the time-domain drive's phase: x(t) = |X| cos(phi + theta + drivePhase).
        SystemResponse response = new SystemResponse(structure, tuning, kind, amplitude);
        double shift = RunUpEquations.drivePhase(kind);
        double x1 = response.amplitudeAt(ResponseKind.DISPLACEMENT, omega);
        if (!Double.isFinite(x1)) {
            throw new InvalidInputException("run_up.final_speed", hz(omega),
                    "a speed whose steady state is bounded (this one is an undamped resonance)");
        }
        double p1 = response.phaseAt(ResponseKind.DISPLACEMENT, omega) + shift;
        y[0] = x1 * Math.cos(p1);
        y[1] = -omega * x1 * Math.sin(p1);
        if (tuning != null) {
            double s = response.amplitudeAt(ResponseKind.STROKE, omega);
            double ps = response.phaseAt(ResponseKind.STROKE, omega) + shift;
            y[2] = y[0] + s * Math.cos(ps);
            y[3] = y[1] - omega * s * Math.sin(ps);
        }
        return y;
    }

    private static String hz(double omega) {
        return String.format(Locale.ROOT, "%.4g Hz", omega / (2.0 * Math.PI));
    }

    /** Samples the dense output, tracks peaks and the per-cycle envelope, polls the listener. */
    private static final class Sampler implements StepHandler {
        private final RunUpEquations equations;
        private final double dt;
        private final double longestWindow;
        private final List<ResponseKind> kinds;
        private final ProgressListener listener;
        private final int q;
        private final double[] previous2;
        private final double[] previous1;
        private final double[] peakValue;
        private final double[] peakTime;
        private final double[] windowMax;
        private final double[] current;
        private final List<double[]> windows = new ArrayList<>();
        private final List<Double> windowTimes = new ArrayList<>();
        private final List<Double> windowSpeeds = new ArrayList<>();
        private double nextSample;
        private long samples;
        private double windowStart;
        private double windowStartPhase;
        private int steps;

        Sampler(RunUpEquations equations, double dt, double longestWindow, List<ResponseKind> kinds,
                ProgressListener listener) {
            this.equations = equations;
            this.dt = dt;
            this.longestWindow = longestWindow;
            this.kinds = kinds;
            this.listener = listener;
            this.q = kinds.size();
            this.previous2 = new double[q];
            this.previous1 = new double[q];
            this.peakValue = new double[q];
            this.peakTime = new double[q];
            this.windowMax = new double[q];
            this.current = new double[q];
        }

        @Override
        public void init(double t0, double[] y0, double t) {
            nextSample = t0;
            windowStart = t0;
        }

        @Override
        public void handleStep(StepInterpolator interpolator, boolean isLast) {
            steps++;
            double end = interpolator.getCurrentTime();
            while (nextSample <= end) {
                interpolator.setInterpolatedTime(nextSample);
                sample(nextSample, interpolator.getInterpolatedState(), true);
                samples++;
                nextSample = samples * dt;
            }
            if (isLast) {
                interpolator.setInterpolatedTime(end);
                sample(end, interpolator.getInterpolatedState(), false);
                closeWindow(end);
            }
            listener.progress(Math.min(1.0, end / equations.ramp().duration()));
            listener.checkCancelled("the run-up");
        }

        /** @param regular true on the uniform grid (where the parabola refinement holds) */
        private void sample(double t, double[] y, boolean regular) {
            double stroke = equations.withAbsorber() ? y[2] - y[0] : 0.0;
            for (int i = 0; i < q; i++) {
                current[i] = switch (kinds.get(i)) {
                    case DISPLACEMENT -> y[0];
                    case VELOCITY -> y[1];
                    case ACCELERATION -> equations.structureAcceleration(t, y);
                    case STROKE -> stroke;
                    case SPRING_FORCE -> equations.absorberStiffness() * stroke;
                    default -> throw new IllegalStateException("not tracked: " + kinds.get(i));
                };
            }
            for (int i = 0; i < q; i++) {
                double c = Math.abs(current[i]);
                offer(i, c, t);
                if (!regular) {
                    continue;
                }
                if (samples >= 2) {
                    double a = previous2[i];
                    double b = previous1[i];
                    if (Math.abs(b) >= Math.abs(a) && Math.abs(b) >= c) {
                        refine(i, a, b, current[i], t - dt);
                    }
                }
                previous2[i] = previous1[i];
                previous1[i] = current[i];
            }
            SpeedRamp ramp = equations.ramp();
            if (ramp.phaseAt(t) - windowStartPhase >= 2.0 * Math.PI
                    || t - windowStart >= longestWindow) {
                closeWindow(t);
            }
        }

        /**
         * Refines a local maximum of |q| from three samples a, b, c at t - dt, t, t + dt (|b| the
         * largest). For a sinusoid q = A cos(w s + p) the samples satisfy a + c = 2 b cos(theta)
         * with theta = w dt, and A^2 = b^2 + ((a - c) / (2 sin theta))^2 exactly, whatever w; this
         * local sinusoid is used when (a + c) / (2 b) lies in (0, 1), otherwise the vertex of the
         * parabola through the three samples.
         */
        private void refine(int i, double a, double b, double c, double t) {
            double sign = b < 0.0 ? -1.0 : 1.0;
            double pa = sign * a;
            double pb = sign * b;
            double pc = sign * c;
            double ratio = pb > 0.0 ? (pa + pc) / (2.0 * pb) : Double.NaN;
            double value;
            double offset;
            if (ratio > 0.0 && ratio < 1.0) {
                double theta = Math.acos(ratio);
                double quadrature = (pa - pc) / (2.0 * Math.sin(theta));
                value = Math.hypot(pb, quadrature);
                offset = -Math.atan2(quadrature, pb) / theta;
            } else {
                double curvature = pa - 2.0 * pb + pc;
                value = pb;
                offset = 0.0;
                if (curvature < 0.0) {
                    offset = 0.5 * (pa - pc) / curvature;
                    value = pb - 0.125 * (pa - pc) * (pa - pc) / curvature;
                }
            }
            offer(i, value, t + Math.max(-1.0, Math.min(1.0, offset)) * dt);
        }

        private void offer(int i, double value, double t) {
            if (value > peakValue[i]) {
                peakValue[i] = value;
                peakTime[i] = t;
            }
            if (value > windowMax[i]) {
                windowMax[i] = value;
            }
        }

        private void closeWindow(double t) {
            if (t <= windowStart) {
                return;
            }
            double middle = 0.5 * (windowStart + t);
            windowTimes.add(middle);
            windowSpeeds.add(equations.ramp().speedAt(middle));
            windows.add(windowMax.clone());
            Arrays.fill(windowMax, 0.0);
            windowStart = t;
            windowStartPhase = equations.ramp().phaseAt(t);
        }

        RunUpResult result(SpeedRamp ramp, boolean withAbsorber, int evaluations) {
            Map<ResponseKind, TransientPeak> peaks = new EnumMap<>(ResponseKind.class);
            Map<ResponseKind, double[]> values = new EnumMap<>(ResponseKind.class);
            int m = windows.size();
            double[] time = new double[m];
            double[] speed = new double[m];
            for (int j = 0; j < m; j++) {
                time[j] = windowTimes.get(j);
                speed[j] = windowSpeeds.get(j);
            }
            for (int i = 0; i < q; i++) {
                double t = Math.max(0.0, Math.min(ramp.duration(), peakTime[i]));
                peaks.put(kinds.get(i), new TransientPeak(peakValue[i], t, ramp.speedAt(t)));
                double[] v = new double[m];
                for (int j = 0; j < m; j++) {
                    v[j] = windows.get(j)[i];
                }
                values.put(kinds.get(i), v);
            }
            return new RunUpResult(ramp, withAbsorber, peaks, new Envelope(time, speed, values), steps, evaluations);
        }
    }
}
