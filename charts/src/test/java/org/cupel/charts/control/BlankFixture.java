package org.cupel.charts.control;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.cupel.assay.AssayValue;
import org.cupel.control.BlankObservation;
import org.cupel.control.BlankReport;
import org.cupel.control.BlankReview;
import org.cupel.control.BlankSettings;

/** Invented blanks: 6 batches of 10, mostly below DL, some carry-over, one contaminated after 25 g/t. */
final class BlankFixture {
    private BlankFixture() {
    }

    static BlankReport report() {
        return report(6);
    }

    /** {@code batches} batches of 10 blanks; the fourth holds the contaminated one. */
    static BlankReport report(int batches) {
        Random rnd = new Random(7);
        List<BlankObservation> obs = new ArrayList<>();
        double dl = 0.005;
        int row = 0;
        for (int b = 0; b < batches; b++) {
            for (int k = 0; k < 10; k++) {
                double grade = Math.exp(rnd.nextGaussian() * 1.5 - 0.5);
                if (b == 3 && k == 4) {
                    grade = 25.0;
                }
                double blank = 0.002 + 0.002 * grade + Math.abs(rnd.nextGaussian()) * 0.002;
                if (b == 3 && k == 4) {
                    blank = 0.31;
                }
                AssayValue v = blank < dl ? AssayValue.belowDetection(dl)
                        : AssayValue.detected(Math.round(blank * 1000) / 1000.0, dl);
                obs.add(new BlankObservation(row++, "BLK-" + (100 + b * 10 + k), "J" + (b + 1), 20 * k + 5, "Au", "g/t",
                        v, dl, "S-" + row, AssayValue.detected(Math.round(grade * 100) / 100.0, dl)));
            }
        }
        return BlankReview.review(obs, BlankSettings.DEFAULTS);
    }
}
