package org.counterpoise.core.robust;

/**
 * The range of a frequency factor (1 = nominal) over which a design's peak response over the
 * band stays within an allowance of its nominal peak.
 *
 * @param low lowest tolerated factor (&lt;= 1), or NaN when the search limit was reached first
 * @param high highest tolerated factor (&gt;= 1), or NaN when the search limit was reached first
 * @param allowance the allowed rise of the peak, as a fraction (0.1 = 10 %)
 * @param searchLimit how far each side was searched, as a fraction (0.3 = 30 %)
 * @param defined false when the nominal peak is zero or unbounded, so a relative rise means nothing
 */
public record DetuningRange(double low, double high, double allowance, double searchLimit, boolean defined) {
}
