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
import org.counterpoise.io.text.CriterionText;
import org.counterpoise.io.text.QuantityFormat;

/**
 * The wizard's lists of criterion choices in words: the reports' words ({@link CriterionText}, the
 * one place they are written) with, where a choice is a number from a table, that number beside
 * it, so a user choosing sees what the choice means.
 */
final class CriterionWords {
    private CriterionWords() {
    }

    /** @param k a family @return its name in a list */
    static String of(CriterionKind k) {
        return CriterionText.family(k);
    }

    /** @param c a convention @return its name in a list */
    static String of(AmplitudeConvention c) {
        return c == AmplitudeConvention.PEAK ? "peak (amplitude)" : c.label();
    }

    /** @param w a weighting @return its name in a list */
    static String of(FrequencyWeighting w) {
        return w.symbol() + (w == FrequencyWeighting.WK ? ", vertical" : ", horizontal");
    }

    /** @param r a comfort reaction @return its name in a list, with its range */
    static String of(ComfortReaction r) {
        return CriterionText.reaction(r) + "  (up to " + QuantityFormat.number(r.upper(), 3) + " m/s\u00b2)";
    }

    /** @param a a direction in a building @return its name in a list */
    static String of(BuildingAxis a) {
        return CriterionText.axis(a);
    }

    /** @param u a room use @return its name in a list, with its factor */
    static String of(RoomUse u) {
        return CriterionText.use(u) + "  (\u00d7" + QuantityFormat.number(u.factor(), 3) + ")";
    }

    /** @param m a machine group and support @return its name in a list */
    static String of(MachineClass m) {
        return CriterionText.machine(m);
    }

    /** @param z an evaluation zone @return its name in a list */
    static String of(SeverityZone z) {
        return z.name() + ": " + CriterionText.zone(z);
    }

    /** @param c a vibration criterion curve @return its name in a list, with its level */
    static String of(VibrationCriterionCurve c) {
        return CriterionText.curve(c) + "  (" + QuantityFormat.number(c.curve().points().get(0).limit() * 1e6, 3)
                + " \u00b5m/s)";
    }
}
