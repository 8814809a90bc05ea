package org.counterpoise.core.design;

import java.util.Optional;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.robust.MonteCarloOutcome;
import org.counterpoise.core.robust.RobustDesign;
import org.counterpoise.core.robust.SensitivityCurve;
import org.counterpoise.core.robust.SensitivityMap;
import org.counterpoise.core.robust.WorstCase;

/**
 * Everything the robustness report, step and JSON show. SI units.
 *
 * @param settings the ranges, target and tolerances used
 * @param structureCurve design's peak against structure frequency factor
 * @param absorberCurve design's peak against absorber frequency factor
 * @param dampingCurve design's peak against absorber damping factor
 * @param robustStructureCurve the robust design's peak against structure frequency factor
 * @param map design's peak over structure detuning x absorber detuning
 * @param worstCase the design's worst case over the ranges
 * @param robust the robust design for the same mass
 * @param robustAbsorber the robust design's absorber
 * @param toleratedForTarget the structure detuning range that keeps the design within the target
 *     (empty without a target; not defined when the nominal design misses it)
 * @param monteCarlo the tolerance Monte Carlo of the design, or why it was not run (no tolerance given)
 */
public record RobustnessResult(RobustnessSettings settings, SensitivityCurve structureCurve,
        SensitivityCurve absorberCurve, SensitivityCurve dampingCurve, SensitivityCurve robustStructureCurve,
        SensitivityMap map, WorstCase.Point worstCase, RobustDesign robust, Absorber robustAbsorber,
        Optional<MistuningRange> toleratedForTarget, MonteCarloOutcome monteCarlo) {
}
