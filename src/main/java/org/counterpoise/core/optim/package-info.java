/**
 * Numerical optimisation of an absorber's tuning where no closed form applies: the exact minimax
 * of the peak in band ({@link org.counterpoise.core.optim.HInfinityOptimiser}, an active-set
 * Newton method with its certificate), the least mean square under white noise, the least
 * mass that meets a target, and the minimax of several absorbers on one mode
 * ({@link org.counterpoise.core.optim.AbsorberSetOptimiser}: uniform spread or individual tuning,
 * trust-region linear programming and Newton on the optimality conditions, with its certificate). Depends on the layers below it, closed forms of core.tuning as seeds
 * included, and Commons Math; never on core.design.
 */
package org.counterpoise.core.optim;
