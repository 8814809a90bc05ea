package org.counterpoise.core.robust;

import java.util.OptionalDouble;

/**
 * The range of a frequency factor (1 = nominal) over which a design's peak response over the
 * band stays within an allowance of its nominal peak.
 *
 * @param low lowest tolerated factor (&lt;= 1); empty when the search limit was reached first, or
 *     when the range is not defined
 * @param high highest tolerated factor (&gt;= 1); empty as for {@code low}
 * @param allowance the allowed rise of the peak, as a fraction (0.1 = 10 %)
 * @param searchLimit how far each side was searched, as a fraction (0.3 = 30 %)
 * @param defined false when the nominal peak is unbounded, so a relative rise means nothing
 * @param ofBareResponse true when the nominal design cancels the response (an undamped absorber at
 *     its one speed): the range then keeps the response within the allowance times the BARE
 *     structure's response, since a rise relative to zero means nothing
 */
public record MistuningRange(OptionalDouble low, OptionalDouble high, double allowance, double searchLimit, boolean defined,
        boolean ofBareResponse) {

    /**
     * A range relative to the design's own nominal peak.
     * @param low lowest tolerated factor, empty beyond the search limit
     * @param high highest tolerated factor, empty beyond the search limit
     * @param allowance allowed rise, fraction
     * @param searchLimit searched each side, fraction
     * @param defined false when not defined
     */
    public MistuningRange(OptionalDouble low, OptionalDouble high, double allowance, double searchLimit,
            boolean defined) {
        this(low, high, allowance, searchLimit, defined, false);
    }

    /**
     * A range that is not defined (the nominal response is zero or unbounded, or misses the target).
     * @param allowance allowed rise, fraction
     * @param searchLimit searched each side, fraction
     * @return the range, with no factors
     */
    public static MistuningRange undefined(double allowance, double searchLimit) {
        return new MistuningRange(OptionalDouble.empty(), OptionalDouble.empty(), allowance, searchLimit, false);
    }
}
