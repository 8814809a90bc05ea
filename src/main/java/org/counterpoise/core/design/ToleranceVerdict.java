package org.counterpoise.core.design;

import java.util.Optional;
import org.counterpoise.core.criteria.Assessor;
import org.counterpoise.core.criteria.Reading;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.robust.Mistuning;
import org.counterpoise.core.robust.WorstCase;

/**
 * The verdict after, at the worst point over the tolerance ranges: for a robust design, where the
 * criterion's utilisation is largest when the structure's natural frequency, the absorber's natural
 * frequency and its damping coefficient may each be anywhere in their ranges ({@link WorstCase},
 * exact to about 1e-9), read there in full (value, limit, frequency, zones) by {@link Assessor}. So a
 * report can show "after, worst case over the tolerances" beside the nominal verdict.
 */
final class ToleranceVerdict {

    private ToleranceVerdict() {
    }

    /**
     * @param study the study
     * @param tuning the design's tuning
     * @return the reading at the worst point over the tolerance ranges, for a robust method with a
     *     criterion; empty otherwise
     */
    static Optional<Reading> worstCase(DesignStudy study, Tuning tuning) {
        if (!study.method().robust() || study.criterion().isEmpty()) {
            return Optional.empty();
        }
        Assessor assessor = Assessor.of(study.criterion().get(), study.excitation());
        Mistuning model = CriterionGoal.utilisationModel(study, assessor);
        Absorber nominal = Absorber.of(study.structure(), tuning);
        WorstCase.Point p = WorstCase.of(model, nominal, study.robustness().ranges());
        Structure varied = model.structure(p.structureFactor());
        Absorber built = Mistuning.absorber(nominal, p.absorberFactor(), p.dampingFactor());
        return Optional.of(assessor.read(varied, Optional.of(built.tuningOn(varied))));
    }
}
