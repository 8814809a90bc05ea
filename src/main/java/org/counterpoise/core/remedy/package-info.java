/**
 * The remedy an absorber replaces: the change of the structure's stiffness or mass that alone
 * would bring its worst response in band to the target, for comparison in the report. Depends on
 * the layers below it (core.error, core.units, core.model, core.rational, core.response) and
 * Commons Math, never on tuning, runup, robust, optim or design.
 */
package org.counterpoise.core.remedy;
