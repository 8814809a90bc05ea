package org.counterpoise.core.design;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.counterpoise.core.criteria.Acceptance;
import org.counterpoise.core.criteria.Reading;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.optim.ActiveConstraint;
import org.counterpoise.core.remedy.DetuningAlternative;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;

/**
 * Every number a report needs about one absorber design. SI units throughout; frequencies in
 * rad/s. Peaks "in band" are the exact maxima over the forcing band (the value at the forcing
 * frequency when the band is one frequency); "run-up" peaks are over [0, top of band], the
 * speeds a machine passes through when it starts and stops.
 *
 * @param study the inputs
 * @param methodSource author, year and work of the design method
 * @param methodNote what the method assumed or found (e.g. which peaks are equal at the optimum)
 * @param tuning mass ratio, tuning ratio, absorber damping ratio
 * @param absorber absorber mass, spring rate, damping coefficient
 * @param staticDeflection static deflection of the absorber spring under the absorber's weight, m (empty
 *     when the absorber does not hang on its spring)
 * @param responseBefore the response that matters, bare structure, in band
 * @param responseAfter the response that matters, with the absorber, in band
 * @param motionBefore displacement, velocity and acceleration of the bare structure, in band
 * @param motionAfter the same with the absorber
 * @param strokeInBand absorber stroke in band
 * @param strokeRunUp absorber stroke over run-up
 * @param clearance stroke clearance to leave, m (margin times the larger bounded stroke)
 * @param springForce spring force in band, N
 * @param damperForce damper force in band, N
 * @param absorberForce spring plus damper force in band, N
 * @param coupledNaturalFrequencies the two natural frequencies of the undamped pair, rad/s
 * @param stiffnessDetuning the stiffness change of the bare structure that would do as well
 * @param massDetuning the mass change of the bare structure that would do as well
 * @param structureTolerance how far the structure's natural frequency may be off before the
 *     response that matters rises by {@link #TOLERANCE_ALLOWANCE}
 * @param absorberTolerance the same for the absorber's natural frequency (spring rate factor squared)
 * @param warnings non-fatal findings
 * @param activeConstraint the designer's constraint that holds an exact-peak optimum back (for the
 *     robust methods: the stroke limit when the run-up stroke sits on it; {@code NONE} for every
 *     other method); the words are in {@code io.text.MethodNoteText}
 * @param runUpStroke the stroke during run-up as the comparison of methods and the warnings use
 *     it: transient at the project's run-up rate when it states one, else {@code strokeRunUp}
 * @param acceptance the study's criterion judged on the bare structure (before) and with the
 *     absorber (after), over every excitation order; empty when the study has no criterion
 * @param afterWorstCase for a robust design with a criterion: the verdict after at the worst point
 *     over the tolerance ranges (the largest utilisation); empty otherwise
 */
public record DesignResult(DesignStudy study, String methodSource, String methodNote, Tuning tuning, Absorber absorber,
        OptionalDouble staticDeflection, ResponsePeak responseBefore, ResponsePeak responseAfter,
        Map<ResponseKind, ResponsePeak> motionBefore, Map<ResponseKind, ResponsePeak> motionAfter,
        ResponsePeak strokeInBand, ResponsePeak strokeRunUp, double clearance, ResponsePeak springForce,
        ResponsePeak damperForce, ResponsePeak absorberForce, double[] coupledNaturalFrequencies,
        DetuningAlternative stiffnessDetuning, DetuningAlternative massDetuning, MistuningRange structureTolerance, MistuningRange absorberTolerance,
        List<Warning> warnings, ActiveConstraint activeConstraint, RunUpStroke runUpStroke,
        Optional<Acceptance> acceptance, Optional<Reading> afterWorstCase) {

    /** The rise of the peak response that defines the tolerated mistuning (a design choice: 10 %). */
    public static final double TOLERANCE_ALLOWANCE = 0.10;

    /** How far each side the tolerated mistuning is searched (30 %). */
    public static final double TOLERANCE_SEARCH = 0.30;

    /** The three motions reported before and after, in this order. */
    public static final List<ResponseKind> MOTIONS =
            List.of(ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY, ResponseKind.ACCELERATION);

    /**
     * A result without an acceptance verdict (as before criteria existed).
     * @param study the inputs
     * @param methodSource source of the method
     * @param methodNote what the method assumed or found
     * @param tuning the tuning
     * @param absorber the absorber
     * @param staticDeflection spring sag, if it hangs
     * @param responseBefore response that matters, bare
     * @param responseAfter response that matters, with the absorber
     * @param motionBefore motions, bare
     * @param motionAfter motions, with the absorber
     * @param strokeInBand stroke in band
     * @param strokeRunUp stroke over run-up
     * @param clearance stroke clearance, m
     * @param springForce spring force in band
     * @param damperForce damper force in band
     * @param absorberForce absorber force in band
     * @param coupledNaturalFrequencies the coupled natural frequencies, rad/s
     * @param stiffnessDetuning the stiffness alternative
     * @param massDetuning the mass alternative
     * @param structureTolerance tolerated structure mistuning
     * @param absorberTolerance tolerated absorber mistuning
     * @param warnings non-fatal findings
     * @param activeConstraint the constraint that holds the optimum back
     * @param runUpStroke the run-up stroke
     */
    public DesignResult(DesignStudy study, String methodSource, String methodNote, Tuning tuning, Absorber absorber,
            OptionalDouble staticDeflection, ResponsePeak responseBefore, ResponsePeak responseAfter,
            Map<ResponseKind, ResponsePeak> motionBefore, Map<ResponseKind, ResponsePeak> motionAfter,
            ResponsePeak strokeInBand, ResponsePeak strokeRunUp, double clearance, ResponsePeak springForce,
            ResponsePeak damperForce, ResponsePeak absorberForce, double[] coupledNaturalFrequencies,
            DetuningAlternative stiffnessDetuning, DetuningAlternative massDetuning,
            MistuningRange structureTolerance, MistuningRange absorberTolerance, List<Warning> warnings,
            ActiveConstraint activeConstraint, RunUpStroke runUpStroke) {
        this(study, methodSource, methodNote, tuning, absorber, staticDeflection, responseBefore, responseAfter,
                motionBefore, motionAfter, strokeInBand, strokeRunUp, clearance, springForce, damperForce,
                absorberForce, coupledNaturalFrequencies, stiffnessDetuning, massDetuning, structureTolerance,
                absorberTolerance, warnings, activeConstraint, runUpStroke, Optional.empty());
    }

    /**
     * A result without a verdict over the tolerances.
     * @param study the inputs
     * @param methodSource source of the method
     * @param methodNote what the method assumed or found
     * @param tuning the tuning
     * @param absorber the absorber
     * @param staticDeflection spring sag, if it hangs
     * @param responseBefore response that matters, bare
     * @param responseAfter response that matters, with the absorber
     * @param motionBefore motions, bare
     * @param motionAfter motions, with the absorber
     * @param strokeInBand stroke in band
     * @param strokeRunUp stroke over run-up
     * @param clearance stroke clearance, m
     * @param springForce spring force in band
     * @param damperForce damper force in band
     * @param absorberForce absorber force in band
     * @param coupledNaturalFrequencies the coupled natural frequencies, rad/s
     * @param stiffnessDetuning the stiffness alternative
     * @param massDetuning the mass alternative
     * @param structureTolerance tolerated structure mistuning
     * @param absorberTolerance tolerated absorber mistuning
     * @param warnings non-fatal findings
     * @param activeConstraint the constraint that holds the optimum back
     * @param runUpStroke the run-up stroke
     * @param acceptance the verdict before and after, when the study has a criterion
     */
    public DesignResult(DesignStudy study, String methodSource, String methodNote, Tuning tuning, Absorber absorber,
            OptionalDouble staticDeflection, ResponsePeak responseBefore, ResponsePeak responseAfter,
            Map<ResponseKind, ResponsePeak> motionBefore, Map<ResponseKind, ResponsePeak> motionAfter,
            ResponsePeak strokeInBand, ResponsePeak strokeRunUp, double clearance, ResponsePeak springForce,
            ResponsePeak damperForce, ResponsePeak absorberForce, double[] coupledNaturalFrequencies,
            DetuningAlternative stiffnessDetuning, DetuningAlternative massDetuning,
            MistuningRange structureTolerance, MistuningRange absorberTolerance, List<Warning> warnings,
            ActiveConstraint activeConstraint, RunUpStroke runUpStroke, Optional<Acceptance> acceptance) {
        this(study, methodSource, methodNote, tuning, absorber, staticDeflection, responseBefore, responseAfter,
                motionBefore, motionAfter, strokeInBand, strokeRunUp, clearance, springForce, damperForce,
                absorberForce, coupledNaturalFrequencies, stiffnessDetuning, massDetuning, structureTolerance,
                absorberTolerance, warnings, activeConstraint, runUpStroke, acceptance, Optional.empty());
    }

    /** Defensive copies. */
    public DesignResult {
        motionBefore = Map.copyOf(motionBefore);
        motionAfter = Map.copyOf(motionAfter);
        coupledNaturalFrequencies = coupledNaturalFrequencies.clone();
        warnings = List.copyOf(warnings);
        Objects.requireNonNull(acceptance, "acceptance");
        Objects.requireNonNull(afterWorstCase, "afterWorstCase");
    }

    /** @return a copy of the coupled natural frequencies, rad/s */
    @Override
    public double[] coupledNaturalFrequencies() {
        return coupledNaturalFrequencies.clone();
    }

    /**
     * @return the rms figures when the disturbance is white noise (computed on each call, from
     *     the exact mean square), empty for a harmonic disturbance
     */
    public Optional<RmsFigures> rms() {
        return study.excitation().spectrum().isWhiteNoise() ? Optional.of(RmsFigures.of(this))
                : Optional.empty();
    }

    /**
     * @param judged another verdict of the study's criterion (the whole structure's, for several modes
     *     and absorbers)
     * @return this result with that verdict, and no worst-case verdict (it was this design's alone)
     */
    public DesignResult withAcceptance(Optional<Acceptance> judged) {
        return new DesignResult(study, methodSource, methodNote, tuning, absorber, staticDeflection, responseBefore,
                responseAfter, motionBefore, motionAfter, strokeInBand, strokeRunUp, clearance, springForce,
                damperForce, absorberForce, coupledNaturalFrequencies, stiffnessDetuning, massDetuning,
                structureTolerance, absorberTolerance, warnings, activeConstraint, runUpStroke, judged,
                Optional.empty());
    }

    /** @return before over after for the response that matters; +infinity when before is unbounded */
    public double reductionFactor() {
        return responseBefore.value() / responseAfter.value();
    }

    /** @return the reduction in decibels, 20 log10(before/after); +infinity when before is unbounded */
    public double reductionDecibels() {
        return 20.0 * Math.log10(reductionFactor());
    }
}
