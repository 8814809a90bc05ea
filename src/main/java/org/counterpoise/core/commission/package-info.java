/**
 * Commissioning on site: what the absorber as built is (its own frequency and damping fitted to a
 * frequency response measured with it fitted), how many trim plates bring it to the design, and how
 * an operating measurement at running speed compares with the model's prediction. Above
 * {@code core.realisation} (it uses the trim plan and part tolerances of the built absorber).
 */
package org.counterpoise.core.commission;
