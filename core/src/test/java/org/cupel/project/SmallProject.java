package org.cupel.project;

import java.time.LocalDate;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.Analyte;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodSelector;
import org.cupel.assay.MethodValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.cupel.config.CupelConfig;
import org.cupel.units.GradeUnit;

/** A hand-made project of three batches from two labs, small enough to count by hand. */
final class SmallProject {
    static final Batch B1 = new Batch("JOB-1", "North Lab", LocalDate.of(2025, 3, 3), "lab1.csv");
    static final Batch B2 = new Batch("JOB-2", "North Lab", LocalDate.of(2025, 3, 10), "lab1.csv");
    static final Batch B3 = new Batch("JOB-3", "South Lab", null, "lab2.csv");

    private SmallProject() {
    }

    static Project build() {
        SampleTable.Builder t = SampleTable.builder();
        AnalyteColumn.Builder au = AnalyteColumn.builder(new Analyte("Au", GradeUnit.G_PER_T));
        int r;
        r = t.add("S1", B1, 1, QcRole.ROUTINE, "", new SourceLocation("lab1.csv", 2, 0));
        au.add(r, new MethodValue("FA-AAS", AssayValue.detected(1.20, 0.005), null));
        r = t.add("S2", B1, 2, QcRole.CRM, "CRM-A", new SourceLocation("lab1.csv", 3, 0));
        au.add(r, new MethodValue("FA-AAS", AssayValue.detected(2.51, 0.005), null));
        r = t.add("S3", B1, 3, QcRole.BLANK, "", new SourceLocation("lab1.csv", 4, 0));
        au.add(r, new MethodValue("FA-AAS", AssayValue.belowDetection(0.005), null));
        r = t.add("S4", B2, 1, QcRole.ROUTINE, "", new SourceLocation("lab1.csv", 5, 0));
        au.add(r, new MethodValue("FA-AAS", AssayValue.aboveUpperLimit(10), null));
        au.add(r, new MethodValue("FA-GRAV", AssayValue.detected(14.2, 0.05), null));
        r = t.add("S5", B2, 2, QcRole.PULP_DUPLICATE, "S4", new SourceLocation("lab1.csv", 6, 0));
        au.add(r, new MethodValue("FA-GRAV", AssayValue.detected(13.9, 0.05), null));
        r = t.add("S6", B3, 1, QcRole.ROUTINE, "", new SourceLocation("lab2.csv", 2, 0));
        au.add(r, new MethodValue("FA-AAS", AssayValue.missing(MissingReason.INSUFFICIENT_SAMPLE), null));
        t.add("S7", B3, 2, QcRole.BLANK, "", new SourceLocation("lab2.csv", 3, 0));
        int rows = t.size();
        // In range beats over-range: the gravimetric finish is reported for S4.
        MethodSelector gravOverRange = (a, c) -> c.size() > 1 ? new MethodSelector.Selection(1, "in range beats >10")
                : new MethodSelector.Selection(0, "only result");
        Map<String, AnalyteColumn> cols = new LinkedHashMap<>();
        cols.put("Au", au.build(rows, gravOverRange));
        ExceptionRegister ex = new ExceptionRegister();
        ex.warn(new SourceLocation("lab1.csv", 5, 4), "S4", ">10", "over-range value", "a number", "re-assay");
        ex.exclude(new SourceLocation("lab2.csv", 3, 3), "S7", "", "blank cell", "a value", "ask the lab");
        ex.exclude(new SourceLocation("lab2.csv", 4, 1), "S8", "S8", "sample not in register", "", "add it");
        ex.warn(SourceLocation.ofFile("register.csv"), "", "", "two header rows", "", "remove one");
        List<FileAccount> files = List.of(new FileAccount("lab1.csv", "lab results", 5, 5, 0),
                new FileAccount("lab2.csv", "lab results", 3, 2, 1));
        return new Project("Tallow test", null, CupelConfig.defaults(), t.build(), cols, CrmCatalog.empty(), ex,
                files);
    }
}
