package org.cupel.ingest;

import java.math.BigDecimal;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeMap;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodValue;
import org.cupel.assay.QcRole;
import org.cupel.assay.Sample;
import org.cupel.assay.SampleTable;
import org.cupel.project.DataIssue;
import org.cupel.project.FileAccount;
import org.cupel.project.Project;

/**
 * Everything a load puts into a {@link Project}, as text: accounts, every exception with its location,
 * every sample and every analyte value (doubles in hexadecimal, so equal text means equal bits), with
 * candidates and selection reasons. The messy fixture's golden text (testdata/golden/ingest-messy-project.txt)
 * was first written by the reader before column-wise reading (commit ef122a1) with this same dump, so
 * comparing texts checks that the faster reader loads exactly what the old one did; {@link #summary} is the
 * compact form for the demo project.
 */
public final class ProjectDump {
    private ProjectDump() {
    }

    public static String dump(Project p) {
        StringBuilder sb = accountsAndIssues(p);
        SampleTable t = p.samples();
        for (int r = 0; r < t.size(); r++) {
            sb.append("sample ").append(r).append(' ').append(t.sample(r)).append('\n');
        }
        for (AnalyteColumn c : p.analytes().values()) {
            sb.append("analyte ").append(c.analyte()).append(' ').append(c.reportedMethodCounts()).append('\n');
            for (int r = 0; r < c.size(); r++) {
                sb.append(r).append(' ').append(c.qualifier(r)).append(' ').append(Double.toHexString(c.number(r)))
                        .append(' ').append(Double.toHexString(c.limit(r))).append(' ').append(c.value(r).missingReason())
                        .append(' ').append(c.method(r)).append(' ').append(c.selectionReason(r));
                if (c.candidates(r).size() > 1) {
                    for (MethodValue m : c.candidates(r)) {
                        sb.append(" | ").append(m.method()).append(' ').append(m.value().qualifier()).append(' ')
                                .append(Double.toHexString(m.value().value())).append(' ')
                                .append(Double.toHexString(m.value().limit())).append(' ').append(m.source());
                    }
                }
                sb.append('\n');
            }
        }
        return sb.toString();
    }

    /** Every file account and every exceptions-register entry, one a line. */
    private static StringBuilder accountsAndIssues(Project p) {
        StringBuilder sb = new StringBuilder();
        for (FileAccount a : p.files()) {
            sb.append("account ").append(a).append('\n');
        }
        for (DataIssue i : p.exceptions().all()) {
            sb.append("issue ").append(i.severity()).append(" [").append(i.sampleId()).append("] ")
                    .append(i.message()).append('\n');
        }
        return sb;
    }

    /**
     * The compact form of {@link #dump} for a large project, one line per kind of thing rather than per row:
     * every file account and exception in full; each batch with its rows and its samples per QC role (and how
     * many carry a reference); and each analyte's cells by class (qualifier, missing reason, method, selection
     * reason, number of candidates, decimals written) with their count and the exact decimal sums of their
     * values and limits, each value taken as its shortest round-trip decimal ({@link Double#toString}), which
     * differs for any two different doubles, so that a change of one value anywhere changes a sum.
     */
    public static String summary(Project p) {
        StringBuilder sb = accountsAndIssues(p);
        SampleTable t = p.samples();
        Map<Batch, BatchRows> batches = new LinkedHashMap<>();
        for (int r = 0; r < t.size(); r++) {
            Sample s = t.sample(r);
            batches.computeIfAbsent(s.batch(), b -> new BatchRows()).add(r, s);
        }
        batches.forEach((b, rows) -> sb.append("batch ").append(b).append(' ').append(rows).append('\n'));
        for (AnalyteColumn c : p.analytes().values()) {
            sb.append("analyte ").append(c.analyte()).append(' ').append(c.reportedMethodCounts()).append('\n');
            Map<String, CellClass> classes = new TreeMap<>();
            for (int r = 0; r < c.size(); r++) {
                String key = c.qualifier(r) + " " + c.value(r).missingReason() + " " + c.method(r) + " ["
                        + c.selectionReason(r) + "] candidates " + c.candidates(r).size() + " decimals "
                        + c.decimals(r);
                classes.computeIfAbsent(key, k -> new CellClass()).add(c.number(r), c.limit(r));
            }
            classes.forEach((k, v) -> sb.append("cells ").append(c.analyte().name()).append(' ').append(k)
                    .append(": ").append(v).append('\n'));
        }
        return sb.toString();
    }

    /** A batch's first and last row and its samples per role. */
    private static final class BatchRows {
        private int first = -1;
        private int last;
        private final Map<QcRole, int[]> roles = new EnumMap<>(QcRole.class);

        void add(int row, Sample s) {
            first = first < 0 ? row : first;
            last = row;
            int[] n = roles.computeIfAbsent(s.role(), k -> new int[2]);
            n[0]++;
            n[1] += s.reference().isEmpty() ? 0 : 1;
        }

        @Override
        public String toString() {
            StringBuilder sb = new StringBuilder("rows ").append(first).append('-').append(last).append(':');
            roles.forEach((role, n) -> sb.append(' ').append(role).append(' ').append(n[0])
                    .append(n[1] > 0 ? " (" + n[1] + " with reference)" : ""));
            return sb.toString();
        }
    }

    /** Count and exact sums of the values and limits of one class of cells (NaN counted apart). */
    private static final class CellClass {
        private int n;
        private int nanValues;
        private int nanLimits;
        private BigDecimal values = BigDecimal.ZERO;
        private BigDecimal limits = BigDecimal.ZERO;

        void add(double value, double limit) {
            n++;
            if (Double.isNaN(value)) {
                nanValues++;
            } else {
                values = values.add(BigDecimal.valueOf(value));
            }
            if (Double.isNaN(limit)) {
                nanLimits++;
            } else {
                limits = limits.add(BigDecimal.valueOf(limit));
            }
        }

        @Override
        public String toString() {
            return "n " + n + ", value sum " + values.stripTrailingZeros().toPlainString()
                    + (nanValues > 0 ? " (" + nanValues + " NaN)" : "") + ", limit sum "
                    + limits.stripTrailingZeros().toPlainString() + (nanLimits > 0 ? " (" + nanLimits + " NaN)" : "");
        }
    }
}
