package org.cupel.demo;

import java.util.List;

/**
 * Size and seed of a demo project.
 *
 * @param samples number of routine (drill-core) samples; QC samples come on top at about 1 in 20 each
 * @param seed    seed of the single random stream; the same seed gives byte-identical files
 */
public record DemoSettings(int samples, long seed) {

    /** The seed used when none is given. */
    public static final long DEFAULT_SEED = 20_260_302L;
    /** Routine samples of the default demo: 25 batches of 100. */
    public static final int DEFAULT_SAMPLES = 2_500;
    /** Fewer routine samples would not fill the 20 batches the planted problems are spread over. */
    public static final int MIN_SAMPLES = 500;
    /** Upper bound that keeps sample IDs at seven digits. */
    public static final int MAX_SAMPLES = 5_000_000;
    /** From this size on the demo reports the ten-analyte suite instead of Au and Ag only. */
    public static final int FULL_SUITE_FROM = 10_000;
    /** Routine samples per insertion block: each block gets one sample of every QC role. */
    static final int BLOCK = 20;

    public DemoSettings {
        if (samples < MIN_SAMPLES || samples > MAX_SAMPLES) {
            throw new IllegalArgumentException("the number of demo samples must be between " + MIN_SAMPLES
                    + " and " + MAX_SAMPLES + ", not " + samples);
        }
    }

    public static DemoSettings defaults() {
        return new DemoSettings(DEFAULT_SAMPLES, DEFAULT_SEED);
    }

    /** Au and Ag for small projects, the ten-analyte suite from {@link #FULL_SUITE_FROM} samples on. */
    public List<DemoAnalyte> analytes() {
        return samples >= FULL_SUITE_FROM ? DemoAnalyte.FULL_SUITE : DemoAnalyte.PAY_METALS;
    }

    /**
     * Routine samples per lab batch: a multiple of the insertion block, aiming at about 26 batches and
     * never more than 800 per batch (a realistic lab job), so 2,500 samples give 25 batches of 100 and
     * 1,000,000 give 1,250 batches of 800.
     */
    public int routinePerBatch() {
        long blocks = Math.round(samples / (26.0 * BLOCK));
        return (int) Math.max(1, Math.min(40, blocks)) * BLOCK;
    }

    /** Number of primary-lab batches. */
    public int batches() {
        int per = routinePerBatch();
        return (samples + per - 1) / per;
    }
}
