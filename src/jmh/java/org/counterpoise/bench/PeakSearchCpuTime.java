package org.counterpoise.bench;

import java.util.List;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.PointAbsorber;

/**
 * Wall time per exact peak search ({@link PeakFinder#over}) over a band, for one absorber on one mode
 * and for two absorbers on one mode (invented non-dimensional cases: mu = 0.05 in all, zeta1 = 0.02,
 * the band 0.8 to 1.2 of the mode's frequency), 100 000 searches a round, five rounds after a round of
 * warm-up; prints each round (docs/performance.md, "The peak search's round-off check"). Run with
 * {@code java -cp target/classes:$HOME/.m2/repository/org/apache/commons/commons-math3/3.6.1/commons-math3-3.6.1.jar
 * org.counterpoise.bench.PeakSearchCpuTime} after {@code mvn -o -q -Pbench -DskipTests compile}.
 */
public final class PeakSearchCpuTime {
    private PeakSearchCpuTime() {
    }

    /** @param args none */
    public static void main(String[] args) {
        ModalStructure mode = ModalStructure.singleMode("p", 1.0, 0.02, 1.0);
        ModalSystem one = ModalSystem.of(mode, List.of(PointAbsorber.tuned("p", 0.05, 0.95, 0.13)));
        ModalSystem two = ModalSystem.of(mode, List.of(PointAbsorber.tuned("p", 0.025, 0.93, 0.08),
                PointAbsorber.tuned("p", 0.025, 1.0, 0.08)));
        for (ModalSystem s : new ModalSystem[] {one, two}) {
            TransferFunction h = s.transferFunction("p", "p");
            double sink = 0;
            for (int round = 0; round < 6; round++) {
                long t0 = System.nanoTime();
                for (int i = 0; i < 100_000; i++) {
                    sink += PeakFinder.over(h, 0.8, 1.2).magnitude();
                }
                if (round > 0) {
                    System.out.printf("absorbers %d: %.2f us per peak search (%s)%n", s.absorbers().size(),
                            (System.nanoTime() - t0) / 1e8, sink > 0);
                }
            }
        }
    }
}
