package org.cupel.ingest;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.List;
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
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.cupel.assay.Numbers;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;

/**
 * Reads one sheet of an XLSX workbook into records, with POI's zip-bomb guards on. Numbers are written
 * as the shortest decimal that reads back as the stored double (not as the cell's display format, which
 * may round 0.005 to 0.01); dates as ISO dates; formulas as their cached results, with one warning.
 */
final class XlsxSheetReader {
    /** The in-memory workbook model needs ~50x the file size; larger workbooks should be CSV. */
    static final long MAX_FILE_BYTES = 50L << 20;
    /** Largest uncompressed part (sheet XML) accepted. */
    static final long MAX_ENTRY_BYTES = 1L << 30;
    /** Compression ratio below which an entry is treated as a zip bomb (POI's guard, set explicitly). */
    static final double MIN_INFLATE_RATIO = 0.01;

    private XlsxSheetReader() {
    }

    /** @param sheetName the sheet to read, or null/empty for the first */
    static List<RawRow> read(Path path, String file, String sheetName, List<DataIssue> warnings) {
        checkSize(path, file);
        ZipSecureFile.setMinInflateRatio(MIN_INFLATE_RATIO);
        ZipSecureFile.setMaxEntrySize(MAX_ENTRY_BYTES);
        OPCPackage pkg = null;
        try {
            pkg = OPCPackage.open(path.toFile(), PackageAccess.READ);
            XSSFWorkbook wb = new XSSFWorkbook(pkg);
            Sheet sheet = pickSheet(wb, file, sheetName);
            return rows(sheet, file, warnings);
        } catch (InvalidFormatException | IOException | RuntimeException e) {
            if (e instanceof InputException) {
                throw (InputException) e;
            }
            throw new InputException(file + ": not a readable XLSX workbook (" + e.getMessage()
                    + "); open it in a spreadsheet and save it again as .xlsx or as CSV UTF-8.", e);
        } finally {
            if (pkg != null) {
                pkg.revert();
            }
        }
    }

    private static void checkSize(Path path, String file) {
        try {
            long size = Files.size(path);
            if (size > MAX_FILE_BYTES) {
                throw new InputException(file + ": the workbook is " + (size >> 20) + " MB, larger than the "
                        + (MAX_FILE_BYTES >> 20) + " MB accepted for XLSX; save the sheet as CSV UTF-8 instead.");
            }
        } catch (IOException e) {
            throw new InputException(file + ": the file could not be read (" + e.getMessage()
                    + "); check the path and permissions.", e);
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
            List<String> names = new ArrayList<>();
            wb.forEach(x -> names.add(x.getSheetName()));
            throw new InputException(file + ": no sheet named '" + sheetName + "' (the workbook has " + names
                    + "); set ingest.sheet to one of these.");
        }
        return s;
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
