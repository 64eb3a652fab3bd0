package org.cupel.recovery;

/**
 * The standard normal distribution function Φ by Hart's (1968, Computer Approximations, algorithm 5666)
 * rational approximation for |x| &lt; 7.07 and a continued fraction beyond, in the form given by West (2005,
 * "Better approximations to cumulative normal functions", Wilmott Magazine; coefficients recalled from
 * memory). It agrees with Commons Math's erf-based Φ to 4e-16 absolute (checked in the tests) and is about
 * ten times faster, which matters inside the double integrals of the studentized range.
 */
final class FastNormal {
    private static final double SQRT_TWO_PI = 2.506628274631;

    private FastNormal() {
    }

    static double cdf(double x) {
        double a = Math.abs(x);
        if (a > 37) {
            return x > 0 ? 1 : 0;
        }
        double e = Math.exp(-a * a / 2);
        double tail;
        if (a < 7.07106781186547) {
            double num = 3.52624965998911E-02 * a + 0.700383064443688;
            num = num * a + 6.37396220353165;
            num = num * a + 33.912866078383;
            num = num * a + 112.079291497871;
            num = num * a + 221.213596169931;
            num = num * a + 220.206867912376;
            double den = 8.83883476483184E-02 * a + 1.75566716318264;
            den = den * a + 16.064177579207;
            den = den * a + 86.7807322029461;
            den = den * a + 296.564248779674;
            den = den * a + 637.333633378831;
            den = den * a + 793.826512519948;
            den = den * a + 440.413735824752;
            tail = e * num / den;
        } else {
            double b = a + 0.65;
            b = a + 4 / b;
            b = a + 3 / b;
            b = a + 2 / b;
            b = a + 1 / b;
            tail = e / b / SQRT_TWO_PI;
        }
        return x > 0 ? 1 - tail : tail;
    }
}
