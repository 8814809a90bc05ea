package org.counterpoise.core.design;

import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.runup.RunUp;
import org.counterpoise.core.runup.SpeedRamp;
import org.counterpoise.core.runup.TransientPeak;

/**
 * The absorber's peak stroke while the machine runs up, as a design reports it: the transient
 * peak of a run-up in the time domain ({@link RunUp}, with the absorber) when the project states a
 * run-up rate, otherwise the steady-state peak over [0, top of band] (what a machine that could
 * dwell at every speed it passes would see). The basis says which.
 *
 * @param peak the peak stroke, m, and the forcing frequency it occurs at, rad/s (unbounded only on
 *     the steady-state basis, for an undamped absorber)
 * @param basis which figure it is
 */
public record RunUpStroke(ResponsePeak peak, Basis basis) {

    /** Which figure a {@link RunUpStroke} is. */
    public enum Basis {
        /**
         * Transient peak of a run-up from rest at the project's rate to
         * {@link SpeedRamp#DEFAULT_OVERSPEED} times the top of the band.
         */
        TRANSIENT,
        /** Steady-state peak from rest to the top of the band: the project states no run-up rate. */
        STEADY_STATE,
        /**
         * Steady-state peak: a rate is stated but this run-up is not integrated (a base acceleration
         * drive, a white-noise disturbance, or a ramp longer than {@link RunUp#MAX_CYCLES} cycles).
         */
        STEADY_STATE_NOT_INTEGRATED
    }

    /**
     * @param study the study (its excitation's run-up rate decides the basis)
     * @param tuning the absorber's tuning
     * @param steady the steady-state stroke over [0, top of band] ({@link DesignResult#strokeRunUp})
     * @return the run-up stroke (the time integration honours the thread's interrupt)
     */
    static RunUpStroke of(DesignStudy study, Tuning tuning, ResponsePeak steady) {
        Excitation e = study.excitation();
        if (e.runUpRate().isEmpty()) {
            return new RunUpStroke(steady, Basis.STEADY_STATE);
        }
        SpeedRamp ramp = SpeedRamp.runUp(SpeedRamp.DEFAULT_OVERSPEED * e.band().high(), e.runUpRate().getAsDouble());
        if (e.kind() == ExcitationKind.BASE_ACCELERATION || e.spectrum().isWhiteNoise()
                || ramp.forcingCycles() > RunUp.MAX_CYCLES) {
            return new RunUpStroke(steady, Basis.STEADY_STATE_NOT_INTEGRATED);
        }
        TransientPeak p = RunUp.simulate(study.structure(), tuning, e.kind(), e.amplitude(), ramp, RunUp.Start.REST,
                ProgressListener.NONE).peak(ResponseKind.STROKE).orElseThrow();
        return new RunUpStroke(new ResponsePeak(p.speed(), p.value()), Basis.TRANSIENT);
    }
}
