package org.cupel.control.crm;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.Analyte;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodSelector;
import org.cupel.assay.MethodValue;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.cupel.config.CupelConfig;
import org.cupel.project.CrmCatalog;
import org.cupel.project.CrmCertificate;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.Project;
import org.cupel.units.GradeUnit;

/** Builds small in-memory projects with one analyte (Au, g/t) for CRM review tests. */
final class CrmFixture {
    private final SampleTable.Builder table = SampleTable.builder();
    private final AnalyteColumn.Builder au = AnalyteColumn.builder(new Analyte("Au", GradeUnit.G_PER_T));
    private final Map<String, Batch> batches = new HashMap<>();
    private final List<CrmCertificate> certificates = new ArrayList<>();
    private int line = 1;

    CrmFixture certificate(String code, double value, double sd) {
        certificates.add(new CrmCertificate(code, "Au", GradeUnit.G_PER_T, value, sd, Double.NaN, Double.NaN, ""));
        return this;
    }

    CrmFixture batch(String id, LocalDate date) {
        batches.put(id, new Batch(id, "Lab", date, "lab.csv"));
        return this;
    }

    CrmFixture crm(String id, String batch, int position, String code, AssayValue value) {
        return add(id, batch, position, QcRole.CRM, code, value);
    }

    CrmFixture crm(String id, String batch, int position, String code, double value) {
        return crm(id, batch, position, code, AssayValue.detected(value, 0.005));
    }

    CrmFixture routine(String id, String batch, int position, double value) {
        return add(id, batch, position, QcRole.ROUTINE, "", AssayValue.detected(value, 0.005));
    }

    private CrmFixture add(String id, String batch, int position, QcRole role, String ref, AssayValue v) {
        Batch b = batches.computeIfAbsent(batch, k -> new Batch(k, "Lab", null, "lab.csv"));
        int row = table.add(id, b, position, role, ref, new SourceLocation("lab.csv", line++, 0));
        au.add(row, new MethodValue("FA-AAS", v, null));
        return this;
    }

    Project project(CupelConfig config) {
        SampleTable t = table.build();
        AnalyteColumn col = au.build(t.size(), MethodSelector.FIRST);
        return new Project("test", null, config, t, Map.of("Au", col), new CrmCatalog(certificates),
                new ExceptionRegister(), List.of());
    }

    Project project() {
        return project(CupelConfig.defaults());
    }
}
