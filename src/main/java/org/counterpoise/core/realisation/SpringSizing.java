package org.counterpoise.core.realisation;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * Sizes the helical compression springs of an absorber to EN 13906-1:2013: the fewest springs in
 * parallel (1 to {@link HardwareChoice#MOST_SPRINGS}, or exactly the chosen count) of the thinnest
 * stock wire that pass every check, and of that wire the geometry with the most margin (the least
 * largest utilisation).
 *
 * <p>For a count and a stock wire diameter d the search runs over the active coils n in quarter
 * coils (n &gt;= 2, at most {@link #MOST_ACTIVE_COILS}); for each n the mean coil diameter D
 * follows from the rate per spring, D = (G d^4 / (8 n R))^(1/3), rounded to the workshop's step
 * ({@link #meanDiameterStep}), and the spring index w = D/d must lie in the range the standard
 * covers for cold coiling (4 to 20). The ends are closed and ground (n_t = n + 2, Lc = n_t d), the
 * free length leaves the standard's minimum sum of gaps Sa at the largest working load
 * (L0 = Lc + Sa + s_max, rounded up to 0.1 mm), and five checks are made, see
 * {@link SpringChecks}.
 *
 * <p>A compression spring must never unload. When the static load does not exceed the dynamic
 * amplitude by a reserve of {@link #PRELOAD_RESERVE} of the amplitude (a horizontal absorber, where
 * nothing rests on the springs, or a light mass on stiff springs), the springs are set in opposed
 * preloaded pairs: one spring on each side of the mass along its axis, each compressed at assembly
 * so that the spring on the unloaded side still carries that reserve at the extreme of the cycle.
 * Pairs rather than one preloaded spring against a stop, because a stop would take the load off the
 * spring and change the rate with amplitude, while a pair keeps the rate linear (common practice).
 * The count is then even.
 *
 * <p>When no count up to the most springs passes, the design with the least largest utilisation is
 * returned with its failing checks; {@link SpringChecks#warnings} turns them into warnings. When
 * the rate itself lies beyond what stock wire can give within the standard's index range (stiffer
 * than the most springs of the thickest wire at w = 4 and n = 2, or softer than the fewest of the
 * thinnest at w = 20 and {@link #MOST_ACTIVE_COILS}), that extreme spring is returned with its
 * checks and its rate deviation, and the warnings say the rate is not met.
 */
public final class SpringSizing {

    /**
     * The reserve, as a fraction of the dynamic amplitude, that the smallest spring load keeps above
     * zero (common practice: a quarter of the amplitude, for load and rate tolerances and for the
     * damper's share the amplitude leaves out).
     */
    public static final double PRELOAD_RESERVE = 0.25;

    /** The most active coils considered (longer springs buckle or surge long before; common practice). */
    public static final double MOST_ACTIVE_COILS = 60;

    /** The free length is rounded up to this step, m (a workshop dimension). */
    static final double FREE_LENGTH_STEP = 0.1e-3;

    /**
     * The largest deviation of the total rate from the demand that rounding the mean coil diameter
     * to {@link #meanDiameterStep} can cause: |dR/R| = 3 |dD|/D with |dD| at most half a step,
     * 0.025 mm on D &gt;= 10 mm and 0.005 mm on D &lt; 10 mm (D &gt;= 4 d &gt;= 2 mm), so at most 0.75 %.
     */
    public static final double RATE_DEVIATION_BOUND = 0.0075;

    private SpringSizing() {
    }

    /**
     * @param demand what the absorber asks of its springs (validated)
     * @param choice the hardware choices: the wire and the spring count (0: the fewest that pass)
     * @return the spring design, with its checks
     * @throws InvalidInputException naming {@code hardware.spring} when the choice is not a helical
     *     spring. A chosen odd count that must form opposed pairs is sized as the next even count
     *     ({@link SpringChecks#warnings(SpringDesign, HardwareChoice)} says so).
     */
    public static SpringDesign size(SpringDemand demand, HardwareChoice choice) {
        Checks.present("spring", demand, "a spring rate, loads, forcing frequency and service cycles");
        Checks.present("hardware", choice, "the hardware choices");
        if (choice.springKind() != SpringKind.HELICAL_COMPRESSION) {
            throw new InvalidInputException("hardware.spring", choice.springKind().id(),
                    "helical-compression for a helical spring design");
        }
        SpringArrangement arrangement = arrangementFor(demand);
        List<Integer> counts = counts(arrangement, choice.springCount());
        Candidate fallback = null;
        for (int count : counts) {
            Candidate best = null;
            for (double d : choice.springMaterial().stockDiameters()) {
                Candidate forWire = bestForWire(demand, choice.springMaterial(), arrangement, count, d);
                if (forWire == null) {
                    continue;
                }
                if (fallback == null || forWire.worst() < fallback.worst()) {
                    fallback = forWire;
                }
                if (forWire.passes()) {
                    best = forWire;
                    break;
                }
            }
            if (best != null) {
                return best.design();
            }
        }
        if (fallback == null) {
            return closestRate(demand, choice.springMaterial(), arrangement, counts);
        }
        return fallback.design();
    }

    /**
     * @param demand the loads
     * @return seated when the static load exceeds the dynamic amplitude by the reserve, else opposed pairs
     */
    static SpringArrangement arrangementFor(SpringDemand demand) {
        return demand.staticLoad() >= (1 + PRELOAD_RESERVE) * demand.dynamicLoad() ? SpringArrangement.SEATED
                : SpringArrangement.OPPOSED_PRELOADED_PAIRS;
    }

    /**
     * @param meanCoilDiameter D, m
     * @return the step D is rounded to, m: 0.05 mm from 10 mm up, 0.01 mm below (a workshop dimension)
     */
    static double meanDiameterStep(double meanCoilDiameter) {
        return meanCoilDiameter >= 10e-3 ? 0.05e-3 : 0.01e-3;
    }

    private static List<Integer> counts(SpringArrangement arrangement, int chosen) {
        boolean pairs = arrangement == SpringArrangement.OPPOSED_PRELOADED_PAIRS;
        if (chosen > 0) {
            // opposed pairs need an even count: the next one up (HardwareChoice.MOST_SPRINGS is even)
            return List.of(pairs && chosen % 2 != 0 ? chosen + 1 : chosen);
        }
        List<Integer> counts = new ArrayList<>();
        for (int c = pairs ? 2 : 1; c <= HardwareChoice.MOST_SPRINGS; c += pairs ? 2 : 1) {
            counts.add(c);
        }
        return counts;
    }

    /** The geometry with the least largest utilisation for one count and wire, or null if none fits the index range. */
    private static Candidate bestForWire(SpringDemand demand, SpringMaterial material, SpringArrangement arrangement,
            int count, double d) {
        double ratePerSpring = demand.rate() / count;
        double g = material.shearModulus();
        // n = G d / (8 R w^3): the index range 4..20 bounds the active coils
        double fewest = Math.max(CompressionSpringFormulas.FEWEST_ACTIVE_COILS,
                Math.ceil(4 * g * d / (8 * ratePerSpring * Math.pow(CompressionSpringFormulas.LARGEST_INDEX, 3))) / 4);
        double most = Math.min(MOST_ACTIVE_COILS,
                Math.floor(4 * g * d / (8 * ratePerSpring * Math.pow(CompressionSpringFormulas.SMALLEST_INDEX, 3))) / 4);
        Candidate best = null;
        for (double n = fewest; n <= most + 1e-9; n += 0.25) {
            Candidate c = evaluate(demand, material, arrangement, count, d, n);
            if (c != null && (best == null || c.worst() < best.worst())) {
                best = c;
            }
        }
        return best;
    }

    /**
     * The spring at the end of the stock range nearest to the rate (in ratio), when no geometry gives
     * it: the most springs of the thickest wire at the smallest index and fewest coils when the rate
     * is too high, else the fewest springs of the thinnest wire at the largest index and most coils.
     */
    private static SpringDesign closestRate(SpringDemand demand, SpringMaterial material,
            SpringArrangement arrangement, List<Integer> counts) {
        double[] stock = material.stockDiameters();
        double g = material.shearModulus();
        int most = counts.get(counts.size() - 1);
        double thick = stock[stock.length - 1];
        double stiffest = most * CompressionSpringFormulas.rate(g, thick,
                CompressionSpringFormulas.SMALLEST_INDEX * thick, CompressionSpringFormulas.FEWEST_ACTIVE_COILS);
        if (demand.rate() >= stiffest) {
            return build(demand, material, arrangement, most, thick, CompressionSpringFormulas.FEWEST_ACTIVE_COILS,
                    CompressionSpringFormulas.SMALLEST_INDEX * thick).design();
        }
        double thin = stock[0];
        return build(demand, material, arrangement, counts.get(0), thin, MOST_ACTIVE_COILS,
                CompressionSpringFormulas.LARGEST_INDEX * thin).design();
    }

    /** One spring geometry with its checks, or null when the rounded index leaves the standard's range. */
    static Candidate evaluate(SpringDemand demand, SpringMaterial material, SpringArrangement arrangement, int count,
            double d, double n) {
        double exactD = CompressionSpringFormulas.meanDiameterForRate(material.shearModulus(), d, n,
                demand.rate() / count);
        double step = meanDiameterStep(exactD);
        double meanD = Math.rint(exactD / step) * step;
        double index = meanD / d;
        if (index < CompressionSpringFormulas.SMALLEST_INDEX || index > CompressionSpringFormulas.LARGEST_INDEX) {
            return null;
        }
        return build(demand, material, arrangement, count, d, n, meanD);
    }

    /** The spring of a given geometry with its lengths and checks. */
    private static Candidate build(SpringDemand demand, SpringMaterial material, SpringArrangement arrangement,
            int count, double d, double n, double meanD) {
        double rate = CompressionSpringFormulas.rate(material.shearModulus(), d, meanD, n);
        double amplitude = demand.dynamicLoad() / count;
        double share = demand.staticLoad() / count;
        double preload = arrangement == SpringArrangement.SEATED ? 0.0 : share + (1 + PRELOAD_RESERVE) * amplitude;
        double mean = preload + share;
        double largest = mean + amplitude;
        double totalCoils = n + CompressionSpringFormulas.INACTIVE_COILS;
        double solid = CompressionSpringFormulas.solidLength(totalCoils, d);
        double gaps = CompressionSpringFormulas.minimumGapSum(d, meanD, n, demand.dynamicLoad() > 0);
        double free = Math.ceil((solid + gaps + largest / rate) / FREE_LENGTH_STEP - 1e-9) * FREE_LENGTH_STEP;
        SpringGeometry geometry = new SpringGeometry(material, d, meanD, n, totalCoils, free, solid, gaps, rate);
        List<DesignCheck> checks = SpringChecks.of(geometry, mean, amplitude, demand.forcingFrequency());
        SpringDesign design = new SpringDesign(material, count, d, meanD, n, totalCoils, free, solid, free - mean / rate,
                rate, count * rate, count * rate / demand.rate() - 1, mean, amplitude, demand.serviceCycles(), checks,
                arrangement, preload, gaps,
                CompressionSpringFormulas.mass(material.density(), d, meanD, totalCoils));
        return new Candidate(design, margin(checks));
    }

    /**
     * The largest utilisation of the checks that rank geometries: every check but the solid-length
     * check, which the free length meets by construction (it guards the rounding) and which would
     * otherwise stand near 1 for every candidate.
     */
    private static double margin(List<DesignCheck> checks) {
        double worst = 0;
        for (DesignCheck c : checks) {
            if (c.kind() != CheckKind.SPRING_SOLID) {
                worst = Math.max(worst, c.utilisation());
            }
        }
        return worst;
    }

    /** A design and its largest utilisation over the ranking checks. */
    record Candidate(SpringDesign design, double worst) {
        boolean passes() {
            return design.passes();
        }
    }

    /**
     * The geometry of one spring that the checks read.
     *
     * @param material the wire
     * @param wireDiameter d, m
     * @param meanDiameter D, m
     * @param activeCoils n
     * @param totalCoils n_t
     * @param freeLength L0, m
     * @param solidLength Lc, m
     * @param gapSum Sa, m
     * @param rate R, N/m
     */
    record SpringGeometry(SpringMaterial material, double wireDiameter, double meanDiameter, double activeCoils,
            double totalCoils, double freeLength, double solidLength, double gapSum, double rate) {
    }
}
