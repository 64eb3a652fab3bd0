package org.cupel.ingest;

import java.util.List;
import org.cupel.assay.Numbers;
import org.cupel.assay.SourceLocation;
import org.cupel.project.CrmCertificate;
import org.cupel.project.DataIssue;

/**
 * Two catalog rows for one CRM and analyte. The catalog keeps one certificate per CRM and analyte, the first
 * row; a later row is left out. When the later row repeats the first (same value and SD, in whatever unit),
 * that is all there is to say. When it differs (a mistyped value, another lot under the same code, a value
 * ten times off), the results of that CRM are judged against a certificate in doubt: the later row is listed
 * as left out and the row in use gets a warning, each naming both rows with file and line, the two values,
 * which one is used and how to fix the catalog.
 */
final class CatalogConflicts {
    /** Values equal to this relative tolerance are the same certificate written twice (unit conversions round). */
    private static final double SAME = 1e-9;

    /** A usable catalog row: where it is and its certificate in the unit it was written in. */
    record Row(SourceLocation where, CrmCertificate certificate) {
    }

    private CatalogConflicts() {
    }

    /** The register entries for {@code later}, a second row for the CRM and analyte of {@code first}. */
    static List<DataIssue> issues(Row first, Row later) {
        CrmCertificate a = first.certificate();
        CrmCertificate b = later.certificate().in(a.unit());
        String crm = a.code() + " " + a.analyte();
        long firstLine = first.where().line();
        if (same(a.certifiedValue(), b.certifiedValue()) && same(a.sd(), b.sd())) {
            return List.of(new DataIssue(DataIssue.Severity.EXCLUDED, later.where(), a.code(), describe(later),
                    crm + " repeats the certificate on line " + firstLine + "; the repeat is left out",
                    "one row per CRM and analyte", "delete the repeated row of the catalog"));
        }
        String both = place(first) + " gives " + describe(first) + " and " + place(later) + " gives "
                + describe(later) + ratio(a, b);
        String fix = "check the certificate and delete the wrong row of the catalog, or give the two materials "
                + "different CRM codes";
        DataIssue left = new DataIssue(DataIssue.Severity.EXCLUDED, later.where(), a.code(), describe(later),
                crm + " is certified twice with different values: " + both + "; line " + firstLine
                        + " is used and this row is left out", "one certificate per CRM and analyte", fix);
        DataIssue used = new DataIssue(DataIssue.Severity.WARNING, first.where(), a.code(), describe(first),
                "the certificate used for " + crm + " is in doubt: " + both + "; the " + a.code() + " results are "
                        + "judged against line " + firstLine + " until the catalog is corrected",
                "one certificate per CRM and analyte", fix);
        return List.of(left, used);
    }

    private static String describe(Row r) {
        CrmCertificate c = r.certificate();
        return c.valueText() + " " + c.unit().symbol() + " (SD " + c.sdText()
                + (c.method().isEmpty() ? "" : ", " + c.method()) + ")";
    }

    private static String place(Row r) {
        return r.where().file() + ":" + r.where().line();
    }

    /** ", 10× the first" when the values differ by a factor a reader should see at once (1.5 or more). */
    private static String ratio(CrmCertificate a, CrmCertificate b) {
        if (!(a.certifiedValue() > 0) || !(b.certifiedValue() > 0)) {
            return "";
        }
        double r = b.certifiedValue() / a.certifiedValue();
        return r >= 1.5 || r <= 1 / 1.5 ? ", " + Numbers.compact(r) + "× the first" : "";
    }

    private static boolean same(double x, double y) {
        return Math.abs(x - y) <= SAME * Math.max(Math.abs(x), Math.abs(y));
    }
}
