package org.cupel.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.lang.reflect.Method;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.Supplier;

/**
 * CPU time of one call of each numeric kernel that moved to Commons Statistics (docs/performance.md, "Kept
 * libraries"): the least CPU time per call of the measuring thread over repetitions of a batch of calls, so
 * that other processes on a shared machine (where JMH's wall-clock scores scattered by a factor of 3) do not
 * count. The kernels are called by reflection, so this class runs unchanged against the core classes of
 * another commit put first on the class path: {@code java -cp <core classes>:<its dependencies>:<bench classes>
 * org.cupel.bench.KernelCpuTime <label>}. Prints one tab-separated line per kernel: label, kernel, ns.
 */
public final class KernelCpuTime {
    private KernelCpuTime() {
    }

    static final ThreadMXBean T = ManagementFactory.getThreadMXBean();
    static Object sink;

    static double cpuNsPerCall(Supplier<Object> f, int calls, int reps) {
        for (int i = 0; i < calls * 3; i++) {
            sink = f.get(); // warm-up
        }
        double best = Double.MAX_VALUE;
        for (int r = 0; r < reps; r++) {
            long t0 = T.getCurrentThreadCpuTime();
            for (int i = 0; i < calls; i++) {
                sink = f.get();
            }
            best = Math.min(best, (T.getCurrentThreadCpuTime() - t0) / (double) calls);
        }
        return best;
    }

    static Method m(String cls, String name, Class<?>... types) throws Exception {
        Method m = Class.forName(cls).getDeclaredMethod(name, types);
        m.setAccessible(true);
        return m;
    }

    static Supplier<Object> call(Method m, Object... args) {
        return () -> {
            try {
                return m.invoke(null, args);
            } catch (ReflectiveOperationException e) {
                throw new IllegalStateException(e);
            }
        };
    }

    public static void main(String[] a) throws Exception {
        String which = a[0];
        double[] A = {96.1, 95.4, 96.8};
        double[] B = {94.0, 95.1, 93.2};
        report(which, "StudentizedRange.cdf(3.5; 4, 3.7)", cpuNsPerCall(call(m("org.cupel.recovery.StudentizedRange", "cdf", double.class, int.class, double.class), 3.5, 4, 3.7), 20, 15));
        report(which, "StudentizedRange.quantile(0.95; 4, 3.7)", cpuNsPerCall(call(m("org.cupel.recovery.StudentizedRange", "quantile", double.class, int.class, double.class), 0.95, 4, 3.7), 3, 10));
        report(which, "NoncentralT.cdf(2.4; 3.7, 1.8)", cpuNsPerCall(call(m("org.cupel.recovery.NoncentralT", "cdf", double.class, double.class, double.class), 2.4, 3.7, 1.8), 2000, 15));
        report(which, "WelchTest.test(3 vs 3 smelts)", cpuNsPerCall(call(m("org.cupel.recovery.WelchTest", "test", double[].class, double[].class, double.class), A, B, 0.95), 20000, 15));
        report(which, "BatchRuleTest.of(15 of 20, 90 %)", cpuNsPerCall(call(m("org.cupel.duplicates.BatchRuleTest", "of", int.class, int.class, double.class, double.class), 15, 20, 90.0, 0.05), 20000, 15));
        report(which, "BatchDispersion.upperTail(df 9, 20)", cpuNsPerCall(call(m("org.cupel.duplicates.BatchDispersion", "upperTail", int.class, double.class), 9, 20.0), 50000, 15));
        // Ros plain fit, n values, 40 % below one of three limits (as bench RosBench).
        for (int n : new int[] {5000, 1000000}) {
            Class<?> cs = Class.forName("org.cupel.censored.CensoredSample");
            Object b = cs.getMethod("builder").invoke(null);
            Method below = b.getClass().getMethod("below", double.class);
            Method detected = b.getClass().getMethod("detected", double.class);
            below.setAccessible(true);
            detected.setAccessible(true);
            double[] limits = {0.005, 0.01, 0.02};
            SplittableRandom r = new SplittableRandom(20261202);
            for (int i = 0; i < n; i++) {
                double x = Math.exp(-4.2 + 1.3 * r.nextGaussian());
                double l = limits[r.nextInt(3)];
                if (x < l) {
                    below.invoke(b, l);
                } else {
                    detected.invoke(b, x);
                }
            }
            Method build = b.getClass().getMethod("build");
            build.setAccessible(true);
            Object sample = build.invoke(b);
            report(which, "Ros.fit plain, n = " + n, cpuNsPerCall(call(m("org.cupel.censored.Ros", "fit", cs), sample), n > 10000 ? 2 : 50, n > 10000 ? 5 : 15));
        }
        for (int n : new int[] {1000, 50000}) {
            SplittableRandom r = new SplittableRandom(20261202);
            List<double[]> pairs = new ArrayList<>();
            double[] x = new double[n], y = new double[n];
            for (int i = 0; i < n; i++) {
                double grade = Math.exp(r.nextGaussian() - 1);
                double blank = Math.max(0.005, 0.002 + 0.001 * grade + 0.003 * r.nextGaussian());
                pairs.add(new double[] {Math.rint(grade * 1000) / 1000, Math.rint(blank * 1000) / 1000});
                x[i] = Math.rint(grade * 100) / 100;
                y[i] = Math.rint((grade + 0.05 * r.nextGaussian()) * 100) / 100;
            }
            report(which, "CarryOver.spearman, n = " + n, cpuNsPerCall(call(m("org.cupel.control.CarryOver", "spearman", List.class, List.class), pairs, new ArrayList<String>()), n > 10000 ? 10 : 200, 15));
            report(which, "PairedTests.wilcoxon, n = " + n, cpuNsPerCall(call(m("org.cupel.duplicates.PairedTests", "wilcoxon", double[].class, double[].class), x, y), n > 10000 ? 10 : 200, 15));
        }
    }

    static void report(String which, String what, double ns) {
        System.out.printf("%s\t%s\t%.0f%n", which, what, ns);
    }
}
