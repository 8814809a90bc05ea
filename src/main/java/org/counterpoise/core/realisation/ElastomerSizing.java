package org.counterpoise.core.realisation;

import java.util.List;
import java.util.Optional;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.error.NotFoundException;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.optim.HystereticFixedPoints;
import org.counterpoise.core.optim.HystereticOptimiser;
import org.counterpoise.core.optim.HystereticPeakOptimum;
import org.counterpoise.core.optim.PeakProblem;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponseScale;
import org.counterpoise.core.response.TransferFunctions;

/**
 * Sizes an elastomer element that realises a design: the same absorber mass on a complex stiffness
 * k (1 + i eta) (docs/realisation.md, "Elastomer absorbers").
 *
 * <ul>
 *   <li>The exact hysteretic optimum (f, eta) for the design's study and mass ratio, over the band
 *       the exact-peak design uses ({@link Designer#peakProblem}; {@link HystereticOptimiser}).</li>
 *   <li>The dynamic stiffness at the working frequency k = m2 (f omega1)^2; the static stiffness a
 *       load test shows is k / (dynamic-to-static ratio of the compound). Common practice (no
 *       source): the ratio is about 1.1 to 1.3 for soft natural rubber and 2 or more for hard or
 *       highly damped compounds; it rises with frequency and with hardness and falls as the rubber
 *       warms. Caution: it is a property of the compound at the working frequency, amplitude and
 *       temperature; take it from the compound's supplier and confirm the element's frequency by a
 *       tap test, not from a static test.</li>
 *   <li>The check {@link CheckKind#ELASTOMER_LOSS_FACTOR}: the element as sized (tuned to f) with the
 *       compound's own loss factor gives a peak (the demand) that must not exceed the viscous
 *       design's promised peak over the same band plus {@link DesignResult#TOLERANCE_ALLOWANCE}
 *       (the capacity), both SI in the response's dimension. Too little loss factor raises the two
 *       peaks; too much locks the absorber and raises one: both fail the same way, which a
 *       "needed against available" comparison would not show.</li>
 * </ul>
 * Pad sizing from shape factor and hardness is left out: no source could be cited for it here.
 */
public final class ElastomerSizing {

    private ElastomerSizing() {
    }

    /**
     * @param design the viscous design to realise (its study, absorber mass and peak)
     * @param choice the hardware choice (its elastomer compound)
     * @return the elastomer element
     * @throws NotFoundException when the hysteretic optimum cannot be certified
     */
    public static ElastomerDesign size(DesignResult design, HardwareChoice choice) {
        DesignStudy study = design.study();
        Structure structure = study.structure();
        double mu = design.tuning().massRatio();
        PeakProblem problem = Designer.peakProblem(study, mu);
        HystereticPeakOptimum optimum = HystereticOptimiser.optimise(problem);
        if (!optimum.certified()) {
            throw new NotFoundException("certified hysteretic optimum", "the search could not confirm that no other"
                    + " tuning and loss factor of an elastomer element gives a lower peak",
                    "choose helical springs with a damper, or change the band or the mass ratio slightly");
        }
        ExcitationKind kind = study.excitation().kind();
        double scale = ResponseScale.of(structure, kind, study.excitation().amplitude(), study.response());
        double viscousPeak = PeakFinder.over(TransferFunctions.of(kind, study.response(), structure.dampingRatio(),
                design.tuning()), problem.bandLow(), problem.bandHigh()).magnitude() * scale;
        double f = optimum.absorber().tuningRatio();
        double eta = optimum.absorber().lossFactor();
        double omegaA = f * structure.naturalFrequency();
        double dynamic = design.absorber().mass() * omegaA * omegaA;
        ElastomerChoice compound = choice.elastomer();
        double ratio = compound.dynamicToStaticRatio();
        HystereticOptimum hysteretic = new HystereticOptimum(f, eta, optimum.peak() * scale, viscousPeak,
                published(study, problem, mu));
        double withCompound = HystereticOptimiser.peakOf(problem, f, compound.compoundLossFactor()) * scale;
        DesignCheck lossCheck = new DesignCheck(CheckKind.ELASTOMER_LOSS_FACTOR, withCompound,
                (1 + DesignResult.TOLERANCE_ALLOWANCE) * viscousPeak, study.response().dimension(),
                "the element's exact peak with the compound's loss factor against the design's peak over the band"
                        + " plus " + Math.round(100 * DesignResult.TOLERANCE_ALLOWANCE) + " % (a design choice)");
        return new ElastomerDesign(dynamic, dynamic / ratio, ratio, eta, hysteretic, List.of(lossCheck));
    }

    /**
     * The warnings of an elastomer element: {@link WarningKind#ELASTOMER_LOSS_FACTOR_MISSED} when its
     * loss-factor check fails.
     * @param element the sized element
     * @param choice the hardware choice it was sized for
     * @return the warnings (empty when every check passes)
     */
    public static List<Warning> warnings(ElastomerDesign element, HardwareChoice choice) {
        return element.checks().stream()
                .filter(c -> c.kind() == CheckKind.ELASTOMER_LOSS_FACTOR && !c.passes())
                .map(c -> Warning.of(WarningKind.ELASTOMER_LOSS_FACTOR_MISSED,
                        choice.elastomer().compoundLossFactor(), element.lossFactorNeeded(), c.utilisation()))
                .toList();
    }

    /** The fixed-point values where they apply: undamped structure, force to displacement, all frequencies. */
    private static Optional<HystereticOptimum.PublishedHysteretic> published(DesignStudy study, PeakProblem problem,
            double mu) {
        boolean covered = study.structure().dampingRatio() == 0.0 && study.excitation().kind() == ExcitationKind.FORCE
                && study.response() == ResponseKind.DISPLACEMENT && problem.allFrequencies();
        return covered ? Optional.of(new HystereticOptimum.PublishedHysteretic(HystereticFixedPoints.tuningRatio(mu),
                HystereticFixedPoints.lossFactor(mu), HystereticFixedPoints.SOURCE)) : Optional.empty();
    }
}
