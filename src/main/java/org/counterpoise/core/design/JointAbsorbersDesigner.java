package org.counterpoise.core.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.optim.AbsorberSetDesign;
import org.counterpoise.core.optim.JointAbsorberOptimiser;
import org.counterpoise.core.optim.JointAbsorberResult;
import org.counterpoise.core.optim.JointAbsorberSetup;
import org.counterpoise.core.system.ModalPeak;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.core.system.Spillover;

/**
 * Designs one absorber on each of two modes of a project's structure jointly (orchestration only;
 * {@link AbsorberLayout#joint}): the total absorber mass of the study shared by the rule of
 * {@link JointAbsorberSetup}, both absorbers' frequencies and dampings chosen together for the least
 * peak over the forcing band of the displacement at the response point per force at the excitation
 * point, every mode of the structure seen ({@link JointAbsorberOptimiser}, in SI); beside it the
 * sequential design (each absorber on its own mode alone, the usual practice) and, as for absorbers
 * on one mode, each mode's peak (spillover) and the tolerance of the target mode's frequency.
 */
final class JointAbsorbersDesigner {
    private JointAbsorbersDesigner() {
    }

    /**
     * @param design the study's design on the target mode (its absorber's mass is the total)
     * @param layout a layout with one absorber per mode
     * @return the two absorbers and the whole structure's response
     */
    static SeveralAbsorbers design(DesignResult design, AbsorberLayout layout) {
        JointArrangement joint = layout.joint().orElseThrow();
        FrequencyBand band = design.study().excitation().band();
        if (band.isSingle()) {
            throw new InvalidInputException("disturbance.frequency", "one forcing frequency", "a band of forcing"
                    + " frequencies (disturbance.band) with one absorber per mode: both absorbers act over a band");
        }
        JointAbsorberSetup setup = new JointAbsorberSetup(layout.structure(), joint.modes(), joint.points(),
                layout.excitationPoint(), layout.responsePoint(), design.absorber().mass(), band.low(), band.high());
        JointAbsorberResult result = JointAbsorberOptimiser.optimise(setup);
        List<PointAbsorber> absorbers = inSi(result.design(), joint.points());
        double force = design.study().excitation().amplitude();
        ModalSystem after = ModalSystem.of(layout.structure(), absorbers);
        List<SeveralAbsorbers.ModePeak> modes = new ArrayList<>();
        for (Spillover.ModePeak p : Spillover.of(after, layout.excitationPoint(), layout.responsePoint()).modes()) {
            modes.add(new SeveralAbsorbers.ModePeak(p.mode(), force * p.before(), force * p.after()));
        }
        double bare = force * peak(after.bare(), layout, band);
        int r = layout.target(band);
        return new SeveralAbsorbers(layout, r, layout.effectiveMass(band), band, force, absorbers, bare,
                force * peak(after, layout, band), modes, Optional.empty(), result.certificate().certified(),
                SeveralAbsorbersDesigner.structureTolerance(layout, r, absorbers, band, force, bare), Optional.empty(),
                Optional.of(new SeveralAbsorbers.Sequential(inSi(result.sequentialDesign(), joint.points()),
                        force * result.sequentialPeak())));
    }

    private static double peak(ModalSystem system, AbsorberLayout layout, FrequencyBand band) {
        return ModalPeak.over(system, layout.excitationPoint(), layout.responsePoint(), band.low(), band.high());
    }

    /** The setup's design is in SI already: masses kg, own frequencies rad/s, damping ratios. */
    private static List<PointAbsorber> inSi(AbsorberSetDesign d, List<String> points) {
        List<PointAbsorber> out = new ArrayList<>();
        for (int j = 0; j < d.count(); j++) {
            out.add(PointAbsorber.tuned(points.get(j), d.massRatios().get(j), d.tuningRatios().get(j),
                    d.dampingRatios().get(j)));
        }
        return out;
    }
}
