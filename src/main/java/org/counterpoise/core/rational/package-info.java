/**
 * Exact algebra of real rational functions of s = i omega: polynomial arithmetic, certified real
 * roots, the exact peak of |H(i g)| over a band, and the closed-form mean square under white noise.
 * Nothing here knows what the polynomials describe (one mode with an absorber today, several modes,
 * a frequency weighting or a fitted model later), so every model reuses the same peak search and
 * integrals. Depends only on java.* and Commons Math.
 */
package org.counterpoise.core.rational;
