/**
 * Orchestration: a {@link org.counterpoise.core.design.DesignStudy} goes into the {@link
 * org.counterpoise.core.design.Designer} and a {@link org.counterpoise.core.design.DesignResult}
 * comes out, with its curves, cautions, robustness study and sizing. It chooses and combines the
 * other core packages; a formula belongs in the layer below that it is about. The top layer of the core: it may use
 * every other core package, and none of them uses it (io and ui do).
 */
package org.counterpoise.core.design;
