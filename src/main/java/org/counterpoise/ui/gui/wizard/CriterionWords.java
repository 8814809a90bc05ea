package org.counterpoise.ui.gui.wizard;

import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.BuildingAxis;
import org.counterpoise.core.criteria.ComfortReaction;
import org.counterpoise.core.criteria.CriterionKind;
import org.counterpoise.core.criteria.FrequencyWeighting;
import org.counterpoise.core.criteria.MachineClass;
import org.counterpoise.core.criteria.RoomUse;
import org.counterpoise.core.criteria.SeverityZone;
import org.counterpoise.core.criteria.VibrationCriterionCurve;
import org.counterpoise.io.text.QuantityFormat;

/**
 * The wizard's words for the choices of an acceptance criterion, in one place: the lists show
 * these (the lists hold the enums), so switching to the reports' words is a change here only.
 */
final class CriterionWords {
    private CriterionWords() {
    }

    /** @param k a family @return its name in a list */
    static String of(CriterionKind k) {
        return switch (k) {
            case USER_LIMIT -> "a limit I state";
            case HUMAN_COMFORT -> "human comfort, ISO 2631-1";
            case BUILDING -> "people in a building, ISO 10137";
            case MACHINE -> "machine, ISO 20816-3";
            case EQUIPMENT -> "sensitive equipment, VC curves";
        };
    }

    /** @param c a convention @return its name in a list */
    static String of(AmplitudeConvention c) {
        return switch (c) {
            case PEAK -> "peak (amplitude)";
            case RMS -> "r.m.s.";
            case PEAK_TO_PEAK -> "peak-to-peak";
        };
    }

    /** @param w a weighting @return its name in a list */
    static String of(FrequencyWeighting w) {
        return switch (w) {
            case WK -> "Wk, vertical";
            case WD -> "Wd, horizontal";
            case WM -> "Wm, in buildings";
        };
    }

    /** @param r a comfort reaction @return its name in a list, with its range */
    static String of(ComfortReaction r) {
        String words = switch (r) {
            case NOT_UNCOMFORTABLE -> "not uncomfortable";
            case A_LITTLE_UNCOMFORTABLE -> "a little uncomfortable";
            case FAIRLY_UNCOMFORTABLE -> "fairly uncomfortable";
            case UNCOMFORTABLE -> "uncomfortable";
            case VERY_UNCOMFORTABLE -> "very uncomfortable";
            case EXTREMELY_UNCOMFORTABLE -> "extremely uncomfortable";
        };
        return words + "  (up to " + number(r.upper()) + " m/s\u00b2)";
    }

    /** @param a a direction in a building @return its name in a list */
    static String of(BuildingAxis a) {
        return switch (a) {
            case VERTICAL -> "vertical (z, foot to head)";
            case HORIZONTAL -> "horizontal (x, y)";
        };
    }

    /** @param u a room use @return its name in a list, with its factor */
    static String of(RoomUse u) {
        String words = switch (u) {
            case CRITICAL_WORK_AREA -> "critical work area (operating theatre, precision lab)";
            case RESIDENTIAL_NIGHT -> "residential, night";
            case RESIDENTIAL_DAY -> "residential, day";
            case QUIET_OFFICE -> "quiet office";
            case GENERAL_OFFICE -> "general office";
            case WORKSHOP -> "workshop";
        };
        return words + "  (\u00d7" + number(u.factor()) + ")";
    }

    /** @param m a machine group and support @return its name in a list */
    static String of(MachineClass m) {
        return switch (m) {
            case GROUP_1_RIGID -> "group 1, rigid (300 kW to 50 MW)";
            case GROUP_1_FLEXIBLE -> "group 1, flexible (300 kW to 50 MW)";
            case GROUP_2_RIGID -> "group 2, rigid (15 to 300 kW)";
            case GROUP_2_FLEXIBLE -> "group 2, flexible (15 to 300 kW)";
        };
    }

    /** @param z an evaluation zone @return its name in a list */
    static String of(SeverityZone z) {
        return switch (z) {
            case A -> "A: newly commissioned";
            case B -> "B: long-term operation";
            case C -> "C: limited periods only";
            case D -> "D: may cause damage";
        };
    }

    /** @param c a vibration criterion curve @return its name in a list, with its level */
    static String of(VibrationCriterionCurve c) {
        return c.name().replace('_', '-') + "  (" + number(c.curve().points().get(0).limit() * 1e6) + " \u00b5m/s)";
    }

    /**
     * Where the values of a family's table stand (reference/acceptance-criteria.md tags them): said
     * beside the limit, so nobody takes a value from memory for a certified one.
     *
     * @param k a family
     * @return a caution, or empty when the table was transcribed from the published source
     */
    static String caution(CriterionKind k) {
        return switch (k) {
            case USER_LIMIT, MACHINE -> "";
            case HUMAN_COMFORT -> "The intermediate comfort ranges are from memory: check them against the standard.";
            case BUILDING -> "The base curves and factors are from memory: check them against the standard.";
            case EQUIPMENT -> "The curve levels are from memory: check them against the published curves.";
        };
    }

    private static String number(double v) {
        return QuantityFormat.number(v, 3);
    }
}
