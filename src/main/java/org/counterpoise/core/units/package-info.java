/**
 * Physical dimensions and units: {@link org.counterpoise.core.units.Unit} (a factor to SI for
 * each dimension), spectral density units, standard gravity, and the plausible magnitude of each
 * input ({@link org.counterpoise.core.units.PhysicalRange}). The core itself works in SI; units
 * are converted only at the io and ui boundaries, with these tables. Depends on java.* and
 * core.error only.
 */
package org.counterpoise.core.units;
