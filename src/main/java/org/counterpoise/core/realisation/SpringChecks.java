package org.counterpoise.core.realisation;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.realisation.SpringSizing.SpringGeometry;
import org.counterpoise.core.units.Dimension;

/**
 * The five checks of one helical compression spring, each a demand against a capacity with its
 * source, and the warnings for those that fail. Loads are per spring; stresses are corrected by the
 * Bergstraesser factor except at solid length, where the standard limits the uncorrected stress.
 */
public final class SpringChecks {

    /**
     * The highest forcing frequency times this margin must stay below the spring's first surge
     * frequency: the coils then follow the ends within 1 / (1 - 1/3^2) - 1 = 12.5 % (the dynamic
     * magnification of the first coil mode at a third of its frequency; the margin is common practice).
     */
    public static final double SURGE_MARGIN = 3.0;

    private static final String CFS = CompressionSpringFormulas.STANDARD;

    /** The source of each check, written once (the sizing makes thousands of trial checks). */
    private static final Map<SpringMaterial, String> STRESS_SOURCES = new EnumMap<>(SpringMaterial.class);

    static {
        for (SpringMaterial m : SpringMaterial.values()) {
            STRESS_SOURCES.put(m, String.format(Locale.ROOT, "%s: the larger of the corrected stress tau_k = k 8 D F"
                    + " / (pi d^3) at the largest working load (9.5, Bergstraesser k of clause 7) and the uncorrected"
                    + " stress at solid length, against %.2f Rm (10.1.1, cold coiled); Rm the minimum of %s at d"
                    + " (table values from memory: verify)", CFS, SpringMaterial.PERMISSIBLE_SHEAR_FRACTION,
                    m.standard()));
        }
    }

    private static final String FATIGUE_SOURCE = "Goodman line through Zimmerli's endurance point of unpeened wire"
            + " (241 MPa amplitude at 379 MPa mean, 10^7 cycles and more) and the ultimate shear strength 0.67 Rm"
            + " (Shigley's Mechanical Engineering Design, 9th ed., 10-9; from memory), at the mean stress of the static"
            + " load and preload; stresses corrected by k (" + CFS + ", clause 7). The endurance limit is used at any"
            + " number of cycles (it is the limit above 10^7, conservative below). Not the standard's own fatigue"
            + " diagrams (10.3), which this program does not hold";

    private static final String BUCKLING_SOURCE = String.format(Locale.ROOT, "%s, 9.14: the theoretical buckling"
            + " deflection s_K with seating coefficient nu = %.1f (both ends guided and held parallel), against the"
            + " largest working deflection; a spring that cannot buckle is limited by its deflection to solid", CFS,
            CompressionSpringFormulas.SEATING_COEFFICIENT);

    private static final String SURGE_SOURCE = String.format(Locale.ROOT, "%s, 9.12: the first surge frequency with"
            + " both ends fixed, f = d / (2 pi n D^2) sqrt(G / (2 rho)), against %.0f times the highest forcing"
            + " frequency (common practice)", CFS, SURGE_MARGIN);

    private static final String SOLID_SOURCE = CFS + ", 9.9 and 9.10: the compression available down to Lc + Sa"
            + " (closed and ground ends, Lc = n_t d; Sa = (0.0015 D^2/d + 0.1 d) n, times 1.5 under dynamic load)";

    private static final String RATE_SOURCE = "R = G d^4 / (8 D^3 n) per spring (" + CFS + ", 9.1), summed over"
            + " the springs, against the rate tolerance of the part tolerances (the robust design's ranges)";

    private SpringChecks() {
    }

    /**
     * @param spring the geometry
     * @param meanLoad the steady load on the most loaded spring (static share plus preload), N
     * @param amplitude the dynamic load amplitude on one spring, N
     * @param forcingFrequency the highest forcing frequency, rad/s
     * @return the checks in the order static stress, fatigue, buckling, surge, solid
     */
    static List<DesignCheck> of(SpringGeometry spring, double meanLoad, double amplitude, double forcingFrequency) {
        SpringMaterial m = spring.material();
        double d = spring.wireDiameter();
        double meanD = spring.meanDiameter();
        double largest = meanLoad + amplitude;
        double deflection = largest / spring.rate();
        double toSolid = spring.freeLength() - spring.solidLength();

        double atLargest = CompressionSpringFormulas.correctedShearStress(largest, d, meanD);
        double atSolid = CompressionSpringFormulas.shearStress(spring.rate() * toSolid, d, meanD);
        DesignCheck stress = new DesignCheck(CheckKind.SPRING_STATIC_STRESS, Math.max(atLargest, atSolid),
                m.permissibleShearStress(d), Dimension.STRESS, STRESS_SOURCES.get(m));

        double meanStress = CompressionSpringFormulas.correctedShearStress(meanLoad, d, meanD);
        double amplitudeStress = CompressionSpringFormulas.correctedShearStress(amplitude, d, meanD);
        DesignCheck fatigue = new DesignCheck(CheckKind.SPRING_FATIGUE, amplitudeStress,
                SpringFatigue.allowableAmplitude(m, d, meanStress), Dimension.STRESS, FATIGUE_SOURCE);

        double buckling = CompressionSpringFormulas.bucklingDeflection(m.shearModulus(), m.youngsModulus(),
                spring.freeLength(), meanD, CompressionSpringFormulas.SEATING_COEFFICIENT);
        DesignCheck buckle = new DesignCheck(CheckKind.SPRING_BUCKLING, deflection,
                buckling < 0 ? toSolid : buckling, Dimension.LENGTH, BUCKLING_SOURCE);

        double surge = CompressionSpringFormulas.surgeFrequency(m.shearModulus(), m.density(), d, meanD,
                spring.activeCoils());
        DesignCheck surgeCheck = new DesignCheck(CheckKind.SPRING_SURGE, SURGE_MARGIN * forcingFrequency, surge,
                Dimension.FREQUENCY, SURGE_SOURCE);

        DesignCheck solid = new DesignCheck(CheckKind.SPRING_SOLID, deflection, toSolid - spring.gapSum(),
                Dimension.LENGTH, SOLID_SOURCE);
        return List.of(stress, fatigue, buckle, surgeCheck, solid);
    }

    /**
     * @param spring a spring design
     * @param tolerances the tolerances the parts must hold
     * @return the springs' total rate off the design's rate, |R_total / k2 - 1|, against the tolerance
     *     the spring rate must hold (a spring outside it mistunes the absorber beyond what the design
     *     was shown to survive)
     */
    public static DesignCheck rate(SpringDesign spring, PartTolerances tolerances) {
        return new DesignCheck(CheckKind.SPRING_RATE, Math.abs(spring.rateDeviation()), tolerances.springRate(),
                Dimension.RATIO, RATE_SOURCE);
    }

    /**
     * @param spring a spring design
     * @return a warning when its rate misses the demand by more than rounding explains (the rate lies
     *     beyond stock wire), then one for each check it fails, in the order of its checks
     */
    public static List<Warning> warnings(SpringDesign spring) {
        return warnings(spring, HardwareChoice.DEFAULT);
    }

    /**
     * @param spring a spring design
     * @param choice the hardware choices it was sized for
     * @return as {@link #warnings(SpringDesign)}, first a warning when the count asked for was odd and
     *     the springs had to stand in opposed pairs, so one more was sized
     */
    public static List<Warning> warnings(SpringDesign spring, HardwareChoice choice) {
        List<Warning> warnings = new ArrayList<>();
        if (choice.springCount() > 0 && spring.count() != choice.springCount()) {
            warnings.add(Warning.of(WarningKind.SPRING_COUNT_MADE_EVEN, (double) spring.count()));
        }
        if (Math.abs(spring.rateDeviation()) > SpringSizing.RATE_DEVIATION_BOUND) {
            warnings.add(Warning.of(WarningKind.SPRING_RATE_NOT_MET, spring.rateDeviation()));
        }
        for (DesignCheck c : spring.checks()) {
            if (!c.passes()) {
                warnings.add(Warning.of(warningFor(c.kind()), c.utilisation()));
            }
        }
        return List.copyOf(warnings);
    }

    private static WarningKind warningFor(CheckKind kind) {
        return switch (kind) {
            case SPRING_STATIC_STRESS -> WarningKind.SPRING_OVERSTRESSED;
            case SPRING_FATIGUE -> WarningKind.SPRING_FATIGUE;
            case SPRING_BUCKLING -> WarningKind.SPRING_BUCKLES;
            case SPRING_SURGE -> WarningKind.SPRING_SURGE;
            case SPRING_SOLID -> WarningKind.SPRING_GOES_SOLID;
            default -> throw new IllegalArgumentException("bug: " + kind + " is not a spring check");
        };
    }
}
