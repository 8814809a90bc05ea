/**
 * What any linear vibrating system offers the rest of the core, whatever its size: exact transfer
 * functions from an excitation to a response ({@link org.counterpoise.core.system.LinearSystem}),
 * and objectives over frequency that turn one into a number an optimiser or a robustness study can
 * compare ({@link org.counterpoise.core.system.BandObjective}: the exact peak over a band, or the
 * mean square under white noise). Today's one mode with one absorber implements the system in
 * {@code core.response}; a model with several modes or absorbers, built from M, C and K, plugs in
 * beside it and reuses the same objectives: {@link org.counterpoise.core.system.ModalSystem} is a structure of
 * several modes ({@link org.counterpoise.core.system.ModalStructure}, {@link org.counterpoise.core.system.Mode}) with
 * absorbers at one of its points ({@link org.counterpoise.core.system.PointAbsorber}), its exact transfer functions
 * built from products of low-degree polynomials, and
 * {@link org.counterpoise.core.system.AbsorberSensitivity} their exact derivatives in each absorber's tuning;
 * {@link org.counterpoise.core.system.ModalPeak} the exact peak over a band (on the factored form,
 * {@link org.counterpoise.core.rational.FactoredPeaks}, which holds for many light absorbers) and
 * {@link org.counterpoise.core.system.Spillover} each mode's peak before and after. Sits above {@code core.rational} and {@code core.model}
 * and below {@code core.response}: it imports neither the response package nor anything above it.
 */
package org.counterpoise.core.system;
