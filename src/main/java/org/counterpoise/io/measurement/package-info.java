/**
 * Measurements read from files and the identification's results written out: FRF and decay
 * records as CSV ({@link org.counterpoise.io.measurement.FrfCsv}, {@link org.counterpoise.io.measurement.DecayCsv}),
 * their units ({@link org.counterpoise.io.measurement.FrfUnit}), the JSON and text of an
 * identification, and the identified mode written into a project file's structure section.
 */
package org.counterpoise.io.measurement;
