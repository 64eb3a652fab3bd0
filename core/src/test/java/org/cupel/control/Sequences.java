package org.cupel.control;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.Analyte;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodSelector;
import org.cupel.assay.MethodValue;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.cupel.units.GradeUnit;

/**
 * Builds small sample tables from a run-order code per batch: R routine, C CRM, B blank, F field
 * duplicate, P pulp duplicate, D coarse duplicate, L lab repeat, U umpire check. Sample IDs are batch + "-" + position (1-based).
 */
final class Sequences {
    static final Analyte AU = new Analyte("Au", GradeUnit.G_PER_T);

    private final SampleTable.Builder table = SampleTable.builder();
    private final List<Object[]> values = new ArrayList<>();

    /** Adds a batch; {@code code} like "RRCRRBRR". */
    Sequences batch(String id, String code) {
        Batch b = new Batch(id, "Lab", null, id + ".csv");
        for (int i = 0; i < code.length(); i++) {
            int pos = i + 1;
            table.add(id + "-" + pos, b, pos, role(code.charAt(i)), "", new SourceLocation(id + ".csv", pos + 1, 0));
        }
        return this;
    }

    /** Sets the Au value of a sample. */
    Sequences au(String sampleId, AssayValue v) {
        values.add(new Object[] {sampleId, v});
        return this;
    }

    SampleTable table() {
        return table.build();
    }

    AnalyteColumn column(SampleTable t) {
        AnalyteColumn.Builder c = AnalyteColumn.builder(AU);
        for (Object[] v : values) {
            c.add(t.rowOf((String) v[0]).getAsInt(), new MethodValue("FA-AAS", (AssayValue) v[1], null));
        }
        return c.build(t.size(), MethodSelector.FIRST);
    }

    static QcRole role(char c) {
        switch (c) {
            case 'R': return QcRole.ROUTINE;
            case 'C': return QcRole.CRM;
            case 'B': return QcRole.BLANK;
            case 'F': return QcRole.FIELD_DUPLICATE;
            case 'P': return QcRole.PULP_DUPLICATE;
            case 'D': return QcRole.COARSE_DUPLICATE;
            case 'L': return QcRole.LAB_REPEAT;
            case 'U': return QcRole.UMPIRE;
            default: throw new IllegalArgumentException("role code " + c);
        }
    }

    static ControlOutcome outcome(SampleTable t, String id, Verdict v) {
        return new ControlOutcome(t.rowOf(id).getAsInt(), "Au", v, v == Verdict.FAIL ? "1-3s" : "within 2 SD",
                id + " " + v, v == Verdict.FAIL);
    }
}
