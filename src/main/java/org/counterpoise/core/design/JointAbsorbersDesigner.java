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
import org.counterpoise.core.optim.RobustJointOptimiser;
import org.counterpoise.core.optim.RobustJointProblem;
import org.counterpoise.core.optim.RobustJointResult;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.robust.ToleranceRanges;
import org.counterpoise.core.robust.WorstCase;
import org.counterpoise.core.system.ModalPeak;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.PointAbsorber;
import org.counterpoise.core.system.Spillover;

/**
 * Designs one absorber on each of two modes of a project's structure jointly (orchestration only;
 * {@link AbsorberLayout#joint}): the total absorber mass of the study shared by the rule of
 * {@link JointAbsorberSetup}, both absorbers' frequencies and dampings chosen together for the least
 * peak over the forcing band of the displacement at the response point per force at the excitation
 * point, every mode of the structure seen ({@link JointAbsorberOptimiser}, in SI), or with the method
 * {@code robust-worst-case} for the least worst peak over the project's frequency ranges, each designed
 * mode's on its own and the absorbers' together ({@link RobustJointOptimiser}); beside it the
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
        DesignStudy study = design.study();
        JointAbsorberResult result;
        AbsorberSetDesign chosen;
        boolean certified;
        Optional<RobustJointResult> robust = Optional.empty();
        if (study.method() == DesignMethod.ROBUST_WORST_CASE) {
            ToleranceRanges ranges = study.robustness().ranges();
            RobustJointResult r = RobustJointOptimiser.optimise(new RobustJointProblem(setup, ranges.structure(),
                    ranges.absorber(), Designer.PRACTICAL_DAMPING_RATIO));
            robust = Optional.of(r);
            result = r.leastPeak();
            chosen = r.design();
            certified = r.certified();
        } else {
            result = JointAbsorberOptimiser.optimise(setup);
            chosen = result.design();
            certified = result.certificate().certified();
        }
        List<PointAbsorber> absorbers = inSi(chosen, joint.points());
        double force = study.excitation().amplitude();
        ModalSystem after = ModalSystem.of(layout.structure(), absorbers);
        List<SeveralAbsorbers.ModePeak> modes = new ArrayList<>();
        for (Spillover.ModePeak p : Spillover.of(after, layout.excitationPoint(), layout.responsePoint()).modes()) {
            modes.add(new SeveralAbsorbers.ModePeak(p.mode(), force * p.before(), force * p.after()));
        }
        double bare = force * peak(after.bare(), layout, band);
        int r = layout.target(band);
        double peakAfter = force * peak(after, layout, band);
        MistuningRange tolerance = SeveralAbsorbersDesigner.structureTolerance(layout, r, absorbers, band, force, bare);
        Optional<SeveralAbsorbers.RobustSet> robustFigures = robust.map(rr -> {
            RobustJointProblem problem = rr.problem();
            return new SeveralAbsorbers.RobustSet(problem.structureRange(), problem.absorberRange(),
                    problem.dampingFloor(), new SeveralAbsorbers.Figures(peakAfter, force * rr.worstPeak(), tolerance),
                    figures(setup, layout, r, rr.leastPeak().design(), band, force, bare, problem),
                    figures(setup, layout, r, rr.leastPeak().sequentialDesign(), band, force, bare, problem));
        });
        return new SeveralAbsorbers(layout, r, layout.effectiveMass(band), band, force, absorbers, bare, peakAfter,
                modes, Optional.empty(), certified, tolerance, robustFigures,
                Optional.of(new SeveralAbsorbers.Sequential(inSi(result.sequentialDesign(), joint.points()),
                        force * result.sequentialPeak())));
    }

    /**
     * The worst peak over the band, per unit force, of a design over the problem's ranges: each designed
     * mode's frequency on its own, both absorbers by a common factor (the search of
     * {@link WorstCase#overBox} on the exact peak of the whole structure).
     */
    private static double worstPeak(JointAbsorberSetup setup, AbsorberSetDesign d, RobustJointProblem problem) {
        double[] w = WorstCase.overBox(b -> setup.peak(d, b), new double[] {problem.structureRange(),
            problem.structureRange(), problem.absorberRange()});
        return w[w.length - 1];
    }

    private static SeveralAbsorbers.Figures figures(JointAbsorberSetup setup, AbsorberLayout layout, int mode,
            AbsorberSetDesign d, FrequencyBand band, double force, double bare, RobustJointProblem problem) {
        List<PointAbsorber> absorbers = inSi(d, setup.absorberPoints());
        return new SeveralAbsorbers.Figures(force * setup.peak(d), force * worstPeak(setup, d, problem),
                SeveralAbsorbersDesigner.structureTolerance(layout, mode, absorbers, band, force, bare));
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
