package org.counterpoise.core.optim;

import java.util.Locale;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.response.TransferFunctions;
import org.counterpoise.core.response.TuningSensitivity;

/**
 * One non-dimensional absorber optimisation problem: an excitation and response pair, a mass
 * ratio, the structure's damping ratio and the band of frequency ratios g it applies to. The
 * design variables are the tuning ratio f and the absorber damping ratio zeta_a; either may be
 * held fixed (a given spring, a given damper).
 *
 * @param excitation excitation kind
 * @param response response kind (a response of the structure, or the stroke)
 * @param massRatio mu &gt; 0
 * @param structureDamping zeta1 &gt;= 0
 * @param bandLow lowest frequency ratio g (&gt;= 0)
 * @param bandHigh highest frequency ratio g (&gt; bandLow; +infinity for all frequencies)
 * @param fixedTuning a fixed tuning ratio f, or NaN when f is free
 * @param fixedDamping a fixed absorber damping ratio, or NaN when zeta_a is free
 * @param strokeLimit the largest allowed peak absorber stroke over the run-up [0, strokeTop],
 *     non-dimensional (divided by the reference length of ResponseScale), or NaN for no limit
 * @param strokeTop the top of the frequency ratios the stroke limit covers: every machine passes
 *     through the lower coupled frequency as it starts and stops, so the limit holds from zero
 *     frequency up to this (the top of the band, or the one forcing frequency); NaN without a limit
 */
public record PeakProblem(ExcitationKind excitation, ResponseKind response, double massRatio,
        double structureDamping, double bandLow, double bandHigh, double fixedTuning, double fixedDamping,
        double strokeLimit, double strokeTop) {

    /**
     * A problem without a stroke limit.
     * @param excitation excitation kind
     * @param response response kind
     * @param massRatio mu
     * @param structureDamping zeta1
     * @param bandLow lowest g
     * @param bandHigh highest g
     * @param fixedTuning fixed f or NaN
     * @param fixedDamping fixed zeta_a or NaN
     */
    public PeakProblem(ExcitationKind excitation, ResponseKind response, double massRatio, double structureDamping,
            double bandLow, double bandHigh, double fixedTuning, double fixedDamping) {
        this(excitation, response, massRatio, structureDamping, bandLow, bandHigh, fixedTuning, fixedDamping,
                Double.NaN, Double.NaN);
    }

    /** Validates the problem; each message names the option a user sets. */
    public PeakProblem {
        Checks.present("excitation", excitation, "an excitation kind");
        Checks.present("response", response, "a response kind");
        Checks.inOpenRange("mass ratio", massRatio, 0.0, 10.0);
        Checks.inRange("structure damping", structureDamping, 0.0, 0.99);
        checkBand(bandLow, bandHigh);
        if (!Double.isNaN(fixedTuning)) {
            Checks.inOpenRange("fixed tuning ratio", fixedTuning, 0.0, 100.0);
        }
        if (!Double.isNaN(fixedDamping)) {
            Checks.inRange("fixed absorber damping ratio", fixedDamping, 0.0, 10.0);
        }
        if (!Double.isNaN(strokeLimit)) {
            Checks.positive("stroke limit", strokeLimit);
            if (!(strokeTop > 0)) {
                throw new InvalidInputException("stroke limit", Checks.show(strokeTop),
                        "the run-up range of a stroke limit must end above zero frequency");
            }
        }
        if (response == ResponseKind.STROKE || response.needsAbsorber()) {
            throw new InvalidInputException("response", response.name().toLowerCase(Locale.ROOT),
                    "the absorber's own stroke or force has no minimum-peak design: it falls towards zero as the"
                            + " absorber damping grows and the absorber locks; use a response of the structure"
                            + " and limit the stroke instead");
        }
    }

    /**
     * The one check of a band of frequency ratios, for every non-dimensional problem.
     *
     * @param bandLow lowest g
     * @param bandHigh highest g
     */
    static void checkBand(double bandLow, double bandHigh) {
        if (!(bandLow >= 0) || Double.isInfinite(bandLow)) {
            throw new InvalidInputException("band", Checks.show(bandLow), "the low end must be a finite number of 0 or more");
        }
        if (!(bandHigh > bandLow)) {
            throw new InvalidInputException("band", Checks.show(bandLow) + ":" + Checks.show(bandHigh),
                    "the high end must be greater than the low end (an empty band has no peak)");
        }
    }

    /**
     * A band, both design variables free and no stroke limit (the way in from other packages: the
     * NaN that marks a free variable stays inside {@code core.optim}).
     * @param excitation excitation kind
     * @param response response kind
     * @param massRatio mu
     * @param structureDamping zeta1
     * @param bandLow lowest g
     * @param bandHigh highest g (+infinity for all frequencies)
     * @return the problem
     */
    public static PeakProblem free(ExcitationKind excitation, ResponseKind response, double massRatio,
            double structureDamping, double bandLow, double bandHigh) {
        return new PeakProblem(excitation, response, massRatio, structureDamping, bandLow, bandHigh, Double.NaN,
                Double.NaN);
    }

    /**
     * All frequencies, both design variables free.
     * @param excitation excitation kind
     * @param response response kind
     * @param massRatio mu
     * @param structureDamping zeta1
     * @return the problem
     */
    public static PeakProblem allFrequencies(ExcitationKind excitation, ResponseKind response, double massRatio,
            double structureDamping) {
        return new PeakProblem(excitation, response, massRatio, structureDamping, 0.0, Double.POSITIVE_INFINITY,
                Double.NaN, Double.NaN);
    }

    /**
     * @param f fixed tuning ratio
     * @return this problem with the tuning held at f
     */
    public PeakProblem withFixedTuning(double f) {
        return new PeakProblem(excitation, response, massRatio, structureDamping, bandLow, bandHigh, f, fixedDamping,
                strokeLimit, strokeTop);
    }

    /**
     * @param zeta fixed absorber damping ratio
     * @return this problem with the damping held at zeta
     */
    public PeakProblem withFixedDamping(double zeta) {
        return new PeakProblem(excitation, response, massRatio, structureDamping, bandLow, bandHigh, fixedTuning, zeta,
                strokeLimit, strokeTop);
    }

    /**
     * @param mu another mass ratio
     * @return this problem with that mass ratio
     */
    public PeakProblem withMassRatio(double mu) {
        return new PeakProblem(excitation, response, mu, structureDamping, bandLow, bandHigh, fixedTuning, fixedDamping,
                strokeLimit, strokeTop);
    }

    /**
     * @param limit largest allowed non-dimensional peak stroke over the run-up [0, bandHigh] (NaN: none)
     * @return this problem with that stroke limit, over zero frequency up to the top of the band
     */
    public PeakProblem withStrokeLimit(double limit) {
        return withStrokeLimit(limit, bandHigh);
    }

    /**
     * @param limit largest allowed non-dimensional peak stroke over the run-up [0, top] (NaN: none)
     * @param top the highest frequency ratio of the run-up (the top of the band, or the one
     *     forcing frequency when the band of the peak is wider)
     * @return this problem with that stroke limit
     */
    public PeakProblem withStrokeLimit(double limit, double top) {
        return new PeakProblem(excitation, response, massRatio, structureDamping, bandLow, bandHigh, fixedTuning,
                fixedDamping, limit, Double.isNaN(limit) ? Double.NaN : top);
    }

    /** @return true when the problem has a stroke limit */
    public boolean hasStrokeLimit() {
        return !Double.isNaN(strokeLimit);
    }

    /**
     * @param f tuning ratio
     * @param zeta absorber damping ratio
     * @return the peak non-dimensional stroke over the run-up [0, strokeTop] for the design (f, zeta)
     *     (fixed values override); +infinity where it is unbounded
     */
    public double strokePeak(double f, double zeta) {
        return PeakFinder.over(strokeTransferFunction(f, zeta), 0.0, strokeTop).magnitude();
    }

    /**
     * @param f tuning ratio
     * @param zeta absorber damping ratio
     * @return the absorber stroke's transfer function for the design (f, zeta) (fixed values override)
     */
    public TransferFunction strokeTransferFunction(double f, double zeta) {
        return TransferFunctions.of(excitation, ResponseKind.STROKE, structureDamping, tuning(f, zeta));
    }

    /**
     * @param f tuning ratio
     * @param zeta absorber damping ratio
     * @return exact derivatives of ln|stroke|^2 in f and zeta_a for the design (f, zeta)
     */
    public TuningSensitivity strokeSensitivity(double f, double zeta) {
        return TransferFunctions.sensitivity(excitation, ResponseKind.STROKE, structureDamping, tuning(f, zeta));
    }

    /**
     * Relative round-off within which a stroke on its limit counts as on it, not over it: the
     * optimiser holds the run-up stroke at the limit to this, and a check of a design against its
     * limit (in SI, after the conversion) must allow it too.
     */
    public static final double STROKE_LIMIT_ROUND_OFF = 1e-9;

    /**
     * The largest absorber damping ratio any optimiser considers: beyond it the absorber is
     * practically locked to the structure (a plain added mass), so nothing is lost.
     */
    public static final double MAX_DAMPING = 4.0;

    /**
     * The lowest tuning ratio searched: 0.05 times the lower of 1 and the band's low end (the band's
     * low end is replaced by 1 when the band starts at zero frequency). Below it the absorber's
     * spring is so soft that it barely couples to the structure at any forcing frequency: such an
     * absorber does nothing, and must never be reported as an optimum.
     *
     * @return the lowest tuning ratio of the search box
     */
    public double minTuning() {
        double reference = bandLow > 0 ? Math.min(1.0, bandLow) : 1.0;
        return 0.05 * reference;
    }

    /**
     * The highest tuning ratio searched: 5 times the larger of 1 and the top of the band (the low
     * end for an open band), at most 50. Above it the absorber is practically rigid over the band.
     *
     * @return the highest tuning ratio of the search box
     */
    public double maxTuning() {
        double top = Double.isFinite(bandHigh) ? bandHigh : bandLow;
        return Math.min(50.0, 5.0 * Math.max(1.0, top));
    }

    /**
     * @param f tuning ratio
     * @param zeta absorber damping ratio
     * @return true when (f, zeta) lies in the search box (fixed values are taken as given)
     */
    public boolean inBox(double f, double zeta) {
        boolean tuningOk = !Double.isNaN(fixedTuning) || (f >= minTuning() * (1 - 1e-12) && f <= maxTuning() * (1 + 1e-12));
        boolean dampingOk = !Double.isNaN(fixedDamping) || (zeta >= 0 && zeta <= MAX_DAMPING);
        return tuningOk && dampingOk;
    }

    /** @return true when the band covers all frequencies */
    public boolean allFrequencies() {
        return bandLow == 0.0 && Double.isInfinite(bandHigh);
    }

    /**
     * @param f tuning ratio
     * @param zeta absorber damping ratio
     * @return the transfer function of the design (f, zeta) (fixed values override)
     */
    public TransferFunction transferFunction(double f, double zeta) {
        return TransferFunctions.of(excitation, response, structureDamping, tuning(f, zeta));
    }

    /**
     * @param f tuning ratio
     * @param zeta absorber damping ratio
     * @return exact derivatives of ln|H|^2 in f and zeta_a for the design (f, zeta)
     */
    public TuningSensitivity sensitivity(double f, double zeta) {
        return TransferFunctions.sensitivity(excitation, response, structureDamping, tuning(f, zeta));
    }

    /**
     * @param f tuning ratio
     * @param zeta absorber damping ratio
     * @return the tuning, with fixed values applied
     */
    public Tuning tuning(double f, double zeta) {
        return new Tuning(massRatio, Double.isNaN(fixedTuning) ? f : fixedTuning,
                Double.isNaN(fixedDamping) ? zeta : fixedDamping);
    }
}
