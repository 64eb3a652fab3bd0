package org.cupel.control.crm;

import java.util.List;
import org.cupel.assay.Analyte;
import org.cupel.project.CrmCertificate;

/**
 * The numeric results of one CRM for one analyte, in time and sequence order (batch date, then batch
 * order read, then position in batch). The points of a project's series are read from its sample table and
 * analyte column when asked for; only their rows are kept.
 */
public record CrmSeries(Analyte analyte, CrmCertificate certificate, List<CrmPoint> points) {
    public CrmSeries {
        points = PointList.of(points);
    }

    /** The points, their fields readable by index. */
    PointList pointList() {
        return (PointList) points;
    }

    public String crm() {
        return certificate.code();
    }
}
