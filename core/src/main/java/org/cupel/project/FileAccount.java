package org.cupel.project;

/**
 * The row accounting of one input file: every data row read is either analysed or listed as an
 * exception, never silently dropped.
 *
 * @param file file name as given
 * @param kind what the file is (lab results, register, catalog, testwork)
 * @param rowsRead data rows read (header and header-block lines not counted)
 * @param rowsAnalysed rows that reached the analyses
 * @param rowsExcluded rows listed in the exceptions register instead
 */
public record FileAccount(String file, String kind, long rowsRead, long rowsAnalysed, long rowsExcluded) {

    /** {@code rowsRead == rowsAnalysed + rowsExcluded}. */
    public boolean balances() {
        return rowsRead == rowsAnalysed + rowsExcluded;
    }
}
