package org.counterpoise.io.measurement;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.counterpoise.core.commission.OperatingSpectrum;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;

/**
 * Reads an operating response spectrum from CSV (see {@link MeasurementTable} for the layout):
 * frequency in Hz in the first column (or the one named "freq..."), the amplitude of each line in
 * the next (or the one named "amp..."), in a unit of displacement, velocity or acceleration, stated
 * as a peak, r.m.s. or peak-to-peak value. A 0 Hz first line is left out.
 */
public final class SpectrumCsv {
    /** The quantities a spectrum may hold, each with the unit dimension that says so. */
    private static final List<ResponseKind> QUANTITIES =
            List.of(ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY, ResponseKind.ACCELERATION);

    private SpectrumCsv() {
    }

    /**
     * @param text a unit symbol of displacement, velocity or acceleration
     * @param field the option or field it came from
     * @return the unit
     */
    public static Unit unit(String text, String field) {
        for (ResponseKind kind : QUANTITIES) {
            Optional<Unit> unit = Unit.find(text.strip(), kind.dimension());
            if (unit.isPresent()) {
                return unit.get();
            }
        }
        throw new InvalidInputException(field, text, "a unit of displacement (" + Unit.symbolsOf(Dimension.LENGTH)
                + "), velocity (" + Unit.symbolsOf(Dimension.VELOCITY) + ") or acceleration ("
                + Unit.symbolsOf(Dimension.ACCELERATION) + ")");
    }

    /**
     * @param path the file
     * @param unit the unit of the amplitudes (it says which quantity they are)
     * @param convention how the amplitudes are stated
     * @return the spectrum, SI, amplitudes as peaks
     */
    public static OperatingSpectrum read(Path path, Unit unit, AmplitudeConvention convention) {
        ResponseKind kind = QUANTITIES.stream().filter(k -> k.dimension() == unit.dimension()).findFirst()
                .orElseThrow(() -> new InvalidInputException("spectrum unit", unit.symbol(),
                        "a unit of displacement, velocity or acceleration"));
        MeasurementTable t = MeasurementTable.read(path, "spectrum file (.csv)");
        if (t.header().size() < 2) {
            throw new InvalidInputException(t.file() + ", header", String.join(",", t.header()),
                    "two columns: frequency_Hz and the amplitude");
        }
        int frequency = Math.max(0, t.column("freq"));
        int named = t.column("amp", "val", "mag");
        int amplitude = named >= 0 ? named : frequency == 0 ? 1 : 0;
        double toPeak = 1.0 / convention.ofHarmonic(1.0);
        int first = t.rows().get(0)[frequency] == 0.0 ? 1 : 0;
        int n = t.rows().size() - first;
        double[] omega = new double[n];
        double[] peak = new double[n];
        for (int i = 0; i < n; i++) {
            int line = i + first;
            double[] row = t.rows().get(line);
            double f = row[frequency];
            if (!(f > 0) || (i > 0 && !(Unit.HERTZ.toSi(f) > omega[i - 1]))) {
                throw new InvalidInputException(t.where(line, frequency), Checks.show(f),
                        "frequencies in Hz above 0, increasing from line to line, each once");
            }
            if (!(row[amplitude] >= 0)) {
                throw new InvalidInputException(t.where(line, amplitude), Checks.show(row[amplitude]),
                        "an amplitude of 0 or more");
            }
            omega[i] = Unit.HERTZ.toSi(f);
            peak[i] = unit.toSi(row[amplitude]) * toPeak;
        }
        if (n < OperatingSpectrum.MINIMUM_LINES) {
            throw InvalidInputException.unusable(t.file(), "holds " + n + " data line" + (n == 1 ? "" : "s")
                    + (first == 1 ? " besides its 0 Hz line (left out: no motion at zero frequency)" : ""),
                    "at least " + OperatingSpectrum.MINIMUM_LINES + " frequency lines");
        }
        return new OperatingSpectrum(omega, peak, kind);
    }
}
