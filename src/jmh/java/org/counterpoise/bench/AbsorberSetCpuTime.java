package org.counterpoise.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Supplier;
import org.counterpoise.core.optim.AbsorberSetOptimiser;
import org.counterpoise.core.optim.AbsorberSetOptimum;
import org.counterpoise.core.optim.AbsorberSetProblem;
import org.counterpoise.core.optim.AbsorberSetTuning;

/**
 * CPU time of the measuring thread ({@link ThreadMXBean#getCurrentThreadCpuTime}) per certified
 * optimum of {@link AbsorberSetBenchmark}'s four problems, beside the wall time, for a machine whose
 * cores are shared (docs/performance.md, "Several absorbers on one mode"). Each problem: warm-up
 * rounds, then measured rounds of a few optima each; prints the least and the median per optimum,
 * the evaluations counted by the optimiser, and the optimum itself to 17 digits (so that two
 * builds can be compared for the same answer). Run with
 * {@code java -cp target/classes:$HOME/.m2/repository/org/apache/commons/commons-math3/3.6.1/commons-math3-3.6.1.jar
 * org.counterpoise.bench.AbsorberSetCpuTime [rounds [name...]]} after {@code mvn -o -q -Pbench -DskipTests compile} (the
 * core needs only Commons Math).
 */
public final class AbsorberSetCpuTime {
    private AbsorberSetCpuTime() {
    }

    /**
     * @param args optional: measured rounds (default 7), then the names of the problems to measure
     *     (default all four)
     */
    public static void main(String[] args) {
        int rounds = args.length > 0 ? Integer.parseInt(args[0]) : 7;
        AbsorberSetProblem twoUniform = AbsorberSetProblem.allFrequencies(2, 0.05, 0.02, AbsorberSetTuning.UNIFORM);
        AbsorberSetProblem threeUniform = AbsorberSetProblem.allFrequencies(3, 0.05, 0.02, AbsorberSetTuning.UNIFORM);
        List<String> only = Arrays.asList(args).subList(Math.min(1, args.length), args.length);
        measure("twoUniform", () -> AbsorberSetOptimiser.optimise(twoUniform), rounds, only);
        measure("twoIndividual", () -> AbsorberSetOptimiser.optimise(twoUniform.with(AbsorberSetTuning.INDIVIDUAL)),
                rounds, only);
        measure("threeUniform", () -> AbsorberSetOptimiser.optimise(threeUniform), rounds, only);
        measure("threeIndividual",
                () -> AbsorberSetOptimiser.optimise(threeUniform.with(AbsorberSetTuning.INDIVIDUAL)), rounds, only);
    }

    private static void measure(String name, Supplier<AbsorberSetOptimum> run, int rounds, List<String> only) {
        if (!only.isEmpty() && !only.contains(name)) {
            return;
        }
        ThreadMXBean bean = ManagementFactory.getThreadMXBean();
        AbsorberSetOptimum last = null;
        for (int i = 0; i < 3; i++) {
            long warm = System.nanoTime();
            while (System.nanoTime() - warm < 2_000_000_000L) {
                last = run.get();
            }
        }
        int perRound = 5;
        List<Double> cpu = new ArrayList<>();
        List<Double> wall = new ArrayList<>();
        for (int r = 0; r < rounds; r++) {
            long c0 = bean.getCurrentThreadCpuTime();
            long w0 = System.nanoTime();
            for (int i = 0; i < perRound; i++) {
                last = run.get();
            }
            cpu.add((bean.getCurrentThreadCpuTime() - c0) / 1e6 / perRound);
            wall.add((System.nanoTime() - w0) / 1e6 / perRound);
        }
        double[] c = cpu.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        double[] w = wall.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        System.out.printf("%-16s cpu least %7.2f median %7.2f ms | wall least %7.2f median %7.2f ms | evaluations %d%n",
                name, c[0], c[c.length / 2], w[0], w[w.length / 2], last.evaluations());
        System.out.printf("  peak %.17g f %s zeta %s certified %s scanBest %.17g least %.17g stat %.17g%n",
                last.peak(), digits(last.design().tuningRatios()), digits(last.design().dampingRatios()),
                last.certificate().certified(), last.certificate().scanBest(), last.certificate().perturbationLeast(),
                last.certificate().stationarity());
    }

    private static String digits(List<Double> values) {
        return Arrays.toString(values.stream().map(x -> String.format("%.17g", x)).toArray());
    }
}
