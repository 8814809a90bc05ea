/**
 * The one progress-and-cancel interface of the core's long computations. Depends only on
 * {@code core.error}, so every core package may use it.
 */
package org.counterpoise.core.progress;
