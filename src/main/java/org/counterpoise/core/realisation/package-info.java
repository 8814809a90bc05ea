/**
 * From the design's numbers to hardware a workshop can build: the helical spring to EN 13906-1 or
 * the elastomer element (with the exact hysteretic optimum), the damper (dashpot, eddy-current plate
 * or elastomer loss), the tolerance each part must hold, the trim that covers the structure's
 * frequency uncertainty, the tuning and commissioning procedure and the predicted response a
 * technician compares readings against. Every formula cites its source here and in
 * docs/realisation.md. Depends on the layers below it (core.design and everything under it) and
 * Commons Math only.
 */
package org.counterpoise.core.realisation;
