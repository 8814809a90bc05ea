package org.counterpoise.io.measurement;

import java.nio.file.Path;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.units.Unit;

/**
 * Reads a measured FRF from CSV (see {@link MeasurementTable} for the layout). Columns are found
 * by the start of their name, any case: frequency in Hz ("freq...", else the first column); either
 * real and imaginary parts ("re...", "im...") or magnitude and phase in degrees ("mag..." or
 * "abs...", "phase..."); optionally the coherence ("coh...", 0 to 1). Values are in the
 * {@link FrfUnit} given. A first line at 0 Hz, as spectrum exports have, is left out.
 */
public final class FrfCsv {
    private FrfCsv() {
    }

    /**
     * @param path the file
     * @param unit the kind and unit of the values
     * @return the measurement, SI
     * @throws InvalidInputException naming the file, line and column of what is wrong
     */
    public static MeasuredFrf read(Path path, FrfUnit unit) {
        MeasurementTable t = MeasurementTable.read(path, "FRF file (.csv)");
        int frequency = Math.max(0, t.column("freq"));
        int re = t.column("re");
        int im = t.column("im");
        int mag = t.column("mag", "abs");
        int phase = t.column("phase");
        int coh = t.column("coh");
        boolean parts = re >= 0 && im >= 0;
        if (!parts && !(mag >= 0 && phase >= 0)) {
            throw new InvalidInputException(t.file() + ", header", String.join(",", t.header()),
                    "columns frequency_Hz and either real,imag or magnitude,phase_deg (optionally coherence)");
        }
        // the 0 Hz line that spectrum exports begin with carries no FRF (no motion at zero frequency): left out
        int first = t.rows().get(0)[frequency] == 0.0 ? 1 : 0;
        int n = t.rows().size() - first;
        double[] omega = new double[n];
        double[] real = new double[n];
        double[] imaginary = new double[n];
        double[] coherence = new double[coh >= 0 ? n : 0];
        double scale = unit.toSi();
        for (int i = 0; i < n; i++) {
            int line = i + first;
            double[] row = t.rows().get(line);
            double f = row[frequency];
            if (!(f > 0)) {
                throw new InvalidInputException(t.where(line, frequency), Checks.show(f),
                        "a frequency in Hz above 0 (a 0 Hz line is read only as the first line, and left out)");
            }
            if (i > 0 && !(Unit.HERTZ.toSi(f) > omega[i - 1])) {
                throw new InvalidInputException(t.where(line, frequency), Checks.show(f),
                        "frequencies increasing from line to line, each once");
            }
            omega[i] = Unit.HERTZ.toSi(f);
            if (parts) {
                real[i] = row[re] * scale;
                imaginary[i] = row[im] * scale;
            } else {
                if (row[mag] < 0) {
                    throw new InvalidInputException(t.where(line, mag), Checks.show(row[mag]), "a magnitude of 0 or more");
                }
                double radians = Math.toRadians(row[phase]);
                real[i] = row[mag] * Math.cos(radians) * scale;
                imaginary[i] = row[mag] * Math.sin(radians) * scale;
            }
            if (coh >= 0) {
                if (!(row[coh] >= 0 && row[coh] <= 1)) {
                    throw new InvalidInputException(t.where(line, coh), Checks.show(row[coh]), "a coherence from 0 to 1");
                }
                coherence[i] = row[coh];
            }
        }
        if (n < MeasuredFrf.MINIMUM_POINTS) {
            throw InvalidInputException.unusable(t.file(), "holds " + n + " data line" + (n == 1 ? "" : "s")
                    + (first == 1 ? " besides its 0 Hz line (left out: no motion at zero frequency)" : ""),
                    "at least " + MeasuredFrf.MINIMUM_POINTS + " frequency lines");
        }
        return new MeasuredFrf(omega, real, imaginary, coherence, unit.kind());
    }
}
