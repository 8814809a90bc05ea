package org.counterpoise.io.project;

import java.util.List;
import org.counterpoise.core.optim.AbsorberSetTuning;

/**
 * How many absorbers share the absorber mass of {@code absorber}, how they are tuned and how they are
 * arranged (since format 6: the file's {@code absorbers}; the arrangement, modes and points since
 * format 7).
 *
 * @param count the number of absorbers, all of equal mass (2 for one absorber per mode)
 * @param tuning uniform spread or individual tuning (individual for one absorber per mode)
 * @param point the named point of {@code structure.modes} they sit at, or null for a structure of one
 *     mode (with one absorber per mode: the point of both unless {@code points} names each one's; may be null)
 * @param targetMode the name of the mode they are fitted to, or null for the default (the mode nearest the
 *     band; with one absorber per mode the mode the single-mode sections take, the first of {@code modes})
 * @param arrangement all absorbers on one mode, or one absorber per mode designed jointly
 * @param modes with one absorber per mode: the names of the two modes, one absorber each; else empty
 * @param points with one absorber per mode: each absorber's point, in the order of {@code modes}, or
 *     empty for the default; else empty
 * @param spilloverLimit with absorbers all on one mode of a structure of several modes: the largest
 *     peak allowed near each other mode, as a multiple of its peak without absorbers (1 = no rise;
 *     since format 8), or null for none
 */
public record AbsorbersInput(int count, AbsorberSetTuning tuning, String point, String targetMode,
        AbsorberArrangement arrangement, List<String> modes, List<String> points, Double spilloverLimit) {

    /** Copies the lists. */
    public AbsorbersInput {
        modes = List.copyOf(modes);
        points = List.copyOf(points);
    }

    /**
     * Absorbers all on one mode (format 6).
     *
     * @param count the number of absorbers
     * @param tuning uniform spread or individual tuning
     * @param point their point, or null
     * @param targetMode their mode, or null
     */
    public AbsorbersInput(int count, AbsorberSetTuning tuning, String point, String targetMode) {
        this(count, tuning, point, targetMode, AbsorberArrangement.ONE_MODE, List.of(), List.of(), null);
    }

    /**
     * Absorbers with no spillover limit (formats 6 and 7).
     *
     * @param count the number of absorbers
     * @param tuning uniform spread or individual tuning
     * @param point their point, or null
     * @param targetMode their mode, or null
     * @param arrangement all on one mode, or one per mode
     * @param modes with one absorber per mode, the two modes' names
     * @param points with one absorber per mode, each one's point, or empty
     */
    public AbsorbersInput(int count, AbsorberSetTuning tuning, String point, String targetMode,
            AbsorberArrangement arrangement, List<String> modes, List<String> points) {
        this(count, tuning, point, targetMode, arrangement, modes, points, null);
    }

    /** @return true for one absorber per mode, designed jointly */
    public boolean onePerMode() {
        return arrangement == AbsorberArrangement.ONE_PER_MODE;
    }
}
