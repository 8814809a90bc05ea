/**
 * The run-up transient: time integration of the equations of motion through a speed ramp, the
 * response envelope and the peak of each quantity, with a progress listener that lets a caller
 * cancel. Depends on the layers below it (core.error, core.units, core.model, core.rational,
 * core.response) and Commons Math's integrators, never on tuning, remedy, robust, optim or design.
 */
package org.counterpoise.core.runup;
