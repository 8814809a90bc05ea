package org.counterpoise.core.criteria;

/**
 * The verdict of one criterion on a design: the bare structure and the structure with the
 * absorber, each read over the forcing band.
 *
 * @param criterion what was judged against
 * @param before the bare structure
 * @param after the structure with the absorber
 */
public record Acceptance(Criterion criterion, Reading before, Reading after) {

    /** @return true when the bare structure already meets the criterion: no absorber is needed */
    public boolean absorberNeeded() {
        return !before.passes();
    }
}
