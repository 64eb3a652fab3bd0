package org.cupel.control.crm;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.IntArrayBuilder;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.project.CrmCatalog;
import org.cupel.project.CrmCertificate;
import org.cupel.project.Project;

/**
 * The CRM results of a project split into series per CRM and analyte, and the results that cannot be
 * judged. Censored results and unknown codes are exceptions; results "not analysed" for an analyte are
 * left out silently (the lab ran a shorter suite), other missing results (not received, insufficient
 * sample) are exceptions. A CRM with no certificate for an analyte has no series for it.
 *
 * @param series one per CRM and analyte, in catalog order of the CRM
 * @param exceptions results listed instead of judged
 */
public record CrmData(List<CrmSeries> series, List<CrmException> exceptions) {
    public CrmData {
        series = List.copyOf(series);
        exceptions = List.copyOf(exceptions);
    }

    public static CrmData of(Project project) {
        SampleTable t = project.samples();
        CrmCatalog catalog = project.catalog();
        List<AnalyteColumn> cols = List.copyOf(project.analytes().values());
        List<String> codes = List.copyOf(catalog.codes());
        // Series slot of every (code, analyte) with a certificate, -1 for none; series in catalog order.
        Map<String, Integer> codeIndex = new HashMap<>();
        int[][] slot = new int[codes.size()][cols.size()];
        List<CrmCertificate> certs = new ArrayList<>();
        List<AnalyteColumn> slotCols = new ArrayList<>();
        for (int c = 0; c < codes.size(); c++) {
            codeIndex.put(codes.get(c), c);
            Arrays.fill(slot[c], -1);
        }
        for (CrmCertificate c : catalog.all()) {
            // A catalog certifies analytes the lab may not have run (Ag on a gold-only job): no series then.
            AnalyteColumn certified = project.analytes().get(c.analyte());
            int a = certified == null ? -1 : cols.indexOf(certified);
            if (a >= 0) {
                slot[codeIndex.get(c.code())][a] = certs.size();
                certs.add(c);
                slotCols.add(cols.get(a));
            }
        }
        // Each series keeps only its rows: the points are read from the table and column when asked for.
        List<IntArrayBuilder> points = new ArrayList<>();
        certs.forEach(c -> points.add(new IntArrayBuilder()));
        int[] crmRows = t.rowsWithRole(QcRole.CRM);
        int[] batchOrder = batchOrder(t.batches());
        int[] orderOfRow = new int[t.size()];
        for (int row : crmRows) {
            orderOfRow[row] = batchOrder[t.batchIndex(row)];
        }
        // Rows in series order (batch date, then position), so every series fills already sorted.
        int[] ordered = org.cupel.control.BatchSequence.inRunOrder(t, crmRows, orderOfRow,
                new int[t.batches().size() + 1]);
        List<Keyed> exceptions = new ArrayList<>();
        for (int row : ordered) {
            String code = t.reference(row);
            Integer c = codeIndex.get(code);
            Batch b = t.batch(row);
            for (int a = 0; a < cols.size(); a++) {
                AnalyteColumn col = cols.get(a);
                AssayValue v = col.value(row);
                if (v.isMissing() && v.missingReason() == MissingReason.NOT_ANALYSED) {
                    continue;
                }
                String analyte = col.analyte().name();
                // Exceptions keep the order of the table (row, then analyte), whatever order rows are read in.
                long key = (long) row * cols.size() + a;
                if (c == null) {
                    exceptions.add(new Keyed(key, new CrmException(row, t.id(row), b.id(), code, analyte, v.display(),
                            "unknown CRM code", code.isEmpty()
                            ? "CRM without a code: add the CRM code to the register's reference column"
                            : "unknown CRM code '" + code + "': add it to crm-catalog.csv or correct the register")));
                } else if (slot[c][a] < 0) {
                    continue;
                } else if (v.isCensored()) {
                    exceptions.add(new Keyed(key, new CrmException(row, t.id(row), b.id(), code, analyte, v.display(),
                            "censored CRM result", "censored CRM result cannot be compared with the certified "
                            + "value: ask the lab for a re-assay with a suitable method")));
                } else if (v.isMissing()) {
                    exceptions.add(new Keyed(key, new CrmException(row, t.id(row), b.id(), code, analyte, v.display(),
                            "no CRM result", "no CRM result (" + v.display() + "): the batch has no control from "
                            + "this CRM")));
                } else {
                    points.get(slot[c][a]).add(row);
                }
            }
        }
        exceptions.sort(Comparator.comparingLong(Keyed::key));
        List<CrmSeries> series = new ArrayList<>();
        for (int k = 0; k < certs.size(); k++) {
            if (points.get(k).size() > 0) {
                series.add(new CrmSeries(slotCols.get(k).analyte(), certs.get(k),
                        PointList.of(t, slotCols.get(k), points.get(k).toArray(), batchOrder)));
            }
        }
        return new CrmData(series, exceptions.stream().map(Keyed::exception).toList());
    }

    private record Keyed(long key, CrmException exception) {
    }

    /** Rank of each batch by date (undated batches last), ties in the order read. */
    static int[] batchOrder(List<Batch> batches) {
        Integer[] idx = new Integer[batches.size()];
        for (int i = 0; i < idx.length; i++) {
            idx[i] = i;
        }
        Comparator<LocalDate> dates = Comparator.nullsLast(Comparator.naturalOrder());
        java.util.Arrays.sort(idx, Comparator.comparing((Integer i) -> batches.get(i).reported(), dates)
                .thenComparingInt(i -> i));
        int[] rank = new int[idx.length];
        for (int r = 0; r < idx.length; r++) {
            rank[idx[r]] = r;
        }
        return rank;
    }
}
