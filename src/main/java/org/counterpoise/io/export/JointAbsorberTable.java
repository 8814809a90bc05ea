package org.counterpoise.io.export;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.optim.AbsorberSetDesign;
import org.counterpoise.core.optim.JointAbsorberOptimum;
import org.counterpoise.core.optim.JointAbsorberProblem;

/**
 * The {@code optimum --second-mode R --one-per-mode} output: per case, the joint optimum peak of the
 * two-mode structure, the sequential design's peak beside it and the gain, each absorber's mass
 * ratio, tuning ratio (to mode 1 and to its own mode) and damping ratio, joint and sequential, and
 * the certificate; as text, CSV (one line per absorber) or a JSON array (non-dimensional: X k1 / F,
 * frequency ratios g = omega / omega1). The JSON keys are the constants below and those of
 * {@link AbsorberSetTable} and {@link SpilloverTable} this output shares.
 */
public final class JointAbsorberTable {
    static final String SECOND_MODE_MASS = "second_mode_mass";
    static final String SEQUENTIAL_PEAK = "sequential_peak";
    static final String GAIN = "gain";
    static final String OWN_MASS_RATIO = "own_mass_ratio";
    static final String OWN_TUNING_RATIO = "own_tuning_ratio";
    static final String SEQUENTIAL_TUNING_RATIO = "sequential_tuning_ratio";
    static final String SEQUENTIAL_DAMPING_RATIO = "sequential_damping_ratio";
    static final String POINT = "point";

    private JointAbsorberTable() {
    }

    /**
     * @param rows the cases solved
     * @param format text, CSV or JSON
     * @return the whole output
     */
    public static String render(List<JointAbsorberOptimum> rows, OptimumTable.Format format) {
        return switch (format) {
            case TEXT -> text(rows);
            case CSV -> csv(rows);
            case JSON -> json(rows);
        };
    }

    private static String text(List<JointAbsorberOptimum> rows) {
        StringBuilder out = new StringBuilder();
        for (JointAbsorberOptimum o : rows) {
            JointAbsorberProblem p = o.problem();
            out.append(String.format(Locale.ROOT, "one absorber per mode, designed jointly: mass ratio %.6g in total,"
                    + " structure damping ratio %.6g (both modes), %s%n", p.massRatio(), p.structureDamping(),
                    AbsorberSetTable.band(p.bandLow(), p.bandHigh())));
            out.append(String.format(Locale.ROOT, "second mode at %.6g times the first, modal mass %.6g times the"
                    + " first's, shape %.6g at the first point, where the force acts and the displacement is taken (mode 1's 1)%n", p.secondModeRatio(), p.secondModeMass(),
                    p.secondModeShape()));
            p.otherPoint().ifPresent(other -> out.append(String.format(Locale.ROOT, "second point: shape values %.6g"
                    + " (mode 1) and %.6g (mode 2); absorber 1 at the %s, absorber 2 at the %s%n", other.firstModeShape(),
                    other.secondModeShape(), pointWord(p.absorberPoint(0)), pointWord(p.absorberPoint(1)))));
            out.append(String.format(Locale.ROOT, "mass split: each absorber the same mass ratio %.6g on its own mode"
                    + " (modal mass seen at its point, m/phi^2)%n", p.ownMassRatio()));
            out.append(String.format(Locale.ROOT, "peak %.12g jointly (sequential, each absorber designed on its mode"
                    + " alone: %.12g; gain %.6g)%n", o.peak(), o.sequentialPeak(), o.gain()));
            out.append(AbsorberSetTable.certificateText(o.certificate()));
            out.append(String.format(Locale.ROOT, "%-11s %-12s %-14s %-16s %-24s %-24s %s%n", AbsorberSetTable.ABSORBER,
                    AbsorberSetTable.ABSORBER_MASS_RATIO, AbsorberSetTable.TUNING_RATIO, OWN_TUNING_RATIO,
                    AbsorberSetTable.DAMPING_RATIO, SEQUENTIAL_TUNING_RATIO, SEQUENTIAL_DAMPING_RATIO));
            for (int j = 0; j < o.design().count(); j++) {
                out.append(String.format(Locale.ROOT, "%-11s %-12.6g %-14.10f %-16.10f %-24.10f %-24.10f %.10f%n",
                        (j + 1) + " (mode " + (j + 1) + ")", o.design().massRatios().get(j),
                        o.design().tuningRatios().get(j), o.design().tuningRatios().get(j) / p.modeFrequency(j),
                        o.design().dampingRatios().get(j), o.sequentialDesign().tuningRatios().get(j),
                        o.sequentialDesign().dampingRatios().get(j)));
            }
            double edge = Math.sqrt(p.secondModeRatio());
            for (int j = 0; j < o.design().count(); j++) {
                if (Math.abs(o.design().tuningRatios().get(j) / edge - 1) < 1e-9) {
                    out.append(String.format(Locale.ROOT, "absorber %d's tuning is at the edge of its mode's"
                            + " neighbourhood (sqrt(omega1 omega2) = %.6g omega1): the joint design would take it"
                            + " further, toward the other mode%n", j + 1, edge));
                }
            }
            out.append('\n');
        }
        return out.toString();
    }

    private static String csv(List<JointAbsorberOptimum> rows) {
        StringBuilder out = new StringBuilder(String.join(",", AbsorberSetTable.MASS_RATIO,
                AbsorberSetTable.STRUCTURE_DAMPING, SpilloverTable.RATIO, SECOND_MODE_MASS, SpilloverTable.SHAPE,
                AbsorberSetTable.ABSORBER, SpilloverTable.MODE, "absorber_" + AbsorberSetTable.ABSORBER_MASS_RATIO,
                OWN_MASS_RATIO, AbsorberSetTable.TUNING_RATIO, OWN_TUNING_RATIO, AbsorberSetTable.DAMPING_RATIO,
                SEQUENTIAL_TUNING_RATIO, SEQUENTIAL_DAMPING_RATIO, AbsorberSetTable.PEAK, SEQUENTIAL_PEAK, GAIN,
                AbsorberSetTable.CONVERGED)).append('\n');
        for (JointAbsorberOptimum o : rows) {
            JointAbsorberProblem p = o.problem();
            AbsorberSetDesign d = o.design();
            for (int j = 0; j < d.count(); j++) {
                out.append(String.format(Locale.ROOT, "%.17g,%.17g,%.17g,%.17g,%.17g,%d,%d,%.17g,%.17g,%.17g,%.17g,%.17g,"
                        + "%.17g,%.17g,%.17g,%.17g,%.17g,%s%n", p.massRatio(), p.structureDamping(), p.secondModeRatio(),
                        p.secondModeMass(), p.secondModeShape(), j + 1, j + 1, d.massRatios().get(j), p.ownMassRatio(),
                        d.tuningRatios().get(j), d.tuningRatios().get(j) / p.modeFrequency(j), d.dampingRatios().get(j),
                        o.sequentialDesign().tuningRatios().get(j), o.sequentialDesign().dampingRatios().get(j), o.peak(),
                        o.sequentialPeak(), o.gain(), o.certificate().certified()));
            }
        }
        return out.toString();
    }

    private static String json(List<JointAbsorberOptimum> rows) {
        JsonArray array = new JsonArray();
        for (JointAbsorberOptimum o : rows) {
            JointAbsorberProblem p = o.problem();
            JsonObject object = new JsonObject();
            JsonNumbers.put(object, AbsorberSetTable.MASS_RATIO, p.massRatio());
            JsonNumbers.put(object, AbsorberSetTable.STRUCTURE_DAMPING, p.structureDamping());
            JsonNumbers.put(object, SpilloverTable.RATIO, p.secondModeRatio());
            JsonNumbers.put(object, SECOND_MODE_MASS, p.secondModeMass());
            JsonNumbers.put(object, SpilloverTable.SHAPE, p.secondModeShape());
            JsonNumbers.put(object, SpilloverTable.LOW, p.bandLow());
            JsonNumbers.put(object, SpilloverTable.HIGH, p.bandHigh());
            JsonNumbers.put(object, AbsorberSetTable.PEAK, o.peak());
            JsonNumbers.put(object, SEQUENTIAL_PEAK, o.sequentialPeak());
            JsonNumbers.put(object, GAIN, o.gain());
            JsonArray absorbers = new JsonArray();
            for (int j = 0; j < o.design().count(); j++) {
                JsonObject a = new JsonObject();
                a.addProperty(SpilloverTable.MODE, j + 1);
                a.addProperty(POINT, pointWord(p.absorberPoint(j)).replace(' ', '_'));
                JsonNumbers.put(a, AbsorberSetTable.ABSORBER_MASS_RATIO, o.design().massRatios().get(j));
                JsonNumbers.put(a, OWN_MASS_RATIO, p.ownMassRatio());
                JsonNumbers.put(a, AbsorberSetTable.TUNING_RATIO, o.design().tuningRatios().get(j));
                JsonNumbers.put(a, OWN_TUNING_RATIO, o.design().tuningRatios().get(j) / p.modeFrequency(j));
                JsonNumbers.put(a, AbsorberSetTable.DAMPING_RATIO, o.design().dampingRatios().get(j));
                JsonNumbers.put(a, SEQUENTIAL_TUNING_RATIO, o.sequentialDesign().tuningRatios().get(j));
                JsonNumbers.put(a, SEQUENTIAL_DAMPING_RATIO, o.sequentialDesign().dampingRatios().get(j));
                absorbers.add(a);
            }
            object.add(AbsorberSetTable.ABSORBER, absorbers);
            AbsorberSetTable.certify(object, o.certificate());
            array.add(object);
        }
        return JsonNumbers.write(array);
    }

    /** @return "first point" (the force's, where the displacement is taken) or "second point" */
    private static String pointWord(String point) {
        return point.equals(JointAbsorberProblem.OTHER_POINT) ? "second point" : "first point";
    }
}
