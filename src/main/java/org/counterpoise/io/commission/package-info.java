/**
 * The site check as text and JSON: an operating spectrum against the model, and the frequency
 * response measured with the absorber fitted against the design, with the trim to apply
 * ({@code core.commission}).
 */
package org.counterpoise.io.commission;
