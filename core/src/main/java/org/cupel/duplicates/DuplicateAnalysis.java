package org.cupel.duplicates;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.LimitComparison;
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
        return run(analyte, unit, pairs, orphans, grades, settings, detectionLimits, SideTask::start);
    }

    /**
     * @param side starts the parts of a set's analysis that can run beside the rest
     *     ({@link #analyseSet(String, String, QcRole, List, double[], DuplicateSettings, SideTask.Starter)}):
     *     {@link SideTask#inPlace} where the caller's own pool keeps every core busy already
     */
    static DuplicateReport run(String analyte, String unit, List<DuplicatePair> pairs, List<OrphanDuplicate> orphans,
                               double[] grades, DuplicateSettings settings, String detectionLimits,
                               SideTask.Starter side) {
        PairList all = PairList.of(pairs);
        List<DuplicateSetResult> sets = new ArrayList<>();
        QcRole only = oneType(all);
        if (only != null) {
            // A pairs file of one type: the set is the whole list, without a list of its millions of indices.
            if (Arrays.asList(TYPE_ORDER).contains(only)) {
                sets.add(analyseSet(analyte, unit, only, all, grades, settings, side));
            }
            return new DuplicateReport(analyte, unit, settings, sets, orphans, detectionLimits);
        }
        Map<QcRole, Group> byType = new EnumMap<>(QcRole.class);
        for (int i = 0; i < all.size(); i++) {
            byType.computeIfAbsent(all.type(i), k -> new Group(k.name())).add(i);
        }
        for (QcRole type : TYPE_ORDER) {
            Group ofType = byType.get(type);
            if (ofType != null) {
                sets.add(analyseSet(analyte, unit, type, all.select(ofType.indices()), grades, settings, side));
            }
        }
        return new DuplicateReport(analyte, unit, settings, sets, orphans, detectionLimits);
    }

    /** The type of every pair when they all have the same, else (or when there is none) null. */
    private static QcRole oneType(PairList list) {
        if (list.isEmpty()) {
            return null;
        }
        QcRole first = list.type(0);
        for (int i = 1; i < list.size(); i++) {
            if (list.type(i) != first) {
                return null;
            }
        }
        return first;
    }

    /**
     * The analysis of one set. The Thompson–Howarth fit with the flags that need its model, then the Wilcoxon
     * test, go to a spare core ({@code side}) while this thread computes the precision summary, the rest of the
     * bias and the batches, and then takes back the Wilcoxon test if the spare core has not started it (the two
     * halves then take about the same time). They share nothing but the screened pairs, which no step modifies
     * (each copies what it sorts), so the result is the same whichever thread computes what.
     *
     * @param side starts the side tasks: {@link SideTask#start}, or {@link SideTask#inPlace} for one thread
     */
    static DuplicateSetResult analyseSet(String analyte, String unit, QcRole type, List<DuplicatePair> pairs,
                                         double[] grades, DuplicateSettings settings, SideTask.Starter side) {
        PairList list = PairList.of(pairs);
        boolean oneBatch = !list.isEmpty() && oneBatch(list);
        // The per-pair decisions serve the batches' subsets; a set in one batch has none, so they are dropped as
        // soon as the set is screened (at ten million pairs their values are 160 MB of heap).
        PairScreen.Decisions decisions = oneBatch ? null : PairScreen.decide(list, settings, side);
        ScreenedPairs screened = oneBatch ? PairScreen.decide(list, settings, side).all() : decisions.all();
        ScreenedPairs.Members abs = screened.absolute();
        ScreenedPairs.Members rel = screened.relative();
        SideTask<Modelled> modelled = side.start(() -> {
            PrecisionModelResult model = ThompsonHowarth.fit(abs.sharedA(), abs.sharedB(), grades, settings);
            return new Modelled(model, outliers(screened, model, settings.hardLimit(type)));
        });
        SideTask<TestResult> wilcoxon = side.start(() -> PairedTests.wilcoxon(rel.sharedA(), rel.sharedB()));
        PrecisionSummary precision = PrecisionMeasures.summarise(type, screened, settings);
        BiasResult bias = BiasAnalysis.compare(type, rel.sharedA(), rel.sharedB(), wilcoxon::join);
        List<BatchPrecision> batches = oneBatch ? List.of(wholeSetBatch(type, list.batch(0), screened, precision,
                settings)) : batches(type, list, decisions, precision, settings);
        Modelled m = modelled.join();
        Flagged outliers = m.outliers();
        return new DuplicateSetResult(analyte, unit, type, precision, m.model(), bias, outliers.ranked(),
                outliers.belowThreshold(),
                new DuplicateSetResult.PairValues(abs, rel, outliers.flags(abs),
                        outliers.flags(rel)),
                batches);
    }

    /** The precision model of a set and the pairs it and the HARD limit flag. */
    record Modelled(PrecisionModelResult model, Flagged outliers) {
    }

    /** The one batch of a set in one batch (a pairs file without batches): the set, screened and summarised. */
    private static BatchPrecision wholeSetBatch(QcRole type, String name, ScreenedPairs set,
                                                PrecisionSummary setPrecision, DuplicateSettings settings) {
        BatchRuleTest rule = PrecisionMeasures.batchRule(type, set, settings);
        return batch(name, PrecisionMeasures.summariseWholeSetAsBatch(setPrecision, rule), rule, setPrecision,
                settings);
    }

    /** Per-batch precision, in the order batches first appear; each batch's pairs keep the set's screening. */
    private static List<BatchPrecision> batches(QcRole type, PairList list, PairScreen.Decisions decisions,
                                                PrecisionSummary setPrecision, DuplicateSettings settings) {
        Map<String, Group> byBatch = new LinkedHashMap<>();
        Group last = null;
        for (int i = 0; i < list.size(); i++) {
            String batch = list.batch(i);
            // A batch's pairs mostly come together: the last batch is compared before hashing.
            if (last == null || !last.key.equals(batch)) {
                last = byBatch.computeIfAbsent(batch, Group::new);
            }
            last.add(i);
        }
        List<BatchPrecision> out = new ArrayList<>();
        for (Map.Entry<String, Group> e : byBatch.entrySet()) {
            ScreenedPairs batch = decisions.of(e.getValue().indices());
            BatchRuleTest rule = PrecisionMeasures.batchRule(type, batch, settings);
            out.add(batch(e.getKey(), PrecisionMeasures.summariseBatch(type, batch, settings, rule), rule, setPrecision,
                    settings));
        }
        return out;
    }

    private static boolean oneBatch(PairList list) {
        String first = list.batch(0);
        for (int i = 1; i < list.size(); i++) {
            if (!first.equals(list.batch(i))) {
                return false;
            }
        }
        return true;
    }

    private static BatchPrecision batch(String name, PrecisionSummary p, BatchRuleTest rule, PrecisionSummary set,
                                        DuplicateSettings settings) {
        return new BatchPrecision(name, p, rule, BatchDispersion.test(p.rmsCv(), set.rmsCv()),
                settings.batchTestAlpha());
    }

    /** The indices of one batch's (or one type's, or one list of flagged) pairs, ascending. */
    private static final class Group {
        private final String key;
        private int[] indices = new int[8];
        private int size;

        Group(String key) {
            this.key = key;
        }

        void add(int index) {
            if (size == indices.length) {
                indices = Arrays.copyOf(indices, size * 2);
            }
            indices[size++] = index;
        }

        int[] indices() {
            return Arrays.copyOf(indices, size);
        }
    }

    /**
     * The flagged pairs of a set: those above the 99 % line of the Thompson–Howarth model (over the pairs of
     * absolute measures) and those above the type's HARD limit (over the pairs of relative measures). Pairs used
     * in relative measures come in {@code ranked}, largest HARD first. Pairs whose mean is below the
     * detection-limit multiple are not judged by HARD (near the limit a relative difference says little), so
     * when the 99 % line flags one it goes to {@code belowThreshold}, largest |d| first.
     *
     * @param tests per pair of the set, the tests it failed as bits ({@link #ABOVE_LINE}, {@link #BEYOND_HARD})
     */
    record Flagged(List<OutlierPair> ranked, List<OutlierPair> belowThreshold, byte[] tests) {
        static final byte ABOVE_LINE = FlaggedPairList.ABOVE_LINE;
        static final byte BEYOND_HARD = FlaggedPairList.BEYOND_HARD;

        /** The flags of {@code members}' pairs, in their order: the charts mark what the tables list. */
        DuplicateSetResult.PairFlags flags(ScreenedPairs.Members members) {
            int[] rows = members.sharedRows();
            boolean[] hard = new boolean[rows.length];
            boolean[] line = new boolean[rows.length];
            for (int i = 0; i < rows.length; i++) {
                hard[i] = (tests[rows[i]] & BEYOND_HARD) != 0;
                line[i] = (tests[rows[i]] & ABOVE_LINE) != 0;
            }
            return new DuplicateSetResult.PairFlags(hard, line);
        }
    }

    private static Flagged outliers(ScreenedPairs set, PrecisionModelResult model, double hardLimit) {
        byte[] tests = new byte[set.pairs().size()];
        ScreenedPairs.Members abs = set.absolute();
        if (model.available()) {
            boolean[] above = ThompsonHowarth.above(NormalDifferenceConstants.P99, model.thompsonHowarth().model(),
                    abs.sharedA(), abs.sharedB());
            int[] rows = abs.sharedRows();
            for (int i = 0; i < rows.length; i++) {
                if (above[i]) {
                    tests[rows[i]] |= Flagged.ABOVE_LINE;
                }
            }
        }
        ScreenedPairs.Members rel = set.relative();
        double[] a = rel.sharedA();
        double[] b = rel.sharedB();
        int[] rows = rel.sharedRows();
        boolean[] relative = new boolean[tests.length];
        for (int i = 0; i < rows.length; i++) {
            relative[rows[i]] = true;
            if (LimitComparison.above(PairMeasures.hard(a[i], b[i]), hardLimit)) {
                tests[rows[i]] |= Flagged.BEYOND_HARD;
            }
        }
        Group ranked = new Group("judged by HARD");
        Group low = new Group("below the relative threshold");
        for (int row = 0; row < tests.length; row++) {
            if (tests[row] != 0) {
                (relative[row] ? ranked : low).add(row);
            }
        }
        return new Flagged(FlaggedPairList.descending(set.pairs(), ranked.indices(), tests, PairMeasures::hard),
                FlaggedPairList.descending(set.pairs(), low.indices(), tests, PairMeasures::absDifference), tests);
    }
}
