package org.counterpoise.core.runup;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * The forcing frequency against time: Omega(t) = Omega0 + alpha t for 0 &lt;= t &lt;= T, with the
 * forcing phase phi(t) = Omega0 t + alpha t^2 / 2 (phi(0) = 0). Forcing frequencies are angular
 * (rad/s) and refer to the force, i.e. shaft speed times the harmonic order; the conversion from
 * shaft rpm per second is done by the caller.
 *
 * @param startSpeed forcing frequency at t = 0, rad/s (&gt;= 0)
 * @param acceleration alpha, rad/s^2: positive for a run-up, negative for a run-down, 0 for a
 *     constant speed
 * @param duration T, s (&gt; 0)
 */
public record SpeedRamp(double startSpeed, double acceleration, double duration) {

    /**
     * How far above the top forcing frequency a run-up goes by default (1.25 times; a choice, so
     * that the passage through the upper coupled frequency and the ring-down after it are seen).
     */
    public static final double DEFAULT_OVERSPEED = 1.25;

    /** Validates the ramp: the speed never goes below zero and the duration is finite. */
    public SpeedRamp {
        Checks.nonNegative("run_up.start_speed", startSpeed);
        Checks.positive("run_up.duration", duration);
        if (!Double.isFinite(acceleration) || !Double.isFinite(duration)) {
            throw new InvalidInputException("run_up.rate", Checks.show(acceleration),
                    "a finite shaft acceleration");
        }
        if (startSpeed + acceleration * duration < -1e-9 * Math.max(startSpeed, 1.0)) {
            throw new InvalidInputException("run_up.duration", Checks.show(duration),
                    "the speed must not fall below zero before the end of the ramp");
        }
    }

    /**
     * From rest up to a final forcing frequency at constant acceleration.
     * @param finalSpeed final forcing frequency, rad/s (&gt; 0)
     * @param rate forcing angular acceleration, rad/s^2 (&gt; 0)
     * @return the run-up ramp
     */
    public static SpeedRamp runUp(double finalSpeed, double rate) {
        Checks.positive("run_up.final_speed", finalSpeed);
        Checks.positive("run_up.rate", rate);
        return new SpeedRamp(0.0, rate, finalSpeed / rate);
    }

    /**
     * From a forcing frequency down to rest at constant deceleration.
     * @param finalSpeed the running forcing frequency the run-down starts from, rad/s (&gt; 0)
     * @param rate forcing angular deceleration, rad/s^2 (&gt; 0)
     * @return the run-down ramp
     */
    public static SpeedRamp runDown(double finalSpeed, double rate) {
        Checks.positive("run_up.final_speed", finalSpeed);
        Checks.positive("run_up.rate", rate);
        return new SpeedRamp(finalSpeed, -rate, finalSpeed / rate);
    }

    /**
     * @param speed forcing frequency, rad/s (&gt; 0)
     * @param duration how long, s
     * @return a dwell at constant speed
     */
    public static SpeedRamp constant(double speed, double duration) {
        Checks.positive("run_up.speed", speed);
        return new SpeedRamp(speed, 0.0, duration);
    }

    /**
     * @param t time, s
     * @return Omega(t), rad/s (never below 0)
     */
    public double speedAt(double t) {
        return Math.max(0.0, startSpeed + acceleration * t);
    }

    /**
     * @param t time, s
     * @return phi(t) = Omega0 t + alpha t^2 / 2, rad
     */
    public double phaseAt(double t) {
        return startSpeed * t + 0.5 * acceleration * t * t;
    }

    /** @return the larger of the start and end speeds, rad/s */
    public double topSpeed() {
        return Math.max(startSpeed, speedAt(duration));
    }

    /** @return the number of forcing cycles over the ramp, phi(T) / (2 pi) */
    public double forcingCycles() {
        return phaseAt(duration) / (2.0 * Math.PI);
    }
}
