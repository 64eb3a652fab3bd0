package org.cupel.duplicates;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.QcRole;

/** Runs the whole duplicate analysis of one analyte over a list of pairs, per type and per batch. */
public final class DuplicateAnalysis {
    private static final QcRole[] TYPE_ORDER = {QcRole.FIELD_DUPLICATE, QcRole.COARSE_DUPLICATE,
        QcRole.PULP_DUPLICATE, QcRole.LAB_REPEAT, QcRole.UMPIRE};

    private DuplicateAnalysis() {
    }

    /**
     * @param pairs every pair of the analyte, any type
     * @param orphans duplicates that could not be paired (reported, not analysed)
     * @param grades grades at which to state precision from the models
     */
    public static DuplicateReport run(String analyte, String unit, List<DuplicatePair> pairs,
                                      List<OrphanDuplicate> orphans, double[] grades, DuplicateSettings settings) {
        return run(analyte, unit, pairs, orphans, grades, settings, "as stated with each value");
    }

    /**
     * @param detectionLimits where the detection limits came from, for the report
     */
    public static DuplicateReport run(String analyte, String unit, List<DuplicatePair> pairs,
                                      List<OrphanDuplicate> orphans, double[] grades, DuplicateSettings settings,
                                      String detectionLimits) {
        Map<QcRole, List<DuplicatePair>> byType = new EnumMap<>(QcRole.class);
        for (DuplicatePair p : pairs) {
            byType.computeIfAbsent(p.type(), k -> new ArrayList<>()).add(p);
        }
        List<DuplicateSetResult> sets = new ArrayList<>();
        for (QcRole type : TYPE_ORDER) {
            List<DuplicatePair> ofType = byType.get(type);
            if (ofType != null) {
                sets.add(analyseSet(analyte, unit, type, ofType, grades, settings));
            }
        }
        return new DuplicateReport(analyte, unit, settings, sets, orphans, detectionLimits);
    }

    static DuplicateSetResult analyseSet(String analyte, String unit, QcRole type, List<DuplicatePair> pairs,
                                         double[] grades, DuplicateSettings settings) {
        ScreenedPairs screened = PairScreen.screen(pairs, settings);
        ScreenedPairs.Members abs = screened.absolute();
        ScreenedPairs.Members rel = screened.relative();
        PrecisionSummary precision = PrecisionMeasures.summarise(type, screened, settings);
        PrecisionModelResult model = ThompsonHowarth.fit(abs.a(), abs.b(), grades, settings);
        BiasResult bias = BiasAnalysis.compare(type, rel.a(), rel.b());
        List<OutlierPair> outliers = outliers(screened, model, settings.hardLimit(type));
        return new DuplicateSetResult(analyte, unit, type, precision, model, bias, outliers,
                new DuplicateSetResult.PairValues(abs.a(), abs.b(), rel.a(), rel.b()),
                batches(type, pairs, precision.rmsCv(), settings));
    }

    private static List<BatchPrecision> batches(QcRole type, List<DuplicatePair> pairs, Estimate setRmsCv,
                                                DuplicateSettings settings) {
        Map<String, List<DuplicatePair>> byBatch = new LinkedHashMap<>();
        for (DuplicatePair p : pairs) {
            byBatch.computeIfAbsent(p.batch(), k -> new ArrayList<>()).add(p);
        }
        List<BatchPrecision> out = new ArrayList<>();
        for (Map.Entry<String, List<DuplicatePair>> e : byBatch.entrySet()) {
            PrecisionSummary p = PrecisionMeasures.summariseBatch(type, PairScreen.screen(e.getValue(), settings),
                    settings);
            out.add(new BatchPrecision(e.getKey(), p, BatchDispersion.test(p.rmsCv(), setRmsCv),
                    settings.batchTestAlpha()));
        }
        return out;
    }

    private static List<OutlierPair> outliers(ScreenedPairs set, PrecisionModelResult model, double hardLimit) {
        Map<Integer, List<OutlierPair.Test>> flagged = new java.util.TreeMap<>();
        ScreenedPairs.Members abs = set.absolute();
        if (model.available()) {
            boolean[] above = ThompsonHowarth.above(NormalDifferenceConstants.P99, model.thompsonHowarth().model(),
                    abs.a(), abs.b());
            int[] rows = abs.rows();
            for (int i = 0; i < rows.length; i++) {
                if (above[i]) {
                    flagged.computeIfAbsent(rows[i], k -> new ArrayList<>()).add(OutlierPair.Test.ABOVE_99_PERCENT_LINE);
                }
            }
        }
        ScreenedPairs.Members rel = set.relative();
        double[] a = rel.a();
        double[] b = rel.b();
        int[] rows = rel.rows();
        for (int i = 0; i < rows.length; i++) {
            if (PairMeasures.hard(a[i], b[i]) > hardLimit) {
                flagged.computeIfAbsent(rows[i], k -> new ArrayList<>()).add(OutlierPair.Test.OUTSIDE_HARD_LIMIT);
            }
        }
        List<OutlierPair> out = new ArrayList<>();
        flagged.forEach((row, tests) -> out.add(outlier(set.pairs().get(row), tests)));
        out.sort(Comparator.comparingDouble(OutlierPair::hard).reversed());
        return out;
    }

    private static OutlierPair outlier(DuplicatePair p, List<OutlierPair.Test> tests) {
        double a = p.original().value();
        double b = p.duplicate().value();
        return new OutlierPair(p.id(), p.originalId(), p.batch(), p.original().display(), p.duplicate().display(),
                PairMeasures.hard(a, b), tests);
    }
}
