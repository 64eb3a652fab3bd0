package org.cupel.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.List;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSetResult;
import org.cupel.duplicates.OutlierPair;
import org.cupel.report.CsvTables;

/**
 * Every flagged duplicate pair of every set in one CSV ({@code cupel duplicates --flagged-csv FILE}), in the order
 * of the JSON lists: per set, the pairs judged by HARD (largest HARD first), then those below the relative
 * threshold (largest |d| first). Text cells are made spreadsheet-safe ({@link CsvTables#field}); the file is
 * written beside its target and moved into place, so a reader never sees half of it.
 */
final class FlaggedPairsCsv {
    private FlaggedPairsCsv() {
    }

    /** Writes the file; returns the number of pairs written. */
    static int write(List<DuplicateReport> reports, Path target) {
        Path dir = target.toAbsolutePath().getParent();
        Path tmp = null;
        int rows = 0;
        try {
            Files.createDirectories(dir);
            // Beside the target (the move stays on one file system), with the default permissions of a new file.
            tmp = dir.resolve("." + target.getFileName() + "." + ProcessHandle.current().pid() + "."
                    + System.nanoTime() + ".tmp");
            try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8, StandardOpenOption.CREATE_NEW,
                    StandardOpenOption.WRITE)) {
                w.write("analyte,type,list,rank,id,original_id,batch,original,duplicate,hard,abs_difference,tests\r\n");
                for (DuplicateReport r : reports) {
                    for (DuplicateSetResult s : r.sets()) {
                        rows += rows(w, r.analyte(), s, "judged_by_hard", s.outliers());
                        rows += rows(w, r.analyte(), s, "below_relative_threshold", s.outliersBelowRelativeThreshold());
                    }
                }
            }
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            return rows;
        } catch (IOException e) {
            throw new UncheckedIOException("could not write the flagged pairs to " + target + ": " + e.getMessage(), e);
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // The move succeeded or the error above is the one to report.
                }
            }
        }
    }

    private static int rows(Writer w, String analyte, DuplicateSetResult s, String list, List<OutlierPair> pairs)
            throws IOException {
        StringBuilder sb = new StringBuilder(128);
        int rank = 0;
        for (OutlierPair p : pairs) {
            sb.setLength(0);
            sb.append(CsvTables.field(analyte)).append(',').append(s.type().name()).append(',').append(list)
                    .append(',').append(++rank).append(',').append(CsvTables.field(p.id())).append(',')
                    .append(CsvTables.field(p.originalId())).append(',').append(CsvTables.field(p.batch())).append(',')
                    .append(CsvTables.field(p.original())).append(',').append(CsvTables.field(p.duplicate()))
                    .append(',').append(p.hard()).append(',').append(p.absDifference()).append(',')
                    .append(CsvTables.field(p.testLabels())).append("\r\n");
            w.write(sb.toString());
        }
        return rank;
    }
}
