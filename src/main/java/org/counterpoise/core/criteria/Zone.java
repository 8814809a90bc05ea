package org.counterpoise.core.criteria;

/**
 * A named range of the criterion's measure: an evaluation zone (A to D) or a comfort reaction.
 * Ranges of one criterion may overlap (ISO 2631-1:1997 Annex C's comfort reactions do).
 *
 * @param id stable id of the zone (the zone letter, or the reaction's id); words are in io
 * @param lower lower bound, SI (0 for the lowest)
 * @param upper upper bound, SI (+infinity for the highest)
 */
public record Zone(String id, double lower, double upper) {

    /**
     * @param value a value of the measure, SI
     * @return true when the value lies in this zone; a value on a boundary belongs to the lower
     *     zone (ISO 20816-1:2016, 6.3.2.3)
     */
    public boolean contains(double value) {
        return value > lower && value <= upper || lower == 0 && value == 0;
    }
}
