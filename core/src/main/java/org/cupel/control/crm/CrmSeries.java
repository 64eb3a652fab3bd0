package org.cupel.control.crm;

import java.util.List;
import org.cupel.assay.Analyte;
import org.cupel.project.CrmCertificate;

/**
 * The numeric results of one CRM for one analyte, in time and sequence order (batch date, then batch
 * order read, then position in batch).
 */
public record CrmSeries(Analyte analyte, CrmCertificate certificate, List<CrmPoint> points) {
    public CrmSeries {
        points = List.copyOf(points);
    }

    public String crm() {
        return certificate.code();
    }
}
