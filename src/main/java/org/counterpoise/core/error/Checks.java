package org.counterpoise.core.error;

/** The one home of precondition checks; each failure names the field, the value and the range. */
public final class Checks {
    private Checks() {
    }

    /**
     * @param field field id
     * @param value value to check
     * @return the value when it is finite and strictly positive
     */
    public static double positive(String field, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new InvalidInputException(field, show(value), "must be a finite number greater than 0");
        }
        return value;
    }

    /**
     * @param field field id
     * @param value value to check
     * @return the value when it is finite and not negative
     */
    public static double nonNegative(String field, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new InvalidInputException(field, show(value), "must be a finite number of 0 or more");
        }
        return value;
    }

    /**
     * @param field field id
     * @param value value to check
     * @param low lowest allowed value (inclusive)
     * @param high highest allowed value (inclusive)
     * @return the value when it lies in [low, high]
     */
    public static double inRange(String field, double value, double low, double high) {
        if (!(value >= low && value <= high)) {
            throw new InvalidInputException(field, show(value),
                    "must lie between " + show(low) + " and " + show(high));
        }
        return value;
    }

    /**
     * @param field field id
     * @param value value to check
     * @param low lower bound (exclusive)
     * @param high upper bound (exclusive)
     * @return the value when it lies in (low, high)
     */
    public static double inOpenRange(String field, double value, double low, double high) {
        if (!(value > low && value < high)) {
            throw new InvalidInputException(field, show(value),
                    "must lie strictly between " + show(low) + " and " + show(high));
        }
        return value;
    }

    /**
     * @param field field id
     * @param value object that must be present
     * @param allowed what is expected
     * @param <T> type
     * @return the value
     */
    public static <T> T present(String field, T value, String allowed) {
        if (value == null) {
            throw InvalidInputException.missing(field, allowed);
        }
        return value;
    }

    /**
     * Shows a number the way a user typed it, without a trailing ".0".
     * @param value the number
     * @return text
     */
    public static String show(double value) {
        if (Double.isNaN(value)) {
            return "not a number";
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "infinity" : "-infinity";
        }
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        // 1.0E300 -> 1e300, 2.5E-4 -> 2.5e-4: as people write it
        return Double.toString(value).replace(".0E", "E").replace("E", "e");
    }
}
