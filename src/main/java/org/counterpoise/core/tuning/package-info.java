/**
 * Published closed-form tunings of an absorber, one class per method named after its authors, each
 * with its equation and source, and {@link org.counterpoise.core.tuning.ClosedForms}, which says
 * which method answers which excitation and response. Depends on the layers below it
 * (core.error, core.units, core.model, core.rational, core.response), never on another package
 * of its own layer (remedy, runup, robust) or above it.
 */
package org.counterpoise.core.tuning;
