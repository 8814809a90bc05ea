package org.counterpoise.core.system;

import java.util.function.DoubleUnaryOperator;
import org.counterpoise.core.rational.FactoredPeaks;
import org.counterpoise.core.rational.Peak;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.TransferFunction;

/**
 * The exact peak of a receptance |H_pq| of a {@link ModalSystem} over a band of frequencies, found
 * so that it holds for many light absorbers too.
 *
 * <p>Route. The polynomial peak search ({@link PeakFinder}) on the expanded rational H decides
 * whether the peak is unbounded (an undamped pole in the band) and gives one candidate. With three or
 * more light absorbers the expanded |H|^2 loses digits between close modes (docs/several-modes.md:
 * a peak of 8.6791 where a dense sweep finds 8.7036), so the candidates that count are evaluated on
 * the factored form ({@link AbsorberSensitivity#value}, each modal and absorber term on its own) and
 * the interior maxima are located by {@link FactoredPeaks} (sweep, poles and polynomial roots as
 * brackets, Brent's method on the factored ln |H|^2): the peak is the largest of these maxima, the
 * factored value at the polynomial candidate and the band's finite ends. Checked against dense
 * sweeps of a dense complex solve (ModalPeakTest, SpilloverTest).
 */
public final class ModalPeak {
    private ModalPeak() {
    }

    /**
     * @param system the structure with its absorbers (or none)
     * @param forcePoint where the force acts
     * @param responsePoint where the displacement is taken
     * @param low low end of the band, rad/s (&gt;= 0)
     * @param high high end, rad/s (&gt;= low; +infinity for all frequencies above low)
     * @return the peak of |H_pq| over the band, m/N (+infinity when unbounded)
     */
    public static double over(ModalSystem system, String forcePoint, String responsePoint, double low, double high) {
        TransferFunction h = system.transferFunction(forcePoint, responsePoint);
        double w = system.referenceFrequency();
        double k = system.referenceStiffness();
        double gLow = low / w;
        double gHigh = high / w;
        Peak polynomial = PeakFinder.over(h, gLow, gHigh);
        if (polynomial.unbounded() || system.absorbers().isEmpty()) {
            return polynomial.magnitude() / k;
        }
        DoubleUnaryOperator lnSquared = x -> 2 * Math.log(AbsorberSensitivity.value(system, forcePoint, responsePoint,
                Math.sqrt(x)).abs());
        double best = lnSquared.applyAsDouble(gLow * gLow);
        if (Double.isFinite(gHigh)) {
            best = Math.max(best, lnSquared.applyAsDouble(gHigh * gHigh));
        }
        if (Double.isFinite(polynomial.frequencyRatio())) {
            best = Math.max(best, lnSquared.applyAsDouble(polynomial.frequencyRatio() * polynomial.frequencyRatio()));
        }
        for (double[] maximum : FactoredPeaks.maxima(h, lnSquared, gLow * gLow, gHigh * gHigh)) {
            best = Math.max(best, maximum[2]);
        }
        return Math.exp(0.5 * best) / k;
    }
}
