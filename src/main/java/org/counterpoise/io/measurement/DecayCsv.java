package org.counterpoise.io.measurement;

import java.nio.file.Path;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * Reads a free-decay record from CSV (see {@link MeasurementTable} for the layout): time in s in
 * the first column ("time..." or "t" if named so), the response (any unit) in the next.
 */
public final class DecayCsv {
    private DecayCsv() {
    }

    /**
     * @param path the file
     * @return {times, responses}
     */
    public static double[][] read(Path path) {
        MeasurementTable t = MeasurementTable.read(path, "decay file (.csv)");
        if (t.header().size() < 2) {
            throw new InvalidInputException(t.file() + ", header", String.join(",", t.header()),
                    "two columns: time_s and the response");
        }
        int time = Math.max(0, t.column("time", "t"));
        int response = time == 0 ? 1 : 0;
        int n = t.rows().size();
        double[][] tx = new double[2][n];
        for (int i = 0; i < n; i++) {
            tx[0][i] = t.rows().get(i)[time];
            tx[1][i] = t.rows().get(i)[response];
            if (i > 0 && !(tx[0][i] > tx[0][i - 1])) {
                throw new InvalidInputException(t.where(i, time), Checks.show(tx[0][i]),
                        "times increasing from line to line");
            }
        }
        return tx;
    }
}
