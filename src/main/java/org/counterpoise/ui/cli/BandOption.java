package org.counterpoise.ui.cli;

import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.PlainText;
import picocli.CommandLine;

/** The optimum command's --band: LO:HI in frequency ratios (HI may be inf), within what the search can tune to. */
final class BandOption {
    private BandOption() {
    }

    /** The largest low end of --band taken (frequency ratio). */
    static final double MAX_BAND_LOW = 10;
    /** The largest finite high end of --band taken (frequency ratio). */
    static final double MAX_BAND_HIGH = 100;

    /**
     * @param text the option's value, or null when not given
     * @return {LO, HI}; {0, +infinity} when not given
     */
    static double[] parse(String text) {
        if (text == null) {
            return new double[] {0.0, Double.POSITIVE_INFINITY};
        }
        String[] parts = text.split(":", -1);
        if (parts.length != 2) {
            throw new InvalidInputException("--band", PlainText.quote(text),
                    "LO:HI, two frequency ratios such as 0.9:1.1 (HI may be inf)");
        }
        double lo = number(parts[0]);
        double hi = parts[1].strip().equalsIgnoreCase("inf") ? Double.POSITIVE_INFINITY
                : number(parts[1]);
        if (!(lo >= 0) || !(hi > lo)) {
            throw new InvalidInputException("--band", PlainText.quote(text),
                    "needs 0 <= LO < HI (an empty band has no peak)");
        }
        // the search takes absorber tunings up to 50 times the structure's frequency (PeakProblem.maxTuning):
        // a band far above that has no absorber to tune to it
        if (lo > MAX_BAND_LOW || (hi > MAX_BAND_HIGH && !Double.isInfinite(hi))) {
            throw new InvalidInputException("--band", PlainText.quote(text), "frequency ratios with LO at most "
                    + (int) MAX_BAND_LOW + " and HI at most " + (int) MAX_BAND_HIGH + " (or inf): the absorber's tuning"
                    + " is searched up to 50 times the structure's natural frequency");
        }
        return new double[] {lo, hi};
    }

    private static double number(String text) {
        try {
            return Converters.real(text);
        } catch (CommandLine.TypeConversionException e) {
            throw new InvalidInputException("--band", Converters.shown(text), e.getMessage());
        }
    }
}
