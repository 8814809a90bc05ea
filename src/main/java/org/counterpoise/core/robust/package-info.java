/**
 * How a design fares when the built system is not the nominal one: mistuning of the structure and
 * the absorber, sensitivity curves and maps, the worst case over a range, the tolerance Monte
 * Carlo and the robust design that minimises the worst case. Depends on the layers below it
 * (core.error, core.units, core.model, core.rational, core.response) and Commons Math, never on
 * tuning, remedy, runup, optim or design.
 */
package org.counterpoise.core.robust;
