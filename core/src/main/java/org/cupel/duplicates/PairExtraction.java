package org.cupel.duplicates;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.project.InputException;
import org.cupel.project.Project;

/**
 * Pairs every duplicate row of a project (field, coarse-reject and pulp duplicates from the sample
 * register, lab repeats and umpire checks from the lab files) with the original sample its
 * {@link SampleTable#reference(int)} names.
 */
public final class PairExtraction {
    private PairExtraction() {
    }

    /** Pairs and unpaired duplicates of one analyte. */
    public record Extracted(List<DuplicatePair> pairs, List<OrphanDuplicate> orphans) {
        public Extracted {
            pairs = pairs instanceof PairList list ? list : List.copyOf(pairs); // a pair list is not modifiable
            orphans = List.copyOf(orphans);
        }
    }

    public static Extracted extract(Project project, AnalyteColumn column) {
        return extract(project, column, DetectionLimits.of(column));
    }

    /** As {@link #extract(Project, AnalyteColumn)}, filling in limits the values do not state from {@code limits}. */
    public static Extracted extract(Project project, AnalyteColumn column, DetectionLimits limits) {
        return Pairing.of(project.samples()).extract(column, limits);
    }

    /**
     * Which row every duplicate row pairs with, found once per project: the same for every analyte, and the
     * look-up of the original's ID is the costly part of pairing.
     *
     * @param duplicateRows duplicate rows in table order
     * @param originalRows the original's row for each, or −1 when it has none
     * @param orphanReasons why a duplicate has no original, null where it has one
     */
    private record Pairing(SampleTable samples, int[] duplicateRows, int[] originalRows, String[] orphanReasons) {
        static Pairing of(SampleTable samples) {
            int[] dup = new int[samples.size()];
            int[] orig = new int[samples.size()];
            String[] why = new String[samples.size()];
            int k = 0;
            for (int row = 0; row < samples.size(); row++) {
                if (!samples.role(row).isDuplicate()) {
                    continue;
                }
                String ref = samples.reference(row);
                // A duplicate mostly follows its original: that row is compared before hashing.
                int original = ref.isBlank() ? -1 : samples.row(ref, row - 1);
                dup[k] = row;
                orig[k] = original;
                why[k] = original >= 0 ? null : ref.isBlank() ? "no original sample ID is given"
                        : "original sample " + ref + " is not in the project";
                k++;
            }
            return new Pairing(samples, Arrays.copyOf(dup, k), Arrays.copyOf(orig, k), Arrays.copyOf(why, k));
        }

        /**
         * The analyte's pairs as a view of its column ({@link ColumnPairs}): a million-sample project has
         * 250,000 pairs per analyte, and a pair object with its two values for each, held by every analyte at
         * once, was 300 MB of the heap that each young collection had to copy.
         */
        Extracted extract(AnalyteColumn column, DetectionLimits limits) {
            int[] paired = new int[duplicateRows.length];
            List<OrphanDuplicate> orphans = new ArrayList<>();
            int k = 0;
            for (int i = 0; i < duplicateRows.length; i++) {
                int row = duplicateRows[i];
                if (originalRows[i] < 0) {
                    orphans.add(new OrphanDuplicate(samples.id(row), samples.reference(row),
                            samples.batch(row).id(), samples.role(row), orphanReasons[i]));
                } else {
                    paired[k++] = i;
                }
            }
            int[] dup = new int[k];
            int[] orig = new int[k];
            for (int j = 0; j < k; j++) {
                dup[j] = duplicateRows[paired[j]];
                orig[j] = originalRows[paired[j]];
            }
            return new Extracted(new ColumnPairs(samples, column, limits, dup, orig), orphans);
        }
    }

    /** The duplicate report of every analyte of the project, precision stated at the CRM grades by default. */
    public static List<DuplicateReport> analyse(Project project, DuplicateSettings settings) {
        return analyse(project, settings, null, null);
    }

    /**
     * As {@link #analyse(Project, DuplicateSettings)}, for one analyte and/or one duplicate type.
     *
     * @param analyte analyte name, or null for all
     * @param type duplicate type, or null for all
     * @throws InputException when the project has no such analyte
     */
    public static List<DuplicateReport> analyse(Project project, DuplicateSettings settings, String analyte,
                                                QcRole type) {
        if (analyte != null && project.analyte(analyte).isEmpty()) {
            throw new InputException("analyte " + analyte + " is not in project " + project.name() + "; it has "
                    + String.join(", ", project.analyteNames()) + ".");
        }
        List<DuplicateReport> out = new ArrayList<>();
        // One analyte after the other on this thread: each set's analysis may use a spare core.
        for (Supplier<Optional<DuplicateReport>> task : perAnalyte(project, settings, analyte, type, SideTask::start)) {
            task.get().ifPresent(out::add);
        }
        return out;
    }

    /**
     * The work of {@link #analyse(Project, DuplicateSettings)} as one task per analyte, in the project's analyte
     * order; a task gives nothing for an analyte without duplicates. The tasks share only the immutable project
     * and pairing, so they may run on several threads; each gives the same report however they are run. They
     * are meant for a pool that keeps the cores busy with them and other analyses, so each computes its sets on
     * its own thread, without side tasks ({@link SideTask#inPlace}): those would only compete for the same cores.
     */
    public static List<Supplier<Optional<DuplicateReport>>> perAnalyte(Project project, DuplicateSettings settings) {
        return perAnalyte(project, settings, null, null, SideTask::inPlace);
    }

    private static List<Supplier<Optional<DuplicateReport>>> perAnalyte(Project project, DuplicateSettings settings,
                                                                         String analyte, QcRole type,
                                                                         SideTask.Starter side) {
        Pairing pairing = Pairing.of(project.samples());
        List<Supplier<Optional<DuplicateReport>>> tasks = new ArrayList<>();
        for (AnalyteColumn column : project.analytes().values()) {
            if (analyte == null || analyte.equals(column.analyte().name())) {
                tasks.add(() -> analyseColumn(project, pairing, column, settings, type, side));
            }
        }
        return tasks;
    }

    private static Optional<DuplicateReport> analyseColumn(Project project, Pairing pairing, AnalyteColumn column,
                                                           DuplicateSettings settings, QcRole type,
                                                           SideTask.Starter side) {
        String name = column.analyte().name();
        DetectionLimits limits = DetectionLimits.of(column);
        Extracted all = pairing.extract(column, limits);
        Extracted e = type == null ? all : new Extracted(PairList.of(all.pairs()).ofType(type),
                all.orphans().stream().filter(o -> o.type() == type).toList());
        if (e.pairs().isEmpty() && e.orphans().isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(DuplicateAnalysis.run(name, column.analyte().unit().symbol(), e.pairs(), e.orphans(),
                grades(project, name, settings), settings, limits.describe(), side));
    }

    static double[] grades(Project project, String analyte, DuplicateSettings settings) {
        if (!settings.precisionGrades().isEmpty()) {
            return settings.precisionGrades().stream().mapToDouble(Double::doubleValue).toArray();
        }
        return project.catalog().forAnalyte(analyte).stream().mapToDouble(c -> c.certifiedValue()).filter(v -> v > 0)
                .sorted().distinct().toArray();
    }
}
