package org.counterpoise.io.project;

import org.counterpoise.core.optim.AbsorberSetTuning;

/**
 * How many absorbers share the absorber mass of {@code absorber} and how they are tuned (since
 * format 6: the file's {@code absorbers}).
 *
 * @param count the number of absorbers, all of equal mass
 * @param tuning uniform spread or individual tuning
 * @param point the named point of {@code structure.modes} they sit at, or null for a structure of one mode
 * @param targetMode the name of the mode they are fitted to, or null for the mode nearest the band
 */
public record AbsorbersInput(int count, AbsorberSetTuning tuning, String point, String targetMode) {
}
