package org.counterpoise.core.realisation;

import java.util.Optional;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.HystereticAbsorber;
import org.counterpoise.core.response.HystereticResponse;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponseScale;

/**
 * The absorber as it will be built, for the procedure and the predicted table: the viscous design
 * itself (helical springs and a damper), or an elastomer element, which is tuned to the hysteretic
 * optimum's ratio and damps by its compound's loss factor, a complex stiffness k (1 + i eta) with no
 * dashpot ({@link HystereticAbsorber}; its responses are the exact ones of {@link HystereticResponse}).
 *
 * @param design the viscous design
 * @param tuningRatio the absorber's own frequency over the structure's, as it is tuned on site
 * @param springRate the (dynamic) rate of its spring or element, N/m
 * @param hysteretic the elastomer element's absorber, when it is one
 */
record BuiltAbsorber(DesignResult design, double tuningRatio, double springRate,
        Optional<HystereticAbsorber> hysteretic) {

    /**
     * @param design the viscous design
     * @param choice the hardware choices (the compound's loss factor)
     * @param elastomer the elastomer element, when the spring is one
     * @return the absorber as built
     */
    static BuiltAbsorber of(DesignResult design, HardwareChoice choice, Optional<ElastomerDesign> elastomer) {
        if (elastomer.isEmpty()) {
            return new BuiltAbsorber(design, design.tuning().tuningRatio(), design.absorber().stiffness(),
                    Optional.empty());
        }
        ElastomerDesign e = elastomer.get();
        double f = e.optimum().tuningRatio();
        return new BuiltAbsorber(design, f, e.dynamicStiffness(), Optional.of(new HystereticAbsorber(
                design.tuning().massRatio(), f, choice.elastomer().compoundLossFactor())));
    }

    /**
     * @param kind a response
     * @param omega forcing frequency, rad/s
     * @return its SI amplitude with this absorber fitted (+infinity at an undamped resonance)
     */
    double amplitudeAt(ResponseKind kind, double omega) {
        Structure s = design.study().structure();
        Excitation e = design.study().excitation();
        if (hysteretic.isEmpty()) {
            return DamperSizing.fitted(design).amplitudeAt(kind, omega);
        }
        HystereticAbsorber a = hysteretic.get();
        HystereticResponse h = HystereticResponse.of(e.kind(), kind, s.dampingRatio(), a.massRatio());
        return ResponseScale.of(s, e.kind(), e.amplitude(), kind) * h.magnitude(a, omega / s.naturalFrequency());
    }

    /**
     * @param kind a response
     * @return its exact largest SI amplitude over the forcing band with this absorber fitted
     */
    double peakInBand(ResponseKind kind) {
        if (hysteretic.isEmpty()) {
            return DamperSizing.fitted(design).peakOver(kind, design.study().excitation().band()).value();
        }
        Structure s = design.study().structure();
        Excitation e = design.study().excitation();
        HystereticAbsorber a = hysteretic.get();
        HystereticResponse h = HystereticResponse.of(e.kind(), kind, s.dampingRatio(), a.massRatio());
        double omega1 = s.naturalFrequency();
        return ResponseScale.of(s, e.kind(), e.amplitude(), kind)
                * h.peak(a, e.band().low() / omega1, e.band().high() / omega1).magnitude();
    }
}
