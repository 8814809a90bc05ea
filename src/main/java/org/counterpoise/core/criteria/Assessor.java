package org.counterpoise.core.criteria;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationOrder;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.MeanSquare;
import org.counterpoise.core.rational.Peak;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.response.ResponseScale;

/**
 * The exact verdict of a criterion on one system, bare or with the absorber, over the design
 * order's forcing band. Built once per (criterion, excitation), then asked for many systems: the
 * weighting's polynomials, the orders and their one-third-octave groups are prepared here, so one
 * {@link #utilisation} call builds only the orders' transfer functions and runs the exact search.
 * Immutable and thread-safe.
 *
 * <p>Every route is exact (the real roots of a polynomial give the stationary points) except the
 * sum of amplitudes of several orders, which is not rational (dense scan plus Brent):
 * <ul>
 * <li>orders together, one order: the exact peak of |G| over the band ({@link PeakFinder}), stated
 * in the convention ({@link AmplitudeConvention#ofHarmonic}); with no weighting this is the design's
 * response peak to round-off;
 * <li>orders together, r.m.s., several orders: the mean square sum_j a_j^2 |G_j|^2 / 2 is one
 * rational function of x = g^2 ({@link OrdersTogether#rms});
 * <li>orders together, peak or peak-to-peak, several orders: the sum of amplitudes, scanned
 * ({@link OrdersTogether#amplitudeSum});
 * <li>each order on its own against a limit curve: the exact maximum of |G_j| / L piece by piece
 * ({@link CurvePeak}). Orders whose frequencies lie within a factor 2^(1/3) of each other (counted
 * from the lowest of a group) would fall in one one-third-octave band or in neighbouring ones; the
 * conservative reading takes them as one band value: the sum in the convention
 * ({@link AmplitudeConvention#ofSum}, r.m.s. of the sum) against the lowest of their limits, scanned;
 * <li>white noise (one order): the exact r.m.s. of the (weighted) response from its mean square
 * ({@link MeanSquare}); only an r.m.s. criterion on the orders together with a flat limit can be
 * judged so (a band or peak value of a random response is a different measure).
 * </ul>
 * An undamped system forced at one of its natural frequencies in the band reads +infinity.
 */
public final class Assessor {
    /** Frequencies of orders within this factor of each other are judged as one band value. */
    public static final double THIRD_OCTAVE = Math.cbrt(2.0);

    private final Criterion criterion;
    private final Excitation excitation;
    private final List<ExcitationOrder> orders;
    private final double[][] weighting;
    private final int[][] groups;

    private Assessor(Criterion criterion, Excitation excitation) {
        this.criterion = criterion;
        this.excitation = excitation;
        this.orders = excitation.orders();
        this.weighting = criterion.weighting().map(w -> {
            TransferFunction unit = w.relativeTo(1.0);
            return new double[][] {unit.numerator(), unit.denominator()};
        }).orElse(null);
        this.groups = criterion.combination() == OrderCombination.EACH_ORDER ? thirdOctaveGroups(orders)
                : new int[][] {};
    }

    /**
     * @param criterion what to judge against
     * @param excitation the disturbance, every order
     * @return the assessor
     * @throws InvalidInputException (field {@code acceptance}) when the criterion cannot judge a
     *     white-noise disturbance
     */
    public static Assessor of(Criterion criterion, Excitation excitation) {
        if (excitation.spectrum().isWhiteNoise() && !judgesWhiteNoise(criterion)) {
            throw new InvalidInputException("acceptance", criterion.kind().id(),
                    "a white-noise disturbance is judged only by an r.m.s. value of the whole response against"
                            + " one flat limit: human-comfort, machine, or a user limit in r.m.s. with one value");
        }
        if (criterion.combination() == OrderCombination.TOGETHER && !criterion.limit().isFlat()) {
            throw new IllegalArgumentException("bug: orders judged together need a flat limit, " + criterion);
        }
        return new Assessor(criterion, excitation);
    }

    /**
     * @param criterion a criterion
     * @return true when it can judge a white-noise disturbance (r.m.s., orders together, flat limit)
     */
    public static boolean judgesWhiteNoise(Criterion criterion) {
        return criterion.convention() == AmplitudeConvention.RMS
                && criterion.combination() == OrderCombination.TOGETHER && criterion.limit().isFlat();
    }

    /**
     * @param structure the structure
     * @param absorber the absorber on it, or empty for the bare structure
     * @return the reading
     */
    public Reading read(Structure structure, Optional<Tuning> absorber) {
        Worst worst = worst(structure, absorber.orElse(null));
        List<String> zones = criterion.zones().stream().filter(z -> z.contains(worst.value())).map(Zone::id)
                .toList();
        OptionalInt governing = worst.order() >= 0 ? OptionalInt.of(worst.order()) : OptionalInt.empty();
        return new Reading(worst.value(), worst.limit(), worst.ratio() * structure.naturalFrequency(), governing,
                zones, worst.outsideRange());
    }

    /**
     * @param structure the structure
     * @param tuning the absorber
     * @return the verdict before (bare) and after (with the absorber)
     */
    public Acceptance acceptance(Structure structure, Tuning tuning) {
        return new Acceptance(criterion, read(structure, Optional.empty()), read(structure, Optional.of(tuning)));
    }

    /**
     * The verdict on a structure of several modes, bare (before) and with its absorbers (after), at a
     * response point under a force at another: the same exact searches on the whole structure's
     * transfer function ({@link OrderResponses#ofModes}).
     *
     * @param withAbsorbers the modes with the absorbers
     * @param forcePoint where the force acts
     * @param responsePoint where the criterion judges the response
     * @return the verdict before and after
     * @throws IllegalArgumentException for a white-noise disturbance (a project of several modes takes
     *     one force order)
     */
    public Acceptance acceptance(ModalSystem withAbsorbers, String forcePoint, String responsePoint) {
        if (excitation.spectrum().isWhiteNoise()) {
            throw new IllegalArgumentException("bug: a structure of several modes under white noise");
        }
        return new Acceptance(criterion, read(withAbsorbers.bare(), forcePoint, responsePoint),
                read(withAbsorbers, forcePoint, responsePoint));
    }

    private Reading read(ModalSystem system, String forcePoint, String responsePoint) {
        OrderResponses r = OrderResponses.ofModes(orders, criterion.quantity(), weighting, system, forcePoint,
                responsePoint);
        FrequencyBand band = excitation.band();
        double omega1 = system.referenceFrequency();
        double gLow = band.low() / omega1;
        double gHigh = band.high() / omega1;
        Worst worst = criterion.combination() == OrderCombination.TOGETHER ? together(r, gLow, gHigh)
                : eachOrder(r, gLow, gHigh);
        List<String> zones = criterion.zones().stream().filter(z -> z.contains(worst.value())).map(Zone::id)
                .toList();
        OptionalInt governing = worst.order() >= 0 ? OptionalInt.of(worst.order()) : OptionalInt.empty();
        return new Reading(worst.value(), worst.limit(), worst.ratio() * omega1, governing, zones,
                worst.outsideRange());
    }

    /**
     * The fast path for searches: value over limit where it is largest, without building a reading.
     *
     * @param structure the structure
     * @param tuning the absorber
     * @return the utilisation, at most 1 passes; +infinity when unbounded
     */
    public double utilisation(Structure structure, Tuning tuning) {
        return worst(structure, tuning).utilisation();
    }

    /**
     * @param structure the structure
     * @return the bare structure's utilisation
     */
    public double utilisationBare(Structure structure) {
        return worst(structure, null).utilisation();
    }

    /** @return the criterion */
    public Criterion criterion() {
        return criterion;
    }

    /** @return the disturbance */
    public Excitation excitation() {
        return excitation;
    }

    /**
     * The order that governs the bare structure: each order alone, over its own frequencies in the
     * band, against the criterion's limit (for every combination); the io layer designs for it when
     * the user names none.
     *
     * @param criterion the criterion
     * @param structure the structure
     * @param excitation the disturbance
     * @return the index in {@code excitation.orders()} with the largest untreated utilisation (the
     *     lowest index on a tie; 0 under white noise)
     */
    public static int governingOrder(Criterion criterion, Structure structure, Excitation excitation) {
        if (excitation.spectrum().isWhiteNoise()) {
            return 0;
        }
        Assessor assessor = of(criterion, excitation);
        OrderResponses r = assessor.responses(structure, null);
        double[] g = assessor.band(structure);
        int best = 0;
        double largest = -1.0;
        for (int j = 0; j < r.size(); j++) {
            double u = r.unboundedAt(j, g[0], g[1]) >= 0 ? Double.POSITIVE_INFINITY
                    : CurvePeak.of(r, j, criterion.convention(), criterion.limit(), g[0], g[1])[1];
            if (u > largest) {
                largest = u;
                best = j;
            }
        }
        return best;
    }

    private OrderResponses responses(Structure structure, Tuning tuning) {
        return OrderResponses.of(orders, criterion.quantity(), weighting, structure, tuning);
    }

    private double[] band(Structure structure) {
        FrequencyBand band = excitation.band();
        double omega1 = structure.naturalFrequency();
        return new double[] {band.low() / omega1, band.high() / omega1};
    }

    /** @return where the system (tuning null: bare) is worst against the criterion */
    Worst worst(Structure structure, Tuning tuning) {
        OrderResponses r = responses(structure, tuning);
        if (excitation.spectrum().isWhiteNoise()) {
            return whiteNoise(r, structure);
        }
        double[] g = band(structure);
        return criterion.combination() == OrderCombination.TOGETHER ? together(r, g[0], g[1])
                : eachOrder(r, g[0], g[1]);
    }

    private Worst together(OrderResponses r, double gLow, double gHigh) {
        double limit = criterion.limit().points().get(0).limit();
        AmplitudeConvention convention = criterion.convention();
        for (int j = 0; j < r.size(); j++) {
            double at = r.unboundedAt(j, gLow, gHigh);
            if (at >= 0) {
                return new Worst(Double.POSITIVE_INFINITY, limit, at, -1, outsideTogether(r, at));
            }
        }
        double[] found;
        if (r.size() == 1) {
            Peak peak = PeakFinder.over(r.transfer(0), gLow, gHigh);
            found = new double[] {peak.frequencyRatio(), convention.ofHarmonic(r.scale(0) * peak.magnitude())};
        } else if (convention == AmplitudeConvention.RMS) {
            found = OrdersTogether.rms(r, gLow, gHigh);
        } else {
            found = OrdersTogether.amplitudeSum(r, gLow, gHigh);
            found[1] = convention.ofHarmonic(found[1]);
        }
        return new Worst(found[1], limit, found[0], -1, outsideTogether(r, found[0]));
    }

    private boolean outsideTogether(OrderResponses r, double g) {
        for (int j = 0; j < r.size(); j++) {
            if (outside(r, j, g)) {
                return true;
            }
        }
        return false;
    }

    private boolean outside(OrderResponses r, int j, double g) {
        LimitCurve curve = criterion.limit();
        double hertz = r.hertz(j, g);
        return curve.points().size() > 1 && (hertz < curve.lowFrequency() || hertz > curve.highFrequency());
    }

    private Worst eachOrder(OrderResponses r, double gLow, double gHigh) {
        Worst worst = null;
        for (int[] group : groups) {
            Worst candidate = group.length == 1 ? single(r, group[0], gLow, gHigh) : thirdOctaveBand(r, group, gLow, gHigh);
            if (worst == null || candidate.utilisation() > worst.utilisation()) {
                worst = candidate;
            }
        }
        return worst;
    }

    private Worst single(OrderResponses r, int j, double gLow, double gHigh) {
        LimitCurve curve = criterion.limit();
        double at = r.unboundedAt(j, gLow, gHigh);
        if (at >= 0) {
            return new Worst(Double.POSITIVE_INFINITY, curve.at(r.hertz(j, at)), at, j, outside(r, j, at));
        }
        double[] found = CurvePeak.of(r, j, criterion.convention(), curve, gLow, gHigh);
        double limit = curve.at(r.hertz(j, found[0]));
        double value = criterion.convention().ofHarmonic(r.amplitude(j, found[0]));
        return new Worst(value, limit, found[0], j, outside(r, j, found[0]));
    }

    /** Orders in one one-third-octave band: their sum against the lowest of their limits, scanned. */
    private Worst thirdOctaveBand(OrderResponses r, int[] group, double gLow, double gHigh) {
        LimitCurve curve = criterion.limit();
        for (int j : group) {
            double at = r.unboundedAt(j, gLow, gHigh);
            if (at >= 0) {
                return new Worst(Double.POSITIVE_INFINITY, lowestLimit(r, group, at), at, j, outside(r, j, at));
            }
        }
        double[] amplitudes = new double[group.length];
        double[] found = ScanMaximum.of(g -> bandValue(r, group, g, amplitudes) / lowestLimit(r, group, g), gLow, gHigh,
                OrdersTogether.seeds(r, group, gLow, gHigh, curve));
        double g = found[0];
        double value = bandValue(r, group, g, new double[group.length]);
        int governing = group[0];
        double largest = -1.0;
        for (int j : group) {
            double share = r.amplitude(j, g) / curve.at(r.hertz(j, g));
            if (share > largest) {
                largest = share;
                governing = j;
            }
        }
        return new Worst(value, lowestLimit(r, group, g), g, governing, outside(r, governing, g));
    }

    private double bandValue(OrderResponses r, int[] group, double g, double[] amplitudes) {
        for (int i = 0; i < group.length; i++) {
            amplitudes[i] = r.amplitude(group[i], g);
        }
        return criterion.convention().ofSum(amplitudes);
    }

    private double lowestLimit(OrderResponses r, int[] group, double g) {
        double lowest = Double.POSITIVE_INFINITY;
        for (int j : group) {
            lowest = Math.min(lowest, criterion.limit().at(r.hertz(j, g)));
        }
        return lowest;
    }

    private Worst whiteNoise(OrderResponses r, Structure structure) {
        TransferFunction h = r.transfer(0);
        double omega1 = structure.naturalFrequency();
        double psd = excitation.spectrum().psdLevel().orElseThrow();
        // sigma^2 = s^2 G0 omega1 J / 2 (RandomResponse's class comment), s per unit input
        double unitScale = Math.abs(ResponseScale.of(structure, excitation.kind(), 1.0, criterion.quantity()));
        double value = unitScale * Math.sqrt(psd * omega1 * MeanSquare.of(h) / 2.0);
        // where the response's spectral density is largest: the frequency that contributes most
        double where = PeakFinder.overAllFrequencies(h).frequencyRatio();
        return new Worst(value, criterion.limit().points().get(0).limit(), where, -1, false);
    }

    /**
     * @param orders the orders
     * @return the orders grouped: sorted by frequency factor, a group takes every order below
     *     2^(1/3) times its lowest; indices into {@code orders}
     */
    static int[][] thirdOctaveGroups(List<ExcitationOrder> orders) {
        Integer[] byFrequency = new Integer[orders.size()];
        Arrays.setAll(byFrequency, i -> i);
        Arrays.sort(byFrequency, (a, b) -> Double.compare(orders.get(a).frequencyFactor(),
                orders.get(b).frequencyFactor()));
        List<int[]> groups = new ArrayList<>();
        int start = 0;
        while (start < byFrequency.length) {
            double lowest = orders.get(byFrequency[start]).frequencyFactor();
            int end = start + 1;
            while (end < byFrequency.length && orders.get(byFrequency[end]).frequencyFactor() < lowest * THIRD_OCTAVE) {
                end++;
            }
            int[] group = new int[end - start];
            for (int i = start; i < end; i++) {
                group[i - start] = byFrequency[i];
            }
            Arrays.sort(group);
            groups.add(group);
            start = end;
        }
        return groups.toArray(new int[0][]);
    }
}
