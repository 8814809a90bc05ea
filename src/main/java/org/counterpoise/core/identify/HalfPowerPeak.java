package org.counterpoise.core.identify;

import org.counterpoise.core.error.InvalidInputException;

/**
 * Peak picking with the half-power bandwidth, on mobility.
 *
 * <p>For one mode the mobility is Y = 1/(c + i (m omega - k/omega)), so |Y|^2 falls to half its
 * peak 1/c^2 where m omega^2 -+ c omega - k = 0: the two half-power frequencies satisfy exactly
 * omega_2 - omega_1 = c/m = 2 zeta omega_n and omega_1 omega_2 = omega_n^2 (Ewins 2000, Modal
 * Testing, 2nd ed., section 4.2, where the method is given; the exactness on mobility is the
 * algebra above). On receptance or accelerance the same rule is biased by about zeta^2 (the peak
 * moves to omega_n sqrt(1 - 2 zeta^2) and the bandwidth changes), so the data are converted to
 * mobility first and no bias remains for one isolated mode. What remains is the frequency
 * resolution (the half-power points are interpolated linearly between lines) and the overlap of
 * neighbouring modes.
 *
 * <p>The modal mass follows from the peak line k: 1/|Y_k|^2 = m^2 ((2 zeta omega_n)^2 +
 * (omega_k - omega_n^2/omega_k)^2), exact for one mode at any line near the peak.
 */
public final class HalfPowerPeak {
    private HalfPowerPeak() {
    }

    /**
     * @param measured the measurement, any kind (converted to mobility)
     * @return the one mode whose peak is highest in the band
     * @throws InvalidInputException when the peak or its half-power points lie outside the band
     */
    public static IdentifiedMode estimate(MeasuredFrf measured) {
        MeasuredFrf y = measured.as(FrfKind.MOBILITY);
        int n = y.size();
        double[] w = y.omega();
        double[] power = new double[n];
        int k = 0;
        for (int i = 0; i < n; i++) {
            power[i] = y.value(i).abs() * y.value(i).abs();
            if (power[i] > power[k]) {
                k = i;
            }
        }
        if (k == 0 || k == n - 1) {
            throw new InvalidInputException("band", "the highest response at the band's edge",
                    "a band with the resonance peak inside it (widen the band or fit with least squares)");
        }
        // parabola through the three lines at the peak: the level the half-power points refer to
        double y0 = power[k - 1];
        double y1 = power[k];
        double y2 = power[k + 1];
        double curvature = y0 - 2.0 * y1 + y2;
        double p = curvature < 0 ? 0.5 * (y0 - y2) / curvature : 0.0;
        double half = 0.5 * Math.max(y1, y1 - 0.25 * (y0 - y2) * p);
        double below = crossing(w, power, k, -1, half);
        double above = crossing(w, power, k, +1, half);
        double wn = Math.sqrt(below * above);
        double zeta = (above - below) / (2.0 * wn);
        double detuning = w[k] - wn * wn / w[k];
        double mass = 1.0 / (Math.sqrt(power[k]) * Math.hypot(2.0 * zeta * wn, detuning));
        return IdentifiedMode.of(wn, zeta, mass);
    }

    /** The frequency where |Y|^2 falls to {@code level}, walking from the peak in {@code step}. */
    private static double crossing(double[] w, double[] power, int peak, int step, double level) {
        for (int i = peak; i + step >= 0 && i + step < w.length; i += step) {
            int j = i + step;
            if (power[j] <= level) {
                return w[i] + (w[j] - w[i]) * (power[i] - level) / (power[i] - power[j]);
            }
        }
        throw new InvalidInputException("band", "a half-power point outside the band",
                "a band reaching below and above both half-power points of the peak");
    }
}
