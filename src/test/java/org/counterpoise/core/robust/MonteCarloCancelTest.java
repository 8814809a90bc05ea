package org.counterpoise.core.robust;

import java.util.OptionalDouble;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.apache.commons.math3.random.Well19937c;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.Messages;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.tuning.DenHartogEqualPeak;
import org.junit.jupiter.api.Test;

/**
 * The Monte Carlo's progress and cancellation: a run stops when asked, says so with the typed
 * CANCELLED key and hands back nothing; an uncancelled run is, bit for bit, the run written out in
 * the plainest way (all draws from one seeded generator, then every sample's peak), so blocks and
 * listeners changed no number.
 */
class MonteCarloCancelTest {
    private static final Structure FLOOR = Structure.of(1500, 1500 * Math.pow(2 * Math.PI * 12, 2), 0.01);
    private static final Mistuning M = new Mistuning(FLOOR, new Excitation(ExcitationKind.FORCE, 300,
            new FrequencyBand(2 * Math.PI * 11, 2 * Math.PI * 13)), ResponseKind.DISPLACEMENT);
    private static final Absorber A = Absorber.of(FLOOR, DenHartogEqualPeak.tuning(0.05));
    private static final ToleranceSet SPREAD = new ToleranceSet(Tolerance.uniform(0.05), Tolerance.normal(0.03),
            Tolerance.uniform(0.02), Tolerance.normal(0.03), Tolerance.uniform(0.2));

    @Test
    void aRunCancelledHalfWayStopsWithCancelledAndNoResult() {
        int samples = 20 * MonteCarlo.BLOCK;
        List<Double> reported = new ArrayList<>();
        AtomicInteger asked = new AtomicInteger();
        ProgressListener halfWay = new ProgressListener() {
            @Override
            public void progress(double fraction) {
                reported.add(fraction);
            }

            @Override
            public boolean cancelled() {
                asked.incrementAndGet();
                return !reported.isEmpty() && reported.get(reported.size() - 1) >= 0.5;
            }
        };
        CoreException e = assertThrows(CoreException.class,
                () -> MonteCarlo.run(M, A, SPREAD, samples, 3L, OptionalDouble.empty(), halfWay));
        assertEquals(Messages.CANCELLED, e.key());
        assertEquals("the Monte Carlo run was cancelled", e.getMessage());
        double last = reported.get(reported.size() - 1);
        assertTrue(last >= 0.5 && last < 1.0, "stopped at the first check past half way, not at the end: " + last);
        // it was asked between blocks, not once per sample: a few dozen times for 20 blocks
        assertTrue(asked.get() <= 2 * 20 + 2, "asked " + asked.get() + " times");
    }

    @Test
    void anInterruptedThreadStopsTheRunToo() {
        Thread.currentThread().interrupt();
        try {
            CoreException e = assertThrows(CoreException.class,
                    () -> MonteCarlo.run(M, A, SPREAD, 4 * MonteCarlo.BLOCK, 3L, OptionalDouble.empty(), ProgressListener.NONE));
            assertEquals(Messages.CANCELLED, e.key());
        } finally {
            Thread.interrupted(); // leave the test thread clean
        }
    }

    @Test
    void theSameSeedGivesBitIdenticalResultsAsThePlainRun() {
        // Not a multiple of the block, so the last block is short.
        int samples = 3 * MonteCarlo.BLOCK + 77;
        List<Double> reported = new ArrayList<>();
        ProgressListener recording = new ProgressListener() {
            @Override
            public void progress(double fraction) {
                reported.add(fraction);
            }
        };
        MonteCarloResult run = MonteCarlo.run(M, A, SPREAD, samples, 11L, OptionalDouble.of(1e-4), recording);
        assertEquals(1.0, reported.get(reported.size() - 1), 0.0, "a finished run reports all of the work done");
        for (int i = 1; i < reported.size(); i++) {
            assertTrue(reported.get(i) >= reported.get(i - 1), "progress never goes back");
        }

        // The plain route, written here: draws in the documented order, each sample's exact peak.
        Well19937c random = new Well19937c(11L);
        Tolerance[] order = {SPREAD.structureMass(), SPREAD.structureStiffness(), SPREAD.absorberMass(),
            SPREAD.absorberStiffness(), SPREAD.absorberDamping()};
        double[] nominal = {FLOOR.modalMass(), FLOOR.modalStiffness(), A.mass(), A.stiffness(), A.damping()};
        double[] peaks = new double[samples];
        for (int i = 0; i < samples; i++) {
            double[] d = new double[5];
            for (int k = 0; k < 5; k++) {
                Tolerance t = order[k];
                d[k] = t.distribution() == Tolerance.Distribution.UNIFORM ? t.sample(nominal[k], random.nextDouble(), 0)
                        : t.sample(nominal[k], 0, random.nextGaussian());
            }
            peaks[i] = M.peak(new Structure(d[0], d[1], FLOOR.dampingRatio(), FLOOR.modeShapeAtAbsorber()),
                    new Absorber(d[2], d[3], d[4]));
        }
        double mean = 0;
        int above = 0;
        for (int i = 0; i < samples; i++) {
            mean += (peaks[i] - mean) / (i + 1);
            above += peaks[i] > 1e-4 ? 1 : 0;
        }
        double[] sorted = peaks.clone();
        Arrays.sort(sorted);
        assertArrayEquals(bits(mean, MonteCarlo.rank(sorted, 0.5), MonteCarlo.rank(sorted, 0.9),
                MonteCarlo.rank(sorted, 0.95), MonteCarlo.rank(sorted, 0.99), sorted[0], sorted[samples - 1],
                (double) above / samples), bits(run.mean(), run.p50(), run.p90(), run.p95(), run.p99(), run.min(),
                        run.max(), run.probabilityExceeding().getAsDouble()));
        assertEquals(samples, Arrays.stream(run.counts()).sum());

        // and a listener changes nothing
        MonteCarloResult quiet = MonteCarlo.run(M, A, SPREAD, samples, 11L, OptionalDouble.of(1e-4));
        assertArrayEquals(run.binEdges(), quiet.binEdges(), 0.0);
        assertArrayEquals(run.counts(), quiet.counts());
    }

    @Test
    void withoutAToleranceTheRunIsNotMadeAndSaysWhy() {
        AtomicInteger asked = new AtomicInteger();
        ProgressListener counting = new ProgressListener() {
            @Override
            public boolean cancelled() {
                asked.incrementAndGet();
                return false;
            }
        };
        MonteCarloOutcome none = MonteCarloOutcome.of(M, A, ToleranceSet.NONE, 10_000, 1L, OptionalDouble.empty(), counting);
        assertEquals(MonteCarloOutcome.notRun(MonteCarloOutcome.NotRun.NO_TOLERANCES), none);
        assertFalse(none.result().isPresent());
        assertEquals(0, asked.get(), "nothing ran");
        // a tolerance of "none" on every quantity is no tolerance, whatever its value field says
        Tolerance zero = new Tolerance(Tolerance.Distribution.NONE, 0.3, true);
        assertFalse(new ToleranceSet(zero, zero, zero, zero, zero).anyGiven());
        assertTrue(MonteCarloOutcome.of(M, A, SPREAD, 100, 1L, OptionalDouble.empty(), ProgressListener.NONE).result().isPresent());
    }

    private static long[] bits(double... values) {
        return Arrays.stream(values).mapToLong(Double::doubleToLongBits).toArray();
    }
}
