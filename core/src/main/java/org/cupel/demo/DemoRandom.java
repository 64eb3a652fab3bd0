package org.cupel.demo;

import java.util.SplittableRandom;

/**
 * The one random stream of the demo generator. Normal deviates come from Marsaglia's polar method on
 * {@link SplittableRandom#nextDouble()} (Marsaglia and Bray, 1964, "A convenient method for generating
 * normal variables", SIAM Review 6(3)), so the output does not depend on how a JDK implements
 * {@code nextGaussian}: same seed, same files, on every Java version.
 */
final class DemoRandom {

    private final SplittableRandom random;
    private double spare;
    private boolean hasSpare;

    DemoRandom(SplittableRandom random) {
        this.random = random;
    }

    /** An independent stream derived deterministically from this one. */
    DemoRandom split() {
        return new DemoRandom(random.split());
    }

    double uniform() {
        return random.nextDouble();
    }

    /** A uniform integer in {@code [0, bound)}. */
    int below(int bound) {
        return random.nextInt(bound);
    }

    double gaussian() {
        if (hasSpare) {
            hasSpare = false;
            return spare;
        }
        double u;
        double v;
        double s;
        do {
            u = 2 * random.nextDouble() - 1;
            v = 2 * random.nextDouble() - 1;
            s = u * u + v * v;
        } while (s >= 1 || s == 0);
        double m = Math.sqrt(-2 * Math.log(s) / s);
        spare = v * m;
        hasSpare = true;
        return u * m;
    }

    /** A multiplicative error {@code exp(sigma Z)} with median 1. */
    double logFactor(double sigma) {
        return Math.exp(sigma * gaussian());
    }
}
