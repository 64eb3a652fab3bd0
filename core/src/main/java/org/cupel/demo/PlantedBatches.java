package org.cupel.demo;

/**
 * Which batches carry which planted problem: fixed fractions of the programme, so the default and the
 * scaled project have the same story (a problem at 44 % of 25 batches is in batch 11, of 1,250 in 550).
 */
final class PlantedBatches {

    final int neverReceived;
    final int swap;
    final int carryOver;
    final int duplicateRow;
    final int poorPulp;
    final int typo;

    PlantedBatches(int batches) {
        neverReceived = (int) (0.20 * batches);
        swap = (int) (0.32 * batches);
        carryOver = (int) (0.44 * batches);
        duplicateRow = (int) (0.52 * batches);
        poorPulp = (int) (0.60 * batches);
        typo = (int) (0.72 * batches);
    }

    /** One batch in nine reports one sample as {@code IS} (insufficient sample). */
    static boolean hasInsufficientSample(int b) {
        return b % 9 == 4;
    }

    /** One batch in eleven reports one sample as {@code NR} (not received). */
    static boolean hasNotReceivedCode(int b) {
        return b % 11 == 7;
    }

    /** Bias of the drifting CRM in batch {@code b}, in certified SDs: 0 in the first batch, the total in the last. */
    static double driftSd(int b, int batches) {
        return batches < 2 ? 0 : DemoGenerator.DRIFT_TOTAL_SD * b / (batches - 1);
    }

    /** The first batch whose expected drift reaches 3 SD, the usual failure line. */
    static int firstBatchBeyondThreeSd(int batches) {
        for (int b = 0; b < batches; b++) {
            if (driftSd(b, batches) >= 3) {
                return b;
            }
        }
        return batches - 1;
    }
}
