package org.counterpoise.ui.cli;

import java.util.Locale;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.units.Unit;

/** The options that say what an FRF file holds and which of its lines to use, for every command reading one. */
final class FrfOptions {
    private FrfOptions() {
    }

    /**
     * @param option the option's name
     * @param kind its text, or null for accelerance (what an impact test with an accelerometer gives)
     * @return the kind
     */
    static FrfKind kind(String option, String kind) {
        if (kind == null) {
            return FrfKind.ACCELERANCE;
        }
        for (FrfKind k : FrfKind.values()) {
            if (k.id().equals(kind.strip().toLowerCase(Locale.ROOT))) {
                return k;
            }
        }
        throw new InvalidInputException(option, Converters.shown(kind), "receptance, mobility or accelerance");
    }

    /**
     * @param option the option's name
     * @param band LO:HI in Hz
     * @param all the lines read
     * @return the lines from LO to HI
     */
    static MeasuredFrf band(String option, String band, MeasuredFrf all) {
        String[] parts = band.split(":", -1);
        double[] hz = new double[2];
        try {
            if (parts.length != 2) {
                throw new NumberFormatException();
            }
            hz[0] = Converters.real(parts[0]);
            hz[1] = Converters.real(parts[1]);
        } catch (RuntimeException e) {
            throw new InvalidInputException(option, Converters.shown(band), "LO:HI in Hz, such as 15:35");
        }
        if (!(hz[0] >= 0 && hz[1] > hz[0])) {
            throw new InvalidInputException(option, Converters.shown(band), "LO:HI in Hz with 0 <= LO < HI");
        }
        try {
            return all.within(Unit.HERTZ.toSi(hz[0]), Unit.HERTZ.toSi(hz[1]));
        } catch (InvalidInputException e) {
            // too few lines left: said of the option that chose them
            throw e.renamed(option);
        }
    }
}
