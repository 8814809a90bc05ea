/**
 * The response of the two-degree-of-freedom system (a structure mode with one absorber):
 * {@link org.counterpoise.core.response.TransferFunctions}, the one home of its algebra, with the
 * SI scaling, the peaks of each response quantity, the sensitivity to tuning and the random
 * response under white noise. The general rational-function maths it builds on is in
 * core.rational. Depends on java.*, Commons Math, core.error, core.units, core.model and
 * core.rational.
 */
package org.counterpoise.core.response;
