package org.counterpoise.core.robust;

/**
 * Peak response over the band on a grid of two factors.
 *
 * @param rows the factor along the rows (structure mistuning), ascending
 * @param columns the factor along the columns (absorber mistuning or absorber damping), ascending
 * @param peaks peaks[i][j] at rows[i], columns[j], SI
 */
public record SensitivityMap(double[] rows, double[] columns, double[][] peaks) {

    /** Defensive copies. */
    public SensitivityMap {
        rows = rows.clone();
        columns = columns.clone();
        double[][] copy = new double[peaks.length][];
        for (int i = 0; i < peaks.length; i++) {
            copy[i] = peaks[i].clone();
        }
        peaks = copy;
    }

    @Override
    public double[][] peaks() {
        double[][] copy = new double[peaks.length][];
        for (int i = 0; i < peaks.length; i++) {
            copy[i] = peaks[i].clone();
        }
        return copy;
    }

    @Override
    public double[] rows() {
        return rows.clone();
    }

    @Override
    public double[] columns() {
        return columns.clone();
    }
}
