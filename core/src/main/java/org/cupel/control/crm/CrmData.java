package org.cupel.control.crm;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
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
        int[] batchOrder = batchOrder(t.batches());
        Map<String, List<CrmPoint>> byKey = new LinkedHashMap<>();
        Map<String, CrmCertificate> certs = new LinkedHashMap<>();
        Map<String, AnalyteColumn> cols = new LinkedHashMap<>();
        List<CrmException> exceptions = new ArrayList<>();
        for (CrmCertificate c : project.catalog().all()) {
            if (project.analytes().containsKey(c.analyte())) {
                String key = c.code() + "\u0000" + c.analyte();
                byKey.put(key, new ArrayList<>());
                certs.put(key, c);
                cols.put(key, project.analytes().get(c.analyte()));
            }
        }
        for (int row : t.rowsWithRole(QcRole.CRM)) {
            String code = t.reference(row);
            Batch b = t.batch(row);
            for (AnalyteColumn col : project.analytes().values()) {
                AssayValue v = col.value(row);
                if (v.isMissing() && v.missingReason() == MissingReason.NOT_ANALYSED) {
                    continue;
                }
                String analyte = col.analyte().name();
                Optional<CrmCertificate> cert = project.catalog().find(code, analyte);
                if (!project.catalog().contains(code)) {
                    exceptions.add(new CrmException(row, t.id(row), b.id(), code, analyte, v.display(), "unknown CRM code",
                            code.isEmpty() ? "CRM without a code: add the CRM code to the register's reference column"
                                    : "unknown CRM code '" + code + "': add it to crm-catalog.csv or correct the "
                                    + "register"));
                } else if (cert.isEmpty()) {
                    continue;
                } else if (v.isCensored()) {
                    exceptions.add(new CrmException(row, t.id(row), b.id(), code, analyte, v.display(), "censored CRM result",
                            "censored CRM result cannot be compared with the certified value: ask the lab for "
                                    + "a re-assay with a suitable method"));
                } else if (v.isMissing()) {
                    exceptions.add(new CrmException(row, t.id(row), b.id(), code, analyte, v.display(), "no CRM result",
                            "no CRM result (" + v.display() + "): the batch has no control from this CRM"));
                } else {
                    byKey.get(code + "\u0000" + analyte).add(new CrmPoint(row, t.id(row), b.id(),
                            batchOrder[t.batchIndex(row)], b.reported(), t.position(row), v));
                }
            }
        }
        List<CrmSeries> series = new ArrayList<>();
        Comparator<CrmPoint> order = Comparator.comparingInt(CrmPoint::batchOrder)
                .thenComparingInt(CrmPoint::position).thenComparingInt(CrmPoint::row);
        for (Map.Entry<String, List<CrmPoint>> e : byKey.entrySet()) {
            if (!e.getValue().isEmpty()) {
                e.getValue().sort(order);
                series.add(new CrmSeries(cols.get(e.getKey()).analyte(), certs.get(e.getKey()), e.getValue()));
            }
        }
        return new CrmData(series, exceptions);
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
