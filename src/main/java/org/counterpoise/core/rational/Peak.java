package org.counterpoise.core.rational;

/**
 * The largest magnitude of a response over a range of frequencies.
 *
 * @param frequencyRatio where it occurs, g = omega/omega1 (for an unbounded peak: where the
 *     response grows without bound; 0 or +infinity at the range ends)
 * @param magnitude the peak magnitude; +infinity when unbounded
 */
public record Peak(double frequencyRatio, double magnitude) {

    /** @return true when the response has no finite maximum in the range */
    public boolean unbounded() {
        return Double.isInfinite(magnitude);
    }
}
