package org.counterpoise.core.design;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.runup.RunUp;
import org.counterpoise.core.runup.RunUpComparison;
import org.counterpoise.core.runup.RunUpReportData;
import org.counterpoise.core.runup.SpeedRamp;
import org.counterpoise.core.runup.SteadyCurves;

/**
 * A run-up (or run-down) of a design through resonance, as the command line, the sheet and the
 * wizard ask for it: the design, the harmonic order that turns shaft speeds into forcing
 * frequencies, the shaft's acceleration and the final shaft speed. {@link #run} integrates it with
 * and without the absorber ({@link RunUpComparison}) and adds the steady-state curves over the same
 * speeds ({@link SteadyCurves}) for the plots.
 *
 * @param design the design whose absorber runs up
 * @param harmonicOrder forcing cycles per shaft revolution (&gt; 0)
 * @param shaftRate the shaft's angular acceleration, rad/s^2 (&gt; 0)
 * @param finalShaftSpeed the shaft speed the run-up ends at (or the run-down starts from), rad/s (&gt; 0)
 * @param runDown true for a run-down from steady running to rest
 */
public record RunUpStudy(DesignResult design, double harmonicOrder, double shaftRate, double finalShaftSpeed,
        boolean runDown) {

    /** Validates the numbers; the field names are those of the project file. */
    public RunUpStudy {
        Checks.positive("disturbance.harmonic_order", harmonicOrder);
        Checks.positive("run_up.rate", shaftRate);
        Checks.positive("run_up.final_speed", finalShaftSpeed);
    }

    /**
     * A run-up from rest to {@link SpeedRamp#DEFAULT_OVERSPEED} times the top running speed.
     * @param design the design
     * @param harmonicOrder forcing cycles per shaft revolution
     * @param shaftRate the shaft's angular acceleration, rad/s^2
     * @return the study
     */
    public static RunUpStudy runUp(DesignResult design, double harmonicOrder, double shaftRate) {
        return new RunUpStudy(design, harmonicOrder, shaftRate, defaultFinalShaftSpeed(design, harmonicOrder), false);
    }

    /**
     * @param design the design
     * @param harmonicOrder forcing cycles per shaft revolution
     * @return {@link SpeedRamp#DEFAULT_OVERSPEED} times the top shaft speed of the band (or the single speed), rad/s
     */
    public static double defaultFinalShaftSpeed(DesignResult design, double harmonicOrder) {
        return SpeedRamp.DEFAULT_OVERSPEED * topShaftSpeed(design, harmonicOrder);
    }

    /**
     * @param design the design
     * @param harmonicOrder forcing cycles per shaft revolution
     * @return the top shaft speed of the band (or the single speed), rad/s
     */
    public static double topShaftSpeed(DesignResult design, double harmonicOrder) {
        return design.study().excitation().band().high() / harmonicOrder;
    }

    /**
     * @return the forcing-frequency ramp
     * @throws InvalidInputException (field run_up.rate) when the ramp would be too long to integrate
     */
    public SpeedRamp ramp() {
        double top = finalShaftSpeed * harmonicOrder;
        double rate = shaftRate * harmonicOrder;
        SpeedRamp ramp = runDown ? SpeedRamp.runDown(top, rate) : SpeedRamp.runUp(top, rate);
        if (ramp.forcingCycles() > RunUp.MAX_CYCLES) {
            RunUp.refuseLong(ramp);
        }
        return ramp;
    }

    /**
     * The structure's quantity the plots show: the design's response when it is a motion of the
     * structure at the absorber point (displacement, velocity, acceleration), else its displacement.
     * @return the quantity
     */
    public ResponseKind structureQuantity() {
        ResponseKind k = design.study().response();
        return k == ResponseKind.VELOCITY || k == ResponseKind.ACCELERATION ? k : ResponseKind.DISPLACEMENT;
    }

    /**
     * Integrates the ramp with and without the absorber and computes the steady curves.
     * @param listener progress (the two integrations) and cancellation
     * @return the peaks, the envelopes and the steady curves
     */
    public Result run(ProgressListener listener) {
        Excitation e = design.study().excitation();
        RunUpComparison comparison = RunUpComparison.of(design.study().structure(), design.tuning(), e.kind(),
                e.amplitude(), ramp(), runDown ? RunUp.Start.STEADY_STATE : RunUp.Start.REST, listener);
        listener.checkCancelled("the run-up");
        SteadyCurves steady = SteadyCurves.of(design.study().structure(), design.tuning(), e.kind(), e.amplitude(),
                comparison);
        return new Result(this, new RunUpReportData(design.study().name(), runDown, harmonicOrder, comparison),
                steady);
    }

    /**
     * A computed run-up.
     * @param study what was computed
     * @param data the peaks and envelopes with and without the absorber, and the steady peaks
     * @param steady the steady-state curves over the same speeds
     */
    public record Result(RunUpStudy study, RunUpReportData data, SteadyCurves steady) {
    }
}
