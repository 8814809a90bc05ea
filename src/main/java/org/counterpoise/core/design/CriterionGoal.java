package org.counterpoise.core.design;

import org.counterpoise.core.criteria.Assessor;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.criteria.UserLimit;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.robust.BandMeasure;
import org.counterpoise.core.robust.Mistuning;

/**
 * A study's criterion as what a design to it minimises: a {@link Mistuning} model whose measure of
 * a build is proportional to the criterion's utilisation, and the value of that measure at which
 * the utilisation is 1 (the target), so that utilisation = measure / target.
 *
 * <p>A flat user limit on one excitation order, unweighted, judges the peak of its quantity over the
 * band, stated in its convention: its utilisation is convention(peak) / limit, a fixed multiple of
 * the peak. The model then measures the plain peak (the same bits as every other peak design, so
 * a limit in the peak convention gives exactly the target sizing's design) and the target is the
 * limit stated as a peak ({@link Assessor} reads the same peak, to round-off). Every other
 * criterion (weighted, a curve, several orders) is measured by its exact utilisation, the verdict
 * engine's fast path ({@link Assessor#utilisation}).
 *
 * @param model what a build is judged by
 * @param target the measure at a utilisation of 1
 * @param peakOfStudyResponse true when the measure is the peak of the study's own response (the
 *     exact-peak method then sizes exactly as for a target)
 * @param bare the bare structure's utilisation over the band, as the verdict reads it (+infinity
 *     when unbounded)
 */
record CriterionGoal(Mistuning model, double target, boolean peakOfStudyResponse, double bare) {

    /**
     * @param study a study with a criterion
     * @return its goal
     */
    static CriterionGoal of(DesignStudy study) {
        Criterion c = study.criterion().orElseThrow(
                () -> InvalidInputException.missing("acceptance", "designing to meet the criterion needs a criterion"));
        Excitation e = study.excitation();
        Assessor assessor = Assessor.of(c, e);
        double bare = assessor.utilisationBare(study.structure());
        if (c instanceof UserLimit u && u.limit().isFlat() && e.otherOrders().isEmpty()) {
            ResponseKind q = u.quantity();
            // the convention is linear in the amplitude: the limit stated as a peak
            double target = u.limit().at(u.limit().lowFrequency()) / u.convention().ofHarmonic(1.0);
            return new CriterionGoal(new Mistuning(study.structure(), e, q), target, q == study.response(), bare);
        }
        return new CriterionGoal(utilisationModel(study, assessor), 1.0, false, bare);
    }

    /**
     * @param study the study
     * @param assessor its criterion's verdict engine
     * @return the model that judges a build by the criterion's utilisation
     */
    static Mistuning utilisationModel(DesignStudy study, Assessor assessor) {
        BandMeasure utilisation = (s, a) -> assessor.utilisation(s, a.tuningOn(s));
        return new Mistuning(study.structure(), study.excitation(), study.response(), utilisation);
    }
}
