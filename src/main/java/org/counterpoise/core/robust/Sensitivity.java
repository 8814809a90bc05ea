package org.counterpoise.core.robust;

import java.util.stream.IntStream;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.Absorber;

/**
 * Sensitivity of a design to mistuning: the exact peak over the band as the structure's natural
 * frequency, the absorber's natural frequency or the absorber's damping moves off nominal, and
 * maps over two of them. Rows of a map are computed in parallel.
 */
public final class Sensitivity {
    private Sensitivity() {
    }

    /**
     * @param m the mistuning model
     * @param absorber the absorber
     * @param range largest mistuning each side, fraction (0.15 = 15 %)
     * @param points number of factors (odd keeps the nominal on the grid)
     * @return peak against the structure's frequency factor
     */
    public static SensitivityCurve structure(Mistuning m, Absorber absorber, double range, int points) {
        double[] f = factors(range, points);
        return new SensitivityCurve(f, IntStream.range(0, f.length).parallel()
                .mapToDouble(i -> m.peak(absorber, f[i], 1.0)).toArray());
    }

    /**
     * @param m the mistuning model
     * @param absorber the absorber
     * @param range largest mistuning each side, fraction
     * @param points number of factors
     * @return peak against the absorber's frequency factor
     */
    public static SensitivityCurve absorberFrequency(Mistuning m, Absorber absorber, double range, int points) {
        double[] f = factors(range, points);
        return new SensitivityCurve(f, IntStream.range(0, f.length).parallel()
                .mapToDouble(i -> m.peak(absorber, 1.0, f[i])).toArray());
    }

    /**
     * @param m the mistuning model
     * @param absorber the absorber
     * @param range largest change each side, fraction (damping factors from 1-range to 1+range)
     * @param points number of factors
     * @return peak against the absorber damping coefficient's factor
     */
    public static SensitivityCurve absorberDamping(Mistuning m, Absorber absorber, double range, int points) {
        double[] f = factors(range, points);
        return new SensitivityCurve(f, IntStream.range(0, f.length).parallel()
                .mapToDouble(i -> m.peak(m.structure(), withDamping(absorber, f[i]))).toArray());
    }

    /**
     * @param m the mistuning model
     * @param absorber the absorber
     * @param structureRange structure mistuning each side (rows)
     * @param absorberRange absorber mistuning each side (columns)
     * @param points grid points along each axis
     * @return peak over structure mistuning x absorber mistuning
     */
    public static SensitivityMap structureByAbsorber(Mistuning m, Absorber absorber, double structureRange,
            double absorberRange, int points) {
        double[] rows = factors(structureRange, points);
        double[] cols = factors(absorberRange, points);
        double[][] z = IntStream.range(0, rows.length).parallel().mapToObj(i -> {
            double[] row = new double[cols.length];
            for (int j = 0; j < cols.length; j++) {
                row[j] = m.peak(absorber, rows[i], cols[j]);
            }
            return row;
        }).toArray(double[][]::new);
        return new SensitivityMap(rows, cols, z);
    }

    private static Absorber withDamping(Absorber a, double factor) {
        return new Absorber(a.mass(), a.stiffness(), a.damping() * factor);
    }

    static double[] factors(double range, int points) {
        Checks.inRange("robustness range", range, 0.0, 0.9);
        if (points < 2) {
            throw new IllegalArgumentException("need at least two points");
        }
        double[] f = new double[points];
        for (int i = 0; i < points; i++) {
            f[i] = 1.0 - range + 2.0 * range * i / (points - 1);
        }
        return f;
    }
}
