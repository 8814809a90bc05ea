package org.counterpoise.core.commission;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.system.ModalPeak;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.PointAbsorber;

/**
 * The commissioning of several absorbers at one point: each absorber as built against its design,
 * the mass that brings each to its frequency, and what the whole structure does with them as built
 * and after that trim.
 *
 * <p>Each absorber's target frequency is its design's, scaled with the target mode when the fit freed
 * that mode's frequency (the absorbers follow the structure, as the design's tuning ratios ask). At a
 * fixed spring rate omega = sqrt(k / m) (any vibration text, e.g. Den Hartog 1956, Mechanical
 * Vibrations, 4th ed., ch. 1), so the mass that gives the target is m (omega_built / omega_target)^2;
 * the damper stays, so after the trim zeta = c / (2 m' omega_target). The peaks are the exact peaks
 * over the band of the displacement at the response point per the project's force
 * ({@link ModalPeak}), on the structure as measured. The trim is called required when the peak as
 * built exceeds the design's by more than {@link DesignResult#TOLERANCE_ALLOWANCE}, the allowance
 * that the single absorber's check uses.
 *
 * @param built the absorbers as built
 * @param corrections one per absorber, in the design's order
 * @param designPeak the peak over the band with the absorbers as designed, m
 * @param asBuiltPeak the peak with the absorbers as built, on the structure as measured, m
 * @param afterTrimPeak the peak after every absorber's mass is trimmed as advised, m
 * @param trimRequired whether the peak as built exceeds the design's by more than the allowance
 */
public record SetCommissioning(AsBuiltSet built, List<Correction> corrections, double designPeak,
        double asBuiltPeak, double afterTrimPeak, boolean trimRequired) {

    /** Copies the list. */
    public SetCommissioning {
        corrections = List.copyOf(corrections);
    }

    /**
     * One absorber's correction.
     *
     * @param designFrequency its design's own frequency, rad/s
     * @param targetFrequency the frequency the structure as measured needs, rad/s
     * @param frequencyOff omega_built / omega_target - 1
     * @param massToAdd the mass that brings it to the target at its spring rate, kg (negative: to take off);
     *     0 when the fit is poor (its frequency could be wrong in size and sign)
     * @param designDampingRatio its design's damping ratio
     * @param dampingOff zeta_built / zeta_design - 1 (0 for an undamped design)
     */
    public record Correction(double designFrequency, double targetFrequency, double frequencyOff, double massToAdd,
            double designDampingRatio, double dampingOff) {
    }

    /**
     * @param design the several absorbers as designed
     * @param measured the driving-point FRF at their point with all of them fitted
     * @param freeStructure whether to fit the target mode's natural frequency too
     * @param weighed each absorber's mass as weighed (kg, in the design's order), or an empty list for the design's
     * @return the check
     */
    public static SetCommissioning of(SeveralAbsorbers design, MeasuredFrf measured, boolean freeStructure,
            List<Double> weighed) {
        List<PointAbsorber> designed = design.absorbers();
        if (!weighed.isEmpty() && weighed.size() != designed.size()) {
            throw new InvalidInputException("absorber masses as weighed", weighed.size() + " values",
                    designed.size() + " masses, one per absorber in the design's order, or none for the design's");
        }
        List<PointAbsorber> held = new ArrayList<>();
        for (int j = 0; j < designed.size(); j++) {
            PointAbsorber d = designed.get(j);
            if (weighed.isEmpty()) {
                held.add(d);
            } else {
                double m = Checks.positive("absorber " + (j + 1) + " mass as weighed", weighed.get(j));
                // weighed with its plates on the spring and damper as built: the design's frequency and
                // damping ratio start the fit, its mass is the scale's
                held.add(PointAbsorber.tuned(d.point(), m, d.frequency(), d.damping() / (2 * d.mass() * d.frequency())));
            }
        }
        AbsorberLayout layout = design.layout();
        ModalStructure structure = layout.structure();
        int target = design.targetMode();
        AsBuiltSet built = AsBuiltSetFit.fit(structure, target, held, measured, freeStructure);
        double modeScale = built.targetModeFrequency() / structure.modes().get(target).naturalFrequency();
        ModalStructure asMeasured = modeScale == 1.0 ? structure
                : structure.withFrequency(target, built.targetModeFrequency());
        boolean advised = !built.warnings().contains(CommissioningWarning.POOR_FIT);
        List<Correction> corrections = new ArrayList<>();
        List<PointAbsorber> asBuilt = new ArrayList<>();
        List<PointAbsorber> trimmed = new ArrayList<>();
        for (int j = 0; j < designed.size(); j++) {
            PointAbsorber d = designed.get(j);
            AsBuiltSet.Built b = built.absorbers().get(j);
            double targetFrequency = d.frequency() * modeScale;
            double ratio = b.frequency() / targetFrequency;
            double massToAdd = advised ? b.mass() * (ratio * ratio - 1.0) : 0.0;
            double designZeta = d.damping() / (2 * d.mass() * d.frequency());
            corrections.add(new Correction(d.frequency(), targetFrequency, ratio - 1.0, massToAdd, designZeta,
                    designZeta > 0 ? b.dampingRatio() / designZeta - 1.0 : 0.0));
            PointAbsorber now = PointAbsorber.tuned(d.point(), b.mass(), b.frequency(), b.dampingRatio());
            asBuilt.add(now);
            trimmed.add(new PointAbsorber(d.point(), b.mass() + massToAdd, now.stiffness(), now.damping()));
        }
        FrequencyBand band = design.band();
        double force = design.forceAmplitude();
        double asBuiltPeak = force * peak(asMeasured, asBuilt, layout, band);
        double afterTrim = advised ? force * peak(asMeasured, trimmed, layout, band) : asBuiltPeak;
        return new SetCommissioning(built, corrections, design.peakAfter(), asBuiltPeak, afterTrim,
                asBuiltPeak > design.peakAfter() * (1 + DesignResult.TOLERANCE_ALLOWANCE));
    }

    private static double peak(ModalStructure structure, List<PointAbsorber> absorbers, AbsorberLayout layout,
            FrequencyBand band) {
        return ModalPeak.over(ModalSystem.of(structure, absorbers), layout.excitationPoint(), layout.responsePoint(),
                band.low(), band.high());
    }
}
