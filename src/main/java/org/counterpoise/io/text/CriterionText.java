package org.counterpoise.io.text;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.criteria.BuildingAxis;
import org.counterpoise.core.criteria.BuildingVibration;
import org.counterpoise.core.criteria.ComfortReaction;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.criteria.CriterionKind;
import org.counterpoise.core.criteria.EquipmentVibration;
import org.counterpoise.core.criteria.FrequencyWeighting;
import org.counterpoise.core.criteria.HumanComfort;
import org.counterpoise.core.criteria.LimitCurve;
import org.counterpoise.core.criteria.MachineClass;
import org.counterpoise.core.criteria.MachineSeverity;
import org.counterpoise.core.criteria.OrderCombination;
import org.counterpoise.core.criteria.RoomUse;
import org.counterpoise.core.criteria.SeverityZone;
import org.counterpoise.core.criteria.UserLimit;
import org.counterpoise.core.criteria.VibrationCriterionCurve;
import org.counterpoise.core.units.Dimension;

/**
 * Acceptance criteria in words, the one place they are written (the text report, the JSON, the
 * sheet and the wizard all use it): what the criterion is, what it measures, its source with the
 * standing of its values, and the names of its zones. The standing follows the tags of
 * reference/acceptance-criteria.md that the core tables carry in their sources: values from
 * memory say "verify before use as a hard limit" wherever their source is shown.
 */
public final class CriterionText {
    private CriterionText() {
    }

    /**
     * @param kind a family of criteria
     * @return its name in words
     */
    public static String family(CriterionKind kind) {
        return switch (kind) {
            case USER_LIMIT -> "limit stated by the user";
            case HUMAN_COMFORT -> "human comfort (ISO 2631-1)";
            case BUILDING -> "people in buildings (ISO 10137)";
            case MACHINE -> "machine vibration severity (ISO 20816-3)";
            case EQUIPMENT -> "sensitive equipment (vibration criterion curves)";
        };
    }

    /**
     * @param c a criterion
     * @return the criterion in words, e.g. "machine vibration severity (ISO 20816-3): group 2,
     *     rigid support, zone B accepted (unrestricted long-term operation)"
     */
    public static String of(Criterion c) {
        return of(c, UnitSystem.SI);
    }

    /**
     * @param c a criterion
     * @param units the unit system its limits are stated in
     * @return the criterion in words
     */
    public static String of(Criterion c, UnitSystem units) {
        String detail;
        if (c instanceof UserLimit u) {
            detail = u.convention().label() + " " + u.quantity().label() + " " + limit(u.limit(),
                    u.quantity().dimension(), units);
        } else if (c instanceof HumanComfort h) {
            detail = "weighted r.m.s. acceleration, " + h.axisWeighting().symbol()
                    + (h.axisWeighting() == FrequencyWeighting.WK ? " (vertical)" : " (horizontal)") + ", up to \""
                    + reaction(h.acceptable()) + "\" accepted";
        } else if (c instanceof BuildingVibration b) {
            detail = axis(b.axis()) + " base curve times " + QuantityFormat.number(b.use().factor(), 2) + " ("
                    + use(b.use()) + ")";
        } else if (c instanceof MachineSeverity m) {
            detail = machine(m.machine()) + ", zone " + m.acceptable() + " accepted (" + zone(m.acceptable()) + ")";
        } else if (c instanceof EquipmentVibration e) {
            detail = curve(e.curve()) + " curve, "
                    + DisplayUnits.format(e.curve().curve().at(e.curve().curve().lowFrequency()), Dimension.VELOCITY,
                            units)
                    + " r.m.s. in one-third-octave bands";
        } else {
            throw new IllegalStateException("bug: no words for " + c);
        }
        return family(c.kind()) + ": " + detail;
    }

    /**
     * @param c a criterion
     * @return what it measures, e.g. "r.m.s. structure acceleration, weighted Wk, the orders
     *     combined"
     */
    public static String measure(Criterion c) {
        String weighting = c.weighting().map(w -> ", weighted " + w.symbol()).orElse("");
        String orders = c.combination() == OrderCombination.TOGETHER ? "the orders combined"
                : "each order against the limit at its own frequency";
        return c.convention().label() + " " + c.quantity().label() + weighting + ", " + orders;
    }

    /**
     * @param c a criterion
     * @return its source with the standing of its values: the core's tables state, value by
     *     value, whether it was checked in a public transcription or is from memory ("verify before
     *     use as a hard limit"), and that tag is shown wherever the source is
     */
    public static String source(Criterion c) {
        return c.source();
    }

    /**
     * @param c a criterion
     * @param ids the ids of the zones a value falls in
     * @return their names, e.g. "B (unrestricted long-term operation)"; "none" for no zone
     */
    public static String zones(Criterion c, List<String> ids) {
        if (ids.isEmpty()) {
            return "none";
        }
        return String.join("; ", ids.stream().map(id -> zone(c, id)).toList());
    }

    private static String zone(Criterion c, String id) {
        if (c.kind() == CriterionKind.MACHINE) {
            return Arrays.stream(SeverityZone.values()).filter(z -> z.name().equals(id)).findFirst()
                    .map(z -> z.name() + " (" + zone(z) + ")").orElse(id);
        }
        return ComfortReaction.byId(id).map(CriterionText::reaction).orElse(words(id));
    }

    /**
     * @param z a zone of machine vibration severity
     * @return what it means (ISO 20816-1:2016, 6.3.2.3)
     */
    public static String zone(SeverityZone z) {
        return switch (z) {
            case A -> "newly commissioned";
            case B -> "unrestricted long-term operation";
            case C -> "unsatisfactory for long-term operation";
            case D -> "severe enough to cause damage";
        };
    }

    /**
     * @param r a comfort reaction
     * @return its words, e.g. "a little uncomfortable"
     */
    public static String reaction(ComfortReaction r) {
        return words(r.id());
    }

    /**
     * @param m a machine class
     * @return e.g. "group 2, rigid support"
     */
    public static String machine(MachineClass m) {
        return switch (m) {
            case GROUP_1_RIGID -> "group 1 (above 300 kW), rigid support";
            case GROUP_1_FLEXIBLE -> "group 1 (above 300 kW), flexible support";
            case GROUP_2_RIGID -> "group 2 (15 to 300 kW), rigid support";
            case GROUP_2_FLEXIBLE -> "group 2 (15 to 300 kW), flexible support";
        };
    }

    /**
     * @param a a direction in a building
     * @return its word
     */
    public static String axis(BuildingAxis a) {
        return a.id();
    }

    /**
     * @param u a room use
     * @return its words, e.g. "residential, night"
     */
    public static String use(RoomUse u) {
        return words(u.id());
    }

    /**
     * @param c a vibration criterion curve
     * @return its name, e.g. "VC-C"
     */
    public static String curve(VibrationCriterionCurve c) {
        return c.id().toUpperCase(Locale.ROOT);
    }

    private static String limit(LimitCurve curve, Dimension d, UnitSystem units) {
        if (curve.isFlat()) {
            return "at most " + DisplayUnits.format(curve.at(curve.lowFrequency()), d, units);
        }
        return "under a curve of " + curve.points().size() + " points from "
                + QuantityFormat.number(curve.lowFrequency(), 4) + " to " + QuantityFormat.number(curve.highFrequency(), 4)
                + " Hz";
    }

    /** An id as words: "residential-night" to "residential night". */
    private static String words(String id) {
        return id.replace('-', ' ');
    }
}
