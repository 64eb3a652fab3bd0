package org.cupel.ingest;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Predicate;
import org.apache.poi.openxml4j.exceptions.InvalidFormatException;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackageAccess;
import org.apache.poi.openxml4j.util.ZipSecureFile;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.xssf.usermodel.XSSFCell;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.cupel.assay.Numbers;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;

/**
 * Reads one sheet of an XLSX workbook into records, with POI's zip-bomb guards on. Numbers are written
 * as the shortest decimal that reads back as the stored double (not as the cell's display format, which
 * may round 0.005 to 0.01); dates as ISO dates; formulas as their cached results, with one warning; a
 * formula without a cached result (a workbook written by a program that does not calculate) is left out
 * with an exception naming its cell ({@code Sheet1!C7}), never read as 0.
 *
 * <p>One sheet is read: the first, or {@code ingest.sheet}. Reading every sheet is not well defined (a
 * sheet may be a cover page, a second batch, a pivot of the first, or notes with numbers), and a sheet
 * without a recognisable header cannot be told from a cover page, so when the workbook has other sheets
 * a warning lists every sheet, read or not, and says which of the others hold a table with a sample-ID
 * column.
 *
 * <p>A workbook that POI refuses (a zip bomb, a document type declaration, a damaged package) gives one
 * sentence of Cupel's own, never the library's multi-line advice. POI's logging is switched off in
 * {@code log4j2.component.properties} (resources of this module) so that nothing is printed besides
 * Cupel's output.
 */
final class XlsxSheetReader {
    /** The in-memory workbook model needs ~50x the file size; larger workbooks should be CSV. */
    static final long MAX_FILE_BYTES = 50L << 20;
    /** Largest uncompressed part (sheet XML) accepted. */
    static final long MAX_ENTRY_BYTES = 1L << 30;
    /** Compression ratio below which an entry is treated as a zip bomb (POI's guard, set explicitly). */
    static final double MIN_INFLATE_RATIO = 0.01;
    /** How far down a sheet a header row is looked for, as in text files. */
    private static final int HEADER_SEARCH_ROWS = TableAssembler.MAX_ROWS_BEFORE_HEADER;

    private XlsxSheetReader() {
    }

    /**
     * @param sheetName the sheet to read, or null/empty for the first
     * @param isHeaderRow which row is the header (to tell the other sheets that hold a table)
     */
    static List<RawRow> read(Path path, String file, String sheetName, Predicate<List<String>> isHeaderRow,
                             List<DataIssue> warnings) {
        checkSize(path, file);
        ZipSecureFile.setMinInflateRatio(MIN_INFLATE_RATIO);
        ZipSecureFile.setMaxEntrySize(MAX_ENTRY_BYTES);
        OPCPackage pkg = null;
        try {
            pkg = OPCPackage.open(path.toFile(), PackageAccess.READ);
            XSSFWorkbook wb = new XSSFWorkbook(pkg);
            Sheet sheet = pickSheet(wb, file, sheetName);
            List<RawRow> rows = rows(sheet, file, warnings);
            noteOtherSheets(wb, sheet, file, isHeaderRow, warnings);
            return rows;
        } catch (InvalidFormatException | IOException | RuntimeException e) {
            if (e instanceof InputException) {
                throw (InputException) e;
            }
            throw new InputException(file + ": " + refusal(e) + "; open it in a spreadsheet and save it again as "
                    + ".xlsx, or save the sheet as CSV UTF-8.", e);
        } finally {
            if (pkg != null) {
                pkg.revert();
            }
        }
    }

    /** Why POI refused the workbook, in one clause of Cupel's own words (the cause chain is searched). */
    static String refusal(Throwable e) {
        String all = causes(e);
        if (all.contains("zip bomb") || all.contains("inflate ratio") || all.contains("max entry size")
                || all.contains("maxentrysize")) {
            return "the workbook expands to far more data than its size (a possible zip bomb), so it was not opened";
        }
        if (all.contains("doctype")) {
            return "the workbook contains an XML document type declaration (DOCTYPE), which spreadsheets never write "
                    + "and which can hide an entity-expansion attack, so it was not read";
        }
        return "not a readable XLSX workbook (the package is damaged or is not a workbook)";
    }

    /** The messages of {@code e} and its causes, lower-case, for {@link #refusal}. */
    private static String causes(Throwable e) {
        StringBuilder sb = new StringBuilder();
        for (Throwable t = e; t != null && sb.length() < 10_000; t = t.getCause() == t ? null : t.getCause()) {
            sb.append(t.getClass().getSimpleName()).append(' ').append(t.getMessage()).append('\n');
        }
        return sb.toString().toLowerCase(Locale.ROOT);
    }

    private static void checkSize(Path path, String file) {
        try {
            long size = Files.size(path);
            if (size > MAX_FILE_BYTES) {
                throw new InputException(file + ": the workbook is " + (size >> 20) + " MB, larger than the "
                        + (MAX_FILE_BYTES >> 20) + " MB accepted for XLSX; save the sheet as CSV UTF-8 instead.");
            }
        } catch (IOException e) {
            throw new InputException(file + ": the file could not be read (" + MessageText.clip(String.valueOf(
                    e.getMessage())) + "); check the path and permissions.", e);
        }
    }

    private static Sheet pickSheet(XSSFWorkbook wb, String file, String sheetName) {
        if (wb.getNumberOfSheets() == 0) {
            throw new InputException(file + ": the workbook has no sheet; expected one sheet holding the table.");
        }
        if (sheetName == null || sheetName.isBlank()) {
            return wb.getSheetAt(0);
        }
        Sheet s = wb.getSheet(sheetName);
        if (s == null) {
            throw new InputException(file + ": no sheet named '" + MessageText.clip(sheetName) + "' (the workbook has "
                    + MessageText.list(sheetNames(wb)) + "); set ingest.sheet to one of these.");
        }
        return s;
    }

    private static List<String> sheetNames(XSSFWorkbook wb) {
        List<String> names = new ArrayList<>();
        wb.forEach(x -> names.add(x.getSheetName()));
        return names;
    }

    /**
     * One warning when the workbook has sheets besides the one read, listing every sheet: the one read,
     * those that hold a table with a recognised header (results that were not read) and the others.
     */
    private static void noteOtherSheets(XSSFWorkbook wb, Sheet read, String file, Predicate<List<String>> isHeaderRow,
                                        List<DataIssue> warnings) {
        List<String> withTable = new ArrayList<>();
        List<String> others = new ArrayList<>();
        for (Sheet s : wb) {
            if (s != read) {
                (holdsTable(s, isHeaderRow) ? withTable : others).add("'" + s.getSheetName() + "'");
            }
        }
        if (withTable.isEmpty() && others.isEmpty()) {
            return;
        }
        StringBuilder problem = new StringBuilder("only sheet '").append(read.getSheetName())
                .append("' of the ").append(wb.getNumberOfSheets()).append(" sheets was read");
        if (!withTable.isEmpty()) {
            problem.append("; not read, though they hold a table with a sample-ID column: ")
                    .append(String.join(", ", withTable));
        }
        if (!others.isEmpty()) {
            problem.append("; not read, without a recognised table: ").append(String.join(", ", others));
        }
        warnings.add(new DataIssue(DataIssue.Severity.WARNING, SourceLocation.ofFile(file), "",
                MessageText.shorten(String.join(", ", sheetNames(wb))), problem.toString(),
                "one sheet of results per workbook",
                withTable.isEmpty() ? "nothing to do if those sheets hold no results; set ingest.sheet to read another"
                        : "save each sheet of results as its own file (CSV UTF-8), or set ingest.sheet to read another"));
    }

    /** Whether a row near the top of {@code sheet} is a header row (a sample-ID column). */
    private static boolean holdsTable(Sheet sheet, Predicate<List<String>> isHeaderRow) {
        for (Row row : sheet) {
            if (row.getRowNum() >= HEADER_SEARCH_ROWS) {
                return false;
            }
            List<String> cells = new ArrayList<>();
            for (int c = 0; c < Math.max(row.getLastCellNum(), 0); c++) {
                cells.add(text(row.getCell(c)).strip());
            }
            if (isHeaderRow.test(cells)) {
                return true;
            }
        }
        return false;
    }

    private static List<RawRow> rows(Sheet sheet, String file, List<DataIssue> warnings) {
        List<RawRow> out = new ArrayList<>();
        int formulas = 0;
        SourceLocation firstFormula = null;
        for (Row row : sheet) {
            List<String> cells = new ArrayList<>();
            int last = Math.max(row.getLastCellNum(), 0);
            for (int c = 0; c < last; c++) {
                Cell cell = row.getCell(c);
                if (cell != null && cell.getCellType() == CellType.FORMULA) {
                    if (!hasCachedValue(cell)) {
                        warnings.add(uncalculated(cell, file));
                        cells.add("");
                        continue;
                    }
                    formulas++;
                    if (firstFormula == null) {
                        firstFormula = new SourceLocation(file, row.getRowNum() + 1L, c + 1);
                    }
                }
                cells.add(text(cell).strip());
            }
            out.add(new RawRow(row.getRowNum() + 1L, cells));
        }
        if (formulas > 0) {
            warnings.add(new DataIssue(DataIssue.Severity.WARNING, firstFormula, "", "formula",
                    formulas + " cell(s) hold formulas; their last calculated values were read",
                    "values", "paste the results as values if the workbook was not recalculated before saving"));
        }
        return out;
    }

    /** Whether a formula cell carries the value it last calculated ({@code <v>} in the sheet XML). */
    private static boolean hasCachedValue(Cell cell) {
        return !(cell instanceof XSSFCell) || ((XSSFCell) cell).getCTCell().isSetV();
    }

    /** The cell left out: POI would read a formula without a cached value as 0 (or empty text). */
    private static DataIssue uncalculated(Cell cell, String file) {
        String address = new CellReference(cell.getSheet().getSheetName(), cell.getRowIndex(), cell.getColumnIndex(),
                false, false).formatAsString();
        return new DataIssue(DataIssue.Severity.EXCLUDED,
                new SourceLocation(file, cell.getRowIndex() + 1L, cell.getColumnIndex() + 1), "",
                "=" + cell.getCellFormula(), "the formula in " + address + " has no calculated value saved with it "
                        + "(the workbook was not recalculated before saving), so the cell is left out",
                "a value, or a formula with its last calculated result",
                "open the workbook in a spreadsheet, recalculate and save it, or paste the results as values");
    }

    static String text(Cell cell) {
        if (cell == null) {
            return "";
        }
        CellType type = cell.getCellType() == CellType.FORMULA ? cell.getCachedFormulaResultType() : cell.getCellType();
        switch (type) {
            case STRING:
                return cell.getStringCellValue();
            case NUMERIC:
                if (DateUtil.isCellDateFormatted(cell)) {
                    LocalDateTime t = cell.getLocalDateTimeCellValue();
                    return t.toLocalTime().toSecondOfDay() == 0 ? t.toLocalDate().toString() : t.toString();
                }
                return Numbers.compact(cell.getNumericCellValue());
            case BOOLEAN:
                return cell.getBooleanCellValue() ? "TRUE" : "FALSE";
            case ERROR:
                return FormulaError.forInt(cell.getErrorCellValue()).getString();
            default:
                return "";
        }
    }
}
