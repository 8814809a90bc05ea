package org.counterpoise.core.realisation;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.counterpoise.core.error.Warning;

/**
 * The design turned into hardware: what the part list, the procedure and the checks of the report,
 * the JSON and the sheet show. Exactly one of {@code spring} and {@code elastomer} is present, as
 * the choice's spring kind says (when no stock wire gives the rate, the closest springs with the
 * warning {@code SPRING_RATE_NOT_MET}).
 *
 * @param choice the hardware choices it was made for
 * @param spring the helical springs (with {@link SpringKind#HELICAL_COMPRESSION})
 * @param elastomer the elastomer element (with {@link SpringKind#ELASTOMER})
 * @param damper the damper
 * @param tolerances the tolerance each part must hold
 * @param trim the adjustment on site
 * @param procedure tuning and commissioning, in order
 * @param predicted the predicted response table
 * @param warnings what the hardware checks found
 */
public record Realisation(HardwareChoice choice, Optional<SpringDesign> spring, Optional<ElastomerDesign> elastomer,
        DamperDesign damper, PartTolerances tolerances, TrimPlan trim, List<ProcedureStep> procedure,
        List<PredictedPoint> predicted, List<Warning> warnings) {

    /** Defensive copies. */
    public Realisation {
        procedure = List.copyOf(procedure);
        predicted = List.copyOf(predicted);
        warnings = List.copyOf(warnings);
    }

    /**
     * @return every check of the spring or elastomer and the damper, in that order; the springs' first
     *     check is their rate against the tolerance the spring rate must hold
     */
    public List<DesignCheck> checks() {
        List<DesignCheck> all = new ArrayList<>();
        spring.ifPresent(s -> {
            all.add(SpringChecks.rate(s, tolerances));
            all.addAll(s.checks());
        });
        elastomer.ifPresent(e -> all.addAll(e.checks()));
        all.addAll(damper.checks());
        return List.copyOf(all);
    }
}
