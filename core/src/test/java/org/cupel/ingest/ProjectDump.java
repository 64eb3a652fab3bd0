package org.cupel.ingest;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.MethodValue;
import org.cupel.assay.SampleTable;
import org.cupel.project.DataIssue;
import org.cupel.project.FileAccount;
import org.cupel.project.Project;

/**
 * Everything a load puts into a {@link Project}, as text: accounts, every exception with its location,
 * every sample and every analyte value (doubles in hexadecimal, so equal text means equal bits), with
 * candidates and selection reasons. The expected texts under testdata/fixtures/ingest/ were written by
 * the reader before column-wise reading (commit ef122a1) with this same dump, so comparing texts checks
 * that the faster reader loads exactly what the old one did.
 */
public final class ProjectDump {
    private ProjectDump() {
    }

    public static String dump(Project p) {
        StringBuilder sb = new StringBuilder();
        for (FileAccount a : p.files()) {
            sb.append("account ").append(a).append('\n');
        }
        for (DataIssue i : p.exceptions().all()) {
            sb.append("issue ").append(i.severity()).append(" [").append(i.sampleId()).append("] ")
                    .append(i.message()).append('\n');
        }
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

    /** SHA-256 of the dump, for projects too large to keep the text of. */
    public static String digest(String dump) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                    .digest(dump.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
