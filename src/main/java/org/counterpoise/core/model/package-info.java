/**
 * The physical system and its loading as immutable SI records: the structure (one mode seen at the
 * absorber), the absorber and its non-dimensional tuning, the excitation with its frequency band
 * and spectrum, and the conversions between the ways a user may describe them. No response is
 * computed here. Depends on java.*, core.error and core.units.
 */
package org.counterpoise.core.model;
