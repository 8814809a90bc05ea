/**
 * Identification of the structure's modes from measurements: a measured frequency response
 * function ({@link org.counterpoise.core.identify.MeasuredFrf}) fitted by peak picking with
 * half-power damping, a circle fit, a rational-fraction polynomial start and a Levenberg-Marquardt
 * polish of a sum of modes ({@link org.counterpoise.core.identify.ModalFit}); a free decay by the
 * logarithmic decrement; two natural frequencies around a known added mass. Results are SI records
 * (angular frequencies in rad/s) with standard uncertainties. Sits on layer 3 beside
 * {@code core.system}: imports {@code core.error}, {@code core.model} and Commons Math only.
 */
package org.counterpoise.core.identify;
