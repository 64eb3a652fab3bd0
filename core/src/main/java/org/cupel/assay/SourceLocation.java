package org.cupel.assay;

/**
 * Where a value came from: the file, the 1-based physical line, and the 1-based column (0 when the
 * whole row is meant). Every message about bad input names one of these.
 */
public record SourceLocation(String file, long line, int column) {

    public static SourceLocation ofFile(String file) {
        return new SourceLocation(file, 0, 0);
    }

    public SourceLocation atColumn(int newColumn) {
        return new SourceLocation(file, line, newColumn);
    }

    @Override
    public String toString() {
        if (line <= 0) {
            return file;
        }
        return column <= 0 ? file + ":" + line : file + ":" + line + ":" + column;
    }
}
