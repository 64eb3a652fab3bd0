package org.cupel.demo;

import java.util.List;

/**
 * One analyte of the invented programme and how the generator draws it.
 *
 * <p>Routine grades are lognormal: {@code ln x = ln(median) + logSd (r z + sqrt(1 - r^2) e)} with
 * {@code z} the gold factor of the drill interval and {@code r = goldCorrelation}. A measurement of true
 * grade {@code c} is {@code c exp(analyticalRsd Z1) + 0.3 DL Z2}: a relative error plus a constant error
 * near detection, the shape Thompson and Howarth (1976, "Duplicate analysis in geochemical practice",
 * Analyst 101) describe for analytical precision. {@code nugget} scales the sampling error of field and
 * coarse-reject duplicates (gold is nuggety, iron is not).
 *
 * @param symbol      element symbol written in the column header
 * @param unit        unit text written in the column header
 * @param method      method text written in the column header
 * @param detectionLimit lower limit of the method, in {@code unit}
 * @param upperLimit  upper limit of the method; Au and Ag above it are re-assayed gravimetrically
 * @param decimals    decimals the lab reports
 * @param median      median routine grade
 * @param logSd       standard deviation of the natural log of routine grade
 * @param goldCorrelation correlation of the log grade with the gold factor
 * @param nugget      multiplier of the field and coarse duplicate sampling error
 * @param capBelowUpper whether true grades are capped at 0.8 of the upper limit (analytes without re-assay)
 */
public record DemoAnalyte(String symbol, String unit, String method, double detectionLimit, double upperLimit,
                          int decimals, double median, double logSd, double goldCorrelation, double nugget,
                          boolean capBelowUpper) {

    static final double ANALYTICAL_RSD = 0.035;

    /** Gold by fire assay with AAS finish: DL 0.005 ppm, upper limit 10 ppm. */
    public static final DemoAnalyte GOLD =
            new DemoAnalyte("Au", "ppm", "FA-AAS", 0.005, 10, 3, 0.1, 1.55, 1.0, 1.0, false);
    /** Silver by aqua regia digest and ICP: DL 0.5 ppm, upper limit 100 ppm. */
    public static final DemoAnalyte SILVER =
            new DemoAnalyte("Ag", "ppm", "AR-ICP", 0.5, 100, 1, 3.0, 1.2, 0.7, 0.5, false);

    /** The two pay metals: the analytes of the default-size demo. */
    public static final List<DemoAnalyte> PAY_METALS = List.of(GOLD, SILVER);

    /** Ten analytes: the pay metals plus the pathfinder and gangue elements of the scaled demo. */
    public static final List<DemoAnalyte> FULL_SUITE = List.of(GOLD, SILVER,
            new DemoAnalyte("Cu", "%", "AR-ICP", 0.001, 10, 3, 0.025, 1.0, 0.35, 0.4, true),
            new DemoAnalyte("Pb", "ppm", "AR-ICP", 2, 10000, 0, 35, 1.0, 0.3, 0.4, true),
            new DemoAnalyte("Zn", "ppm", "AR-ICP", 2, 10000, 0, 70, 0.9, 0.25, 0.4, true),
            new DemoAnalyte("As", "ppm", "AR-ICP", 5, 10000, 0, 150, 1.1, 0.55, 0.4, true),
            new DemoAnalyte("Sb", "ppm", "AR-ICP", 5, 5000, 0, 9, 0.9, 0.4, 0.4, true),
            new DemoAnalyte("S", "%", "AR-ICP", 0.01, 20, 2, 1.1, 0.7, 0.45, 0.3, true),
            new DemoAnalyte("Fe", "%", "AR-ICP", 0.01, 50, 2, 4.2, 0.35, 0.2, 0.2, true),
            new DemoAnalyte("Mo", "ppm", "AR-ICP", 1, 10000, 0, 3, 0.8, 0.1, 0.4, true));

    /** Gold at the umpire lab: same method, a lower-grade calibration (DL 0.01 ppm, upper 100 ppm). */
    static final DemoAnalyte UMPIRE_GOLD =
            new DemoAnalyte("Au", "g/t", "FA-AAS", 0.01, 100, 3, 0.1, 1.55, 1.0, 1.0, false);
    /** Silver at the umpire lab. */
    static final DemoAnalyte UMPIRE_SILVER =
            new DemoAnalyte("Ag", "ppm", "AR-ICP", 0.2, 1000, 1, 3.0, 1.2, 0.7, 0.5, false);
    /** Gold by fire assay with gravimetric finish, for over-limit re-assays. */
    static final DemoAnalyte GRAV_GOLD =
            new DemoAnalyte("Au", "ppm", "FA-GRAV", 0.05, 10000, 2, 0.1, 1.55, 1.0, 1.0, false);
    /** Silver by fire assay with gravimetric finish, for over-limit re-assays. */
    static final DemoAnalyte GRAV_SILVER =
            new DemoAnalyte("Ag", "ppm", "FA-GRAV", 5, 100000, 0, 3.0, 1.2, 0.7, 0.5, false);

    /** The detection limit as a lab writes it ({@code 0.005}). */
    public String detectionLimitText() {
        return FixedDecimal.plain(detectionLimit);
    }

    /** The upper limit as a lab writes it ({@code 10}). */
    public String upperLimitText() {
        return FixedDecimal.plain(upperLimit);
    }

    /** Header text in the underscore form ({@code Au_ppm_FA-AAS}), with a unit spelling of the lab's choice. */
    String header(String unitText, char separator) {
        return symbol + separator + unitText + separator + method;
    }

    /** Standard deviation of the constant measurement error near the detection limit. */
    double absoluteSd() {
        return 0.3 * detectionLimit;
    }
}
