package org.counterpoise.core.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.Messages;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.robust.MonteCarloOutcome;
import org.counterpoise.io.export.ResultJson;
import org.counterpoise.io.export.RobustnessJson;
import org.counterpoise.io.project.ProjectReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The dossier computes each part once per study (counted through its {@link DesignDossier.Computations}
 * seam, never timed) and gives exactly what the direct route gives: {@link Designer#design},
 * {@link DesignCurves#of} and {@link RobustnessAnalysis#run} called one after the other, as the
 * commands did before the dossier existed.
 */
class DesignDossierTest {
    /** Counts every computation, then runs the core's own. */
    static final class Counting implements DesignDossier.Computations {
        final AtomicInteger designs = new AtomicInteger();
        final AtomicInteger curves = new AtomicInteger();
        final AtomicInteger monteCarlos = new AtomicInteger();
        final AtomicInteger robustness = new AtomicInteger();

        @Override
        public DesignResult design(DesignStudy study) {
            designs.incrementAndGet();
            return DesignDossier.Computations.CORE.design(study);
        }

        @Override
        public DesignCurves curves(DesignResult design) {
            curves.incrementAndGet();
            return DesignDossier.Computations.CORE.curves(design);
        }

        @Override
        public MonteCarloOutcome monteCarlo(DesignResult design, ProgressListener listener) {
            monteCarlos.incrementAndGet();
            return DesignDossier.Computations.CORE.monteCarlo(design, listener);
        }

        @Override
        public RobustnessResult robustness(DesignResult design, MonteCarloOutcome monteCarlo,
                ProgressListener listener) {
            robustness.incrementAndGet();
            return DesignDossier.Computations.CORE.robustness(design, monteCarlo, listener);
        }

        List<Integer> counts() {
            return List.of(designs.get(), curves.get(), monteCarlos.get(), robustness.get());
        }
    }

    static Stream<Path> presets() throws IOException {
        return Files.readAllLines(Path.of("presets", "index.txt")).stream().map(String::strip)
                .filter(l -> !l.isEmpty() && !l.startsWith("#")).map(l -> Path.of("presets", l));
    }

    private static DesignStudy fan() {
        return ProjectReader.readStudy(Path.of("presets", "rooftop-fan-platform.json")); // has tolerances
    }

    @Test
    void eachPartIsComputedOnceHoweverOftenAndInWhateverOrderItIsAskedFor() {
        Counting counting = new Counting();
        DesignDossier d = new DesignDossier(fan(), counting);
        assertEquals(List.of(0, 0, 0, 0), counting.counts(), "nothing is computed before it is asked for");
        d.monteCarlo(ProgressListener.NONE); // the sheet first: design and Monte Carlo only
        assertEquals(List.of(1, 0, 1, 0), counting.counts());
        for (int i = 0; i < 3; i++) {
            d.design();
            d.curves();
            d.robustness(ProgressListener.NONE);
            d.monteCarlo(ProgressListener.NONE);
        }
        assertEquals(List.of(1, 1, 1, 1), counting.counts());
        assertSame(d.monteCarlo(ProgressListener.NONE), d.robustness(ProgressListener.NONE).monteCarlo(),
                "the robustness study carries the one Monte Carlo run");
    }

    @Test
    void threadsAskingAtOnceShareOneComputation() throws Exception {
        Counting counting = new Counting();
        DesignDossier d = new DesignDossier(fan(), counting);
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Callable<RobustnessResult>> askers = new ArrayList<>();
            for (int i = 0; i < 4; i++) {
                askers.add(() -> d.robustness(ProgressListener.NONE));
            }
            List<Future<RobustnessResult>> answers = pool.invokeAll(askers);
            for (Future<RobustnessResult> f : answers) {
                assertSame(answers.get(0).get(), f.get());
            }
        } finally {
            pool.shutdownNow();
        }
        assertEquals(List.of(1, 0, 1, 1), counting.counts());
    }

    @Test
    void aCancelledPartKeepsNothingAndIsComputedAfreshOnTheNextRequest() {
        Counting counting = new Counting();
        DesignDossier d = new DesignDossier(fan(), counting);
        ProgressListener cancelNow = new ProgressListener() {
            @Override
            public boolean cancelled() {
                return true;
            }
        };
        CoreException e = assertThrows(CoreException.class, () -> d.robustness(cancelNow));
        assertEquals(Messages.CANCELLED, e.key());
        assertEquals(List.of(1, 0, 1, 0), counting.counts(), "the Monte Carlo started and stopped; no study ran");
        RobustnessResult r = d.robustness(ProgressListener.NONE);
        assertTrue(r.monteCarlo().result().isPresent(), "the complete run, not a partial one");
        assertEquals(List.of(1, 0, 2, 1), counting.counts());
    }

    @Test
    void theCacheHandsOutOneDossierPerProjectState() {
        Counting counting = new Counting();
        DesignDossier.Cache cache = new DesignDossier.Cache(counting);
        DesignStudy read = fan();
        DesignStudy readAgain = fan(); // a new, equal record: the same project state
        assertEquals(read, readAgain);
        assertNotSame(read, readAgain);
        DesignDossier d = cache.dossier(read);
        d.robustness(ProgressListener.NONE);
        assertSame(d, cache.dossier(readAgain));
        cache.dossier(readAgain).robustness(ProgressListener.NONE);
        cache.dossier(readAgain).curves();
        assertEquals(List.of(1, 1, 1, 1), counting.counts(), "the same state is not computed twice");

        RobustnessSettings s = read.robustness();
        DesignStudy otherSeed = read.withRobustness(new RobustnessSettings(s.structureRange(), s.absorberRange(),
                s.target(), s.tolerances(), s.samples(), s.seed() + 1));
        assertNotSame(d, cache.dossier(otherSeed), "another state, another dossier");
        cache.dossier(otherSeed).monteCarlo(ProgressListener.NONE);
        assertEquals(List.of(2, 1, 2, 1), counting.counts());
    }

    @ParameterizedTest
    @MethodSource("presets")
    void theDossierGivesWhatTheDirectRouteGives(Path preset) {
        DesignStudy study = ProjectReader.readStudy(preset);
        DesignDossier d = DesignDossier.of(study);
        // the direct route, one call after the other
        DesignResult direct = Designer.design(study);
        DesignCurves directCurves = DesignCurves.of(direct);
        RobustnessResult directRobustness = RobustnessAnalysis.run(direct, study.robustness());

        assertEquals(ResultJson.toJson(direct), ResultJson.toJson(d.design()));
        assertEquals(directCurves, d.curves());
        assertEquals(RobustnessJson.toJson(direct, directRobustness),
                RobustnessJson.toJson(d.design(), d.robustness(ProgressListener.NONE)));
        assertEquals(study.robustness().tolerances().anyGiven(),
                d.monteCarlo(ProgressListener.NONE).result().isPresent(),
                "the Monte Carlo runs exactly when a tolerance is given");
    }
}
