package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
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
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;

/**
 * The re-submission list takes the samples the lab reported insufficient or not received, with the lab's own
 * codes, and nothing else that is missing. Expected entries are read off the hand-made table below.
 */
class ResubmitListTest {
    private static final Batch J1 = new Batch("J1", "North Lab", null, "j1.csv");
    private static final Batch J2 = new Batch("J2", "North Lab", null, "j2.csv");

    @Test
    void insufficientAndNotReceivedAreListedInRunOrderWithTheLabsCodes() {
        SampleTable.Builder t = SampleTable.builder();
        // S1 is read before S2 but runs after it in J1 (position 2): the list follows the batch sequence
        // (batches as first met, each in run order), so S2 comes first.
        int s1 = t.add("S1", J1, 2, QcRole.ROUTINE, "", new SourceLocation("j1.csv", 3, 0));
        int s2 = t.add("S2", J1, 1, QcRole.ROUTINE, "", new SourceLocation("j1.csv", 2, 0));
        int s3 = t.add("S3", J2, 1, QcRole.CRM, "K-1", new SourceLocation("j2.csv", 2, 0));
        int s4 = t.add("S4", J2, 2, QcRole.ROUTINE, "", new SourceLocation("j2.csv", 3, 0));
        int s5 = t.add("S5", J2, 3, QcRole.ROUTINE, "", new SourceLocation("j2.csv", 4, 0));
        SampleTable table = t.build();
        AnalyteColumn.Builder au = AnalyteColumn.builder(new Analyte("Au", GradeUnit.G_PER_T));
        AnalyteColumn.Builder ag = AnalyteColumn.builder(new Analyte("Ag", GradeUnit.PPM));
        // S1: insufficient for both analytes, written IS and I.S.
        missing(au, s1, MissingReason.INSUFFICIENT_SAMPLE, "IS");
        missing(ag, s1, MissingReason.INSUFFICIENT_SAMPLE, "I.S.");
        // S2: Au not received, Ag measured.
        missing(au, s2, MissingReason.NOT_RECEIVED, "NR");
        value(ag, s2, 3.1);
        // S3, a CRM: not received for Au (listed: it gave no control); Ag not analysed (not listed).
        missing(au, s3, MissingReason.NOT_RECEIVED, "LNR");
        missing(ag, s3, MissingReason.NOT_ANALYSED, "N/A");
        // S4: a blank cell for Au, measured Ag: nothing to ask of the lab.
        missing(au, s4, MissingReason.BLANK_CELL, "");
        value(ag, s4, 2.0);
        // S5: Au insufficient and Ag not received: one entry per reason.
        missing(au, s5, MissingReason.INSUFFICIENT_SAMPLE, "IS");
        missing(ag, s5, MissingReason.NOT_RECEIVED, "NR");
        List<AnalyteColumn> columns = List.of(au.build(table.size(), MethodSelector.FIRST),
                ag.build(table.size(), MethodSelector.FIRST));
        ResubmitList list = ResubmitList.of(table, BatchSequence.of(table), columns);
        assertEquals(List.of(
                new ResubmitEntry("S2", "J1", "North Lab", 1, "routine", MissingReason.NOT_RECEIVED, List.of("NR"),
                        List.of("Au"), new SourceLocation("j1.csv", 2, 0)),
                new ResubmitEntry("S1", "J1", "North Lab", 2, "routine", MissingReason.INSUFFICIENT_SAMPLE,
                        List.of("IS", "I.S."), List.of("Au", "Ag"), new SourceLocation("j1.csv", 3, 0)),
                new ResubmitEntry("S3", "J2", "North Lab", 1, "CRM", MissingReason.NOT_RECEIVED, List.of("LNR"),
                        List.of("Au"), new SourceLocation("j2.csv", 2, 0)),
                new ResubmitEntry("S5", "J2", "North Lab", 3, "routine", MissingReason.NOT_RECEIVED, List.of("NR"),
                        List.of("Ag"), new SourceLocation("j2.csv", 4, 0)),
                new ResubmitEntry("S5", "J2", "North Lab", 3, "routine", MissingReason.INSUFFICIENT_SAMPLE,
                        List.of("IS"), List.of("Au"), new SourceLocation("j2.csv", 4, 0))),
                list.entries());
        assertEquals(2, list.count(MissingReason.INSUFFICIENT_SAMPLE));
        assertEquals(3, list.count(MissingReason.NOT_RECEIVED));
        assertEquals("insufficient sample", list.entries().get(1).reasonText());
        assertEquals("not received", list.entries().get(0).reasonText());
    }

    @Test
    void aCodeNotKnownLeavesTheCodesEmpty() {
        SampleTable.Builder t = SampleTable.builder();
        int s1 = t.add("S1", J1, 1, QcRole.ROUTINE, "", new SourceLocation("j1.csv", 2, 0));
        SampleTable table = t.build();
        AnalyteColumn.Builder au = AnalyteColumn.builder(new Analyte("Au", GradeUnit.G_PER_T));
        au.add(s1, new MethodValue("FA-AAS", AssayValue.missing(MissingReason.INSUFFICIENT_SAMPLE), null));
        ResubmitList list = ResubmitList.of(table, BatchSequence.of(table),
                List.of(au.build(table.size(), MethodSelector.FIRST)));
        assertEquals(List.of(), list.entries().get(0).labCodes());
    }

    private static void missing(AnalyteColumn.Builder c, int row, MissingReason reason, String code) {
        c.add(row, new MethodValue("FA-AAS", AssayValue.missing(reason), null));
        if (!code.isEmpty()) {
            c.missingCode(row, code);
        }
    }

    private static void value(AnalyteColumn.Builder c, int row, double v) {
        c.add(row, new MethodValue("FA-AAS", AssayValue.detected(v, 0.01), null));
    }
}
