package org.counterpoise.core.criteria;

import java.util.List;
import java.util.Optional;
import org.counterpoise.core.response.ResponseKind;

/**
 * What a response is judged against. Every criterion reduces to the same data, which the exact
 * verdict ({@code Assessor}) needs and nothing else: the quantity, the convention its limit is
 * stated in, an optional frequency weighting, the limit (flat or a curve over frequency), how
 * several excitation orders combine, and the named zones of the measure where the criterion has
 * them. The records hold the user's choices (enums); the tables are in the records' enums, once,
 * with standard and edition.
 */
public sealed interface Criterion permits UserLimit, HumanComfort, BuildingVibration, MachineSeverity,
        EquipmentVibration {

    /** @return the family */
    CriterionKind kind();

    /** @return the response quantity judged (of the structure at the absorber point) */
    ResponseKind quantity();

    /** @return the convention the limit and the judged value are stated in */
    AmplitudeConvention convention();

    /** @return the frequency weighting applied to the response before it is judged, if any */
    Optional<FrequencyWeighting> weighting();

    /** @return the limit, SI unit of the quantity, in the convention, over frequency in Hz */
    LimitCurve limit();

    /** @return how several excitation orders are judged */
    OrderCombination combination();

    /** @return the zones of the measure (ascending), empty when the criterion has none */
    List<Zone> zones();

    /** @return standard, edition, table (or "stated by the user") */
    String source();
}
