package org.cupel.assay;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The reported values of one analyte for every row of a {@link SampleTable}, in primitive arrays.
 * A row with no result for this analyte holds a missing value ({@link MissingReason#NOT_ANALYSED}).
 * Rows with several results (re-assays, other finishes) keep every candidate; the reported one was
 * chosen by a {@link MethodSelector} and the reason is kept. Immutable once built.
 */
public final class AnalyteColumn {
    private static final Qualifier[] QUALIFIERS = Qualifier.values();
    private static final MissingReason[] REASONS = MissingReason.values();

    private final Analyte analyte;
    private final int size;
    /** The arrays may be longer than {@link #size}: they are the builder's own, handed over without a copy. */
    private final byte[] qualifiers;
    private final double[] values;
    private final double[] limits;
    private final byte[] missing;
    /** The decimals each reported value was written with, a byte a row ({@link Numbers#UNKNOWN_DECIMALS}: not known). */
    private final byte[] decimals;
    private final short[] methodIndex;
    private final List<String> methods;
    private final Map<Integer, List<MethodValue>> candidatesByRow;
    private final Map<Integer, String> selectionReasons;
    /** The lab's code of a reported missing value ("IS", "NR"), for the rows that have one. */
    private final Map<Integer, String> missingCodes;

    private AnalyteColumn(Analyte analyte, int size, List<String> methods, byte[] qualifiers, double[] values,
                          double[] limits, byte[] missing, byte[] decimals, short[] methodIndex,
                          Map<Integer, String> missingCodes) {
        this.analyte = analyte;
        this.size = size;
        this.qualifiers = qualifiers;
        this.values = values;
        this.limits = limits;
        this.missing = missing;
        this.decimals = decimals;
        this.methodIndex = methodIndex;
        this.methods = methods;
        this.candidatesByRow = new HashMap<>();
        this.selectionReasons = new HashMap<>();
        this.missingCodes = missingCodes;
    }

    public Analyte analyte() {
        return analyte;
    }

    public int size() {
        return size;
    }

    public AssayValue value(int row) {
        return new AssayValue(QUALIFIERS[qualifiers[row]], values[row], limits[row], REASONS[missing[row]],
                decimals[row]);
    }

    /** {@link #value(int)} with {@code limit} as its limit, made without the intermediate value. */
    public AssayValue valueWithLimit(int row, double limit) {
        return new AssayValue(QUALIFIERS[qualifiers[row]], values[row], limit, REASONS[missing[row]],
                decimals[row]);
    }

    /** How many decimals the lab wrote for the reported value, or {@link Numbers#UNKNOWN_DECIMALS}. */
    public int decimals(int row) {
        return decimals[row];
    }

    public Qualifier qualifier(int row) {
        return QUALIFIERS[qualifiers[row]];
    }

    /** The number of {@link #value(int)}: measured value, censoring limit, or NaN when missing. */
    public double number(int row) {
        return values[row];
    }

    public double limit(int row) {
        return limits[row];
    }

    /** The method of the reported value; empty when the file did not name one. */
    public String method(int row) {
        return methods.get(methodIndex[row]);
    }

    /** Every result for this row, the reported one first. */
    public List<MethodValue> candidates(int row) {
        List<MethodValue> all = candidatesByRow.get(row);
        if (all != null) {
            return all;
        }
        return List.of(new MethodValue(method(row), value(row), null));
    }

    /** Why the reported value was chosen, for rows with more than one candidate; else empty. */
    public String selectionReason(int row) {
        return selectionReasons.getOrDefault(row, "");
    }

    /**
     * The text the lab wrote for the reported value when it is missing by a code ("IS" for insufficient
     * sample, "NR" for not received), as it stood in the cell; empty when the value is not missing, the cell
     * was blank, or the reported value is not the row's first result (the codes of later candidates are not
     * kept: their reason still is).
     */
    public String missingCode(int row) {
        return missingCodes.getOrDefault(row, "");
    }

    /** Rows with more than one candidate result, ascending. */
    public int[] rowsWithSeveralResults() {
        return candidatesByRow.keySet().stream().mapToInt(Integer::intValue).sorted().toArray();
    }

    /** How many reported values came from each method (missing values not counted), in first-seen order. */
    public Map<String, Integer> reportedMethodCounts() {
        int[] counts = new int[methods.size()];
        for (int i = 0; i < size; i++) {
            if (qualifiers[i] != Qualifier.MISSING.ordinal()) {
                counts[methodIndex[i]]++;
            }
        }
        Map<String, Integer> out = new LinkedHashMap<>();
        for (int m = 0; m < counts.length; m++) {
            if (counts[m] > 0) {
                out.put(methods.get(m), counts[m]);
            }
        }
        return Collections.unmodifiableMap(out);
    }

    public static Builder builder(Analyte analyte) {
        return new Builder(analyte, 0);
    }

    /** @param expectedRows rows the table is expected to have (a hint that spares growing the arrays) */
    public static Builder builder(Analyte analyte, int expectedRows) {
        return new Builder(analyte, expectedRows);
    }

    /**
     * Collects results row by row; a row may receive several. The first result of each row is kept in
     * primitive arrays (a million-row project has ten million cells: one object per cell would not fit a
     * 2 GiB heap), which become the column's own; only rows that receive a second result keep their
     * candidates as objects. The builder is spent by {@link #build}.
     */
    public static final class Builder {
        private static final byte ABSENT = -1;
        private static final int NO_SOURCE = -1;
        private Analyte analyte;
        private final List<String> methods = new ArrayList<>();
        private final Map<String, Short> methodIdx = new HashMap<>();
        private final Map<Integer, List<MethodValue>> several = new HashMap<>();
        private byte[] qualifiers = new byte[0];
        private double[] values = new double[0];
        private double[] limits = new double[0];
        private byte[] missing = new byte[0];
        private byte[] decimals = new byte[0];
        private short[] methodOf = new short[0];
        /** Source of each first result as a file number and line; a column other than 0 is rare and kept apart. */
        private int[] sourceFile = new int[0];
        private int[] sourceLine = new int[0];
        private final Map<Integer, Integer> sourceColumn = new HashMap<>();
        private final Map<Integer, String> missingCodes = new HashMap<>();
        private final List<String> files = new ArrayList<>();
        private final Map<String, Integer> fileIdx = new HashMap<>();
        private String lastFile;
        private int lastFileIndex;
        private boolean built;

        private String lastMethod = "";
        private short lastMethodIndex;

        private Builder(Analyte analyte, int expectedRows) {
            this.analyte = analyte;
            methods.add("");
            methodIdx.put("", (short) 0);
            ensureCapacity(expectedRows);
        }

        public Analyte analyte() {
            return analyte;
        }

        public void add(int row, MethodValue result) {
            AssayValue v = result.value();
            SourceLocation where = result.source();
            add(row, v.qualifier(), v.value(), v.limit(), v.missingReason(), v.decimals(), result.method(),
                    where == null ? null : where.file(), where == null ? 0 : where.line(),
                    where == null ? 0 : where.column());
        }

        /** {@link #add(int, Qualifier, double, double, MissingReason, int, String, String, long, int)} with the written decimals not known. */
        public void add(int row, Qualifier qualifier, double value, double limit, MissingReason reason, String method,
                        String file, long line, int column) {
            add(row, qualifier, value, limit, reason, Numbers.UNKNOWN_DECIMALS, method, file, line, column);
        }

        /**
         * {@link #add(int, MethodValue)} from the parts of the value and its source, without objects for a
         * row's first result.
         *
         * @param written the decimals the lab wrote the value with (0 to 127), or {@link Numbers#UNKNOWN_DECIMALS}
         * @param file the source file, or null when the result has no source
         */
        public void add(int row, Qualifier qualifier, double value, double limit, MissingReason reason, int written,
                        String method, String file, long line, int column) {
            if (built) {
                throw new IllegalStateException("the column of " + analyte.name() + " has already been built");
            }
            ensureCapacity(row + 1);
            if (qualifiers[row] == ABSENT) {
                qualifiers[row] = (byte) qualifier.ordinal();
                values[row] = value;
                limits[row] = limit;
                missing[row] = (byte) reason.ordinal();
                decimals[row] = asByte(written);
                methodOf[row] = methodIndex(method == null ? "" : method);
                if (file == null) {
                    sourceFile[row] = NO_SOURCE;
                } else {
                    sourceFile[row] = fileIndex(file);
                    // A row index is an int, so a table's line numbers fit one too.
                    sourceLine[row] = Math.toIntExact(line);
                    if (column != 0) {
                        sourceColumn.put(row, column);
                    }
                }
                return;
            }
            List<MethodValue> all = several.get(row);
            if (all == null) {
                all = new ArrayList<>(2);
                all.add(first(row));
                several.put(row, all);
            }
            all.add(new MethodValue(method, new AssayValue(qualifier, value, limit, reason, written),
                    file == null ? null : new SourceLocation(file, line, column)));
        }

        /**
         * Where a run of results comes from: one method of one file (a lab file's analyte column). Its results
         * are added as by {@link #add(int, Qualifier, double, double, MissingReason, int, String, String, long,
         * int)} at column 0, without looking up the method and the file for each (they are numbered at the
         * first result that is a row's first, as there).
         *
         * @param file the source file (not null)
         */
        public Source source(String method, String file) {
            return new Source(method == null ? "" : method, file);
        }

        /** See {@link #source(String, String)}. */
        public final class Source {
            private final String method;
            private final String file;
            private short methodNumber = -1;
            private int fileNumber = -1;

            private Source(String method, String file) {
                this.method = method;
                this.file = file;
            }

            /** @param written the decimals the lab wrote the value with (0 to 127), or {@link Numbers#UNKNOWN_DECIMALS} */
            public void add(int row, Qualifier qualifier, double value, double limit, MissingReason reason,
                            int written, long line) {
                if (built || row >= qualifiers.length || qualifiers[row] != ABSENT) {
                    Builder.this.add(row, qualifier, value, limit, reason, written, method, file, line, 0);
                    return;
                }
                if (methodNumber < 0) {
                    methodNumber = methodIndex(method);
                    fileNumber = fileIndex(file);
                }
                qualifiers[row] = (byte) qualifier.ordinal();
                values[row] = value;
                limits[row] = limit;
                missing[row] = (byte) reason.ordinal();
                decimals[row] = asByte(written);
                methodOf[row] = methodNumber;
                sourceFile[row] = fileNumber;
                sourceLine[row] = Math.toIntExact(line);
            }
        }

        /**
         * The lab's code of the missing result just added to {@code row}, kept when it is the row's first
         * result (see {@link AnalyteColumn#missingCode(int)}).
         */
        public void missingCode(int row, String code) {
            if (!several.containsKey(row) && qualifiers[row] == (byte) Qualifier.MISSING.ordinal()) {
                missingCodes.put(row, code);
            }
        }

        /**
         * Expresses every result collected so far in {@code target} instead of the builder's unit: values and
         * limits are multiplied by the conversion factor and the written decimals move with it (see
         * {@link Numbers#decimalsAfterScaling}). Between units of equal factor (ppm, g/t) only the label changes.
         */
        public void convertTo(org.cupel.units.GradeUnit target) {
            if (built) {
                throw new IllegalStateException("the column of " + analyte.name() + " has already been built");
            }
            double factor = analyte.unit().convert(1.0, target);
            analyte = new Analyte(analyte.name(), target);
            if (factor == 1.0) {
                return;
            }
            byte missingQualifier = (byte) Qualifier.MISSING.ordinal();
            for (int row = 0; row < qualifiers.length; row++) {
                if (qualifiers[row] != ABSENT && qualifiers[row] != missingQualifier) {
                    values[row] *= factor;
                    limits[row] *= factor;
                    decimals[row] = asByte(Numbers.decimalsAfterScaling(decimals[row], factor));
                }
            }
            several.replaceAll((row, all) -> all.stream().map(m -> new MethodValue(m.method(),
                    m.value().scaled(factor), m.source())).collect(java.util.stream.Collectors.toList()));
        }

        /** Written decimals beyond a byte are no lab's precision: kept as not known. */
        private static byte asByte(int written) {
            return written > Byte.MAX_VALUE ? Numbers.UNKNOWN_DECIMALS : (byte) written;
        }

        /** Methods are numbered as first results bring them; one column's results mostly share one. */
        private short methodIndex(String method) {
            if (!method.equals(lastMethod)) {
                lastMethodIndex = methodIdx.computeIfAbsent(method, k -> {
                    methods.add(k);
                    return (short) (methods.size() - 1);
                });
                lastMethod = method;
            }
            return lastMethodIndex;
        }

        /** Files are numbered as results bring them; consecutive results mostly share one. */
        private int fileIndex(String file) {
            if (!file.equals(lastFile)) {
                lastFileIndex = fileIdx.computeIfAbsent(file, k -> {
                    files.add(k);
                    return files.size() - 1;
                });
                lastFile = file;
            }
            return lastFileIndex;
        }

        private MethodValue first(int row) {
            SourceLocation where = sourceFile[row] == NO_SOURCE ? null : new SourceLocation(files.get(sourceFile[row]),
                    sourceLine[row], sourceColumn.getOrDefault(row, 0));
            return new MethodValue(methods.get(methodOf[row]), new AssayValue(QUALIFIERS[qualifiers[row]],
                    values[row], limits[row], REASONS[missing[row]], decimals[row]), where);
        }

        private void ensureCapacity(int size) {
            int old = qualifiers.length;
            if (size <= old) {
                return;
            }
            int capacity = Math.max(size, Math.max(16, old + (old >> 1)));
            qualifiers = Arrays.copyOf(qualifiers, capacity);
            Arrays.fill(qualifiers, old, capacity, ABSENT);
            values = Arrays.copyOf(values, capacity);
            limits = Arrays.copyOf(limits, capacity);
            missing = Arrays.copyOf(missing, capacity);
            decimals = Arrays.copyOf(decimals, capacity);
            methodOf = Arrays.copyOf(methodOf, capacity);
            sourceFile = Arrays.copyOf(sourceFile, capacity);
            sourceLine = Arrays.copyOf(sourceLine, capacity);
        }

        /**
         * The column of {@code rowCount} rows: rows without a result become missing values
         * ({@link MissingReason#NOT_ANALYSED}) in place and the arrays are handed over, so that the builder's
         * memory is not needed twice; rows with several results get the candidate {@code selector} chooses.
         */
        public AnalyteColumn build(int rowCount, MethodSelector selector) {
            if (built) {
                throw new IllegalStateException("the column of " + analyte.name() + " has already been built");
            }
            built = true;
            ensureCapacity(rowCount);
            byte missingQualifier = (byte) Qualifier.MISSING.ordinal();
            byte notAnalysed = (byte) MissingReason.NOT_ANALYSED.ordinal();
            for (int row = 0; row < rowCount; row++) {
                if (qualifiers[row] == ABSENT) {
                    qualifiers[row] = missingQualifier;
                    values[row] = Double.NaN;
                    limits[row] = Double.NaN;
                    missing[row] = notAnalysed;
                    decimals[row] = Numbers.UNKNOWN_DECIMALS;
                    methodOf[row] = 0;
                }
            }
            missingCodes.keySet().removeIf(row -> row >= rowCount);
            AnalyteColumn col = new AnalyteColumn(analyte, rowCount, methods, qualifiers, values, limits, missing,
                    decimals, methodOf, missingCodes);
            int[] rows = several.keySet().stream().mapToInt(Integer::intValue).filter(r -> r < rowCount).sorted()
                    .toArray();
            for (int row : rows) {
                choose(col, row, several.get(row), selector);
            }
            sourceFile = null;
            sourceLine = null;
            several.clear();
            return col;
        }

        private void choose(AnalyteColumn col, int row, List<MethodValue> all, MethodSelector selector) {
            MethodSelector.Selection s = selector.select(analyte, all);
            MethodValue chosen = all.get(s.index());
            List<MethodValue> ordered = new ArrayList<>(all.size());
            ordered.add(chosen);
            for (int i = 0; i < all.size(); i++) {
                if (i != s.index()) {
                    ordered.add(all.get(i));
                }
            }
            col.candidatesByRow.put(row, List.copyOf(ordered));
            col.selectionReasons.put(row, s.reason());
            if (s.index() != 0) {
                col.missingCodes.remove(row);
            }
            AssayValue v = chosen.value();
            col.qualifiers[row] = (byte) v.qualifier().ordinal();
            col.values[row] = v.value();
            col.limits[row] = v.limit();
            col.missing[row] = (byte) v.missingReason().ordinal();
            col.decimals[row] = asByte(v.decimals());
            col.methodIndex[row] = methodIdx.computeIfAbsent(chosen.method(), k -> {
                methods.add(k);
                return (short) (methods.size() - 1);
            });
        }
    }
}
