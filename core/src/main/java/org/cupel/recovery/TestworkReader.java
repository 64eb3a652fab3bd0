package org.cupel.recovery;

import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.cupel.assay.AssayValue;
import org.cupel.assay.SourceLocation;
import org.cupel.ingest.AnalyteHeader;
import org.cupel.ingest.HeaderParser;
import org.cupel.ingest.ParsedValue;
import org.cupel.ingest.ProjectFiles;
import org.cupel.ingest.RawRow;
import org.cupel.ingest.RawTable;
import org.cupel.ingest.TableReader;
import org.cupel.ingest.ValueConventions;
import org.cupel.ingest.ValueParser;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;
import org.cupel.units.MassUnit;

/**
 * Reads {@code heads.csv} and {@code smelts.csv} (docs/testwork.md) from a testwork folder, or from the
 * {@code testwork/} folder of a project. Grades are converted to g/t and masses to grams on the way in.
 * Smelts come in the long format (one row per product: {@code product}, {@code product_role},
 * {@code mass_<unit>} and analyte columns) or the wide format (one row per smelt: {@code <product>_<unit>} mass
 * columns and {@code <product>_<analyte header>} assay columns).
 */
public final class TestworkReader {
    private static final String[] EXTENSIONS = {".csv", ".tsv", ".txt", ".xlsx"};

    /** A million tonnes: far beyond any smelt or test product, and small enough that mass times grade stays finite. */
    static final double MAX_MASS_GRAMS = 1e12;

    private final RecoverySettings settings;
    private final ValueConventions conventions;
    /** The parser of the table being read: one per file, as it collects the evidence of the decimal mark. */
    private ValueParser values;
    private final HeaderParser headers = new HeaderParser();
    private final List<DataIssue> issues = new ArrayList<>();
    private final List<String> analytes = new ArrayList<>();

    private TestworkReader(RecoverySettings settings, ValueConventions conventions) {
        this.settings = settings;
        this.conventions = conventions;
    }

    /**
     * Reads the testwork under {@code folder} (a testwork folder or a project holding {@code testwork/}),
     * following links only inside the folder.
     */
    public static Testwork read(Path folder, RecoverySettings settings, ValueConventions conventions) {
        return read(ProjectFiles.insideOnly(folder), settings, conventions);
    }

    /** Reads the testwork under {@code files.folder()}, following links as {@code files} allows. */
    public static Testwork read(ProjectFiles files, RecoverySettings settings, ValueConventions conventions) {
        Path folder = files.folder();
        Path dir = Files.isDirectory(folder.resolve("testwork")) ? folder.resolve("testwork") : folder;
        Path heads = find(files, dir, "heads");
        Path smelts = find(files, dir, "smelts");
        TestworkReader reader = new TestworkReader(settings, conventions);
        Map<String, Map<String, List<AssayValue>>> h = reader.readHeads(heads);
        List<Smelt> s = reader.readSmelts(smelts);
        return new Testwork(reader.analytes, h, s, reader.issues);
    }

    private static Path find(ProjectFiles files, Path dir, String stem) {
        for (String ext : EXTENSIONS) {
            Path p = dir.resolve(stem + ext);
            if (Files.exists(p, LinkOption.NOFOLLOW_LINKS)) {
                files.refusal(p, p.toString()).ifPresent(why -> {
                    throw new InputException(why);
                });
                return p;
            }
        }
        throw new InputException(dir.resolve(stem + ".csv") + ": no " + stem + " file found; put " + stem
                + ".csv in the testwork folder (see docs/testwork.md for its columns).");
    }

    /** The table, its reading issues (ragged rows, formulas) added to the issues of the testwork. */
    private RawTable table(Path file, String requiredColumn) {
        RawTable t = TableReader.read(file, file.toString(), cells -> cells.stream()
                .anyMatch(c -> RawTable.normalise(c).equals(RawTable.normalise(requiredColumn))), null);
        issues.addAll(t.issues());
        values = new ValueParser(conventions);
        return t;
    }

    /**
     * Head assays per feed and analyte. A replicate labelled {@code <label>-LD} is a lab duplicate of
     * {@code <label>} (same pulp): the two are averaged into one replicate first, so the head's standard error
     * counts independent test portions and not the repeat of one pulp.
     */
    private Map<String, Map<String, List<AssayValue>>> readHeads(Path file) {
        RawTable t = table(file, "feed");
        int feed = required(t, "feed");
        int replicate = t.column("replicate", "rep");
        Map<Integer, AnalyteHeader> cols = analyteColumns(t, "");
        Map<String, Map<String, Map<String, List<AssayValue>>>> byLabel = new LinkedHashMap<>();
        for (RawRow row : t.rows()) {
            String f = row.cell(feed).strip();
            if (f.isEmpty()) {
                exclude(t.at(row, feed), "", "the row has no feed name", "a feed name", "fill in the feed column");
                continue;
            }
            String label = replicate < 0 || row.cell(replicate).isBlank() ? "line " + row.line()
                    : row.cell(replicate).strip().replaceFirst("(?i)-LD$", "");
            for (Map.Entry<Integer, AnalyteHeader> c : cols.entrySet()) {
                assay(t, row, c.getKey(), c.getValue()).filter(v -> !v.isMissing()).ifPresent(v -> byLabel
                        .computeIfAbsent(f, k -> new LinkedHashMap<>())
                        .computeIfAbsent(c.getValue().analyte(), k -> new LinkedHashMap<>())
                        .computeIfAbsent(label, k -> new ArrayList<>()).add(v));
            }
        }
        Map<String, Map<String, List<AssayValue>>> out = new LinkedHashMap<>();
        byLabel.forEach((f, analytesOfFeed) -> analytesOfFeed.forEach((a, labels) -> labels.values().forEach(v -> out
                .computeIfAbsent(f, k -> new LinkedHashMap<>()).computeIfAbsent(a, k -> new ArrayList<>())
                .add(mergeDuplicates(v)))));
        values.checkDecimalMarks();
        return out;
    }

    /** One pulp's assays as one value: the mean when all are detected, else the original assay. */
    private static AssayValue mergeDuplicates(List<AssayValue> assays) {
        if (assays.size() == 1 || !assays.stream().allMatch(AssayValue::isDetected)) {
            return assays.get(0);
        }
        return AssayValue.detected(assays.stream().mapToDouble(AssayValue::value).average().orElseThrow(),
                assays.get(0).limit());
    }

    /**
     * A ragged smelt row stops the read: its smelt would be balanced without one of its products, which
     * shifts every recovery of the smelt rather than leaving one value out.
     */
    private List<Smelt> readSmelts(Path file) {
        RawTable t = table(file, "test_id");
        for (DataIssue i : t.issues()) {
            if (i.severity() == DataIssue.Severity.EXCLUDED && i.where().column() == 0) {
                throw new InputException(i.where() + ": " + i.problem().replace("; the row is left out", "")
                        + ", and a smelt without one of its rows would not balance; " + i.fix() + ".");
            }
        }
        List<Smelt> smelts = t.column("product") >= 0 ? readLong(t) : readWide(t);
        values.checkDecimalMarks();
        return smelts;
    }

    private List<Smelt> readLong(RawTable t) {
        SmeltColumns sc = SmeltColumns.of(t, this);
        int product = required(t, "product");
        int role = t.column("product_role", "role");
        int mass = massColumn(t, "mass").orElseThrow(() -> missingColumn(t, "mass_g (or mass_kg)"));
        MassUnit massUnit = massUnit(t.columns().get(mass), "mass").orElseThrow();
        Map<Integer, AnalyteHeader> cols = analyteColumns(t, "");
        Map<String, SmeltBuilder> smelts = new LinkedHashMap<>();
        for (RawRow row : t.rows()) {
            Optional<SmeltBuilder> b = sc.smelt(row, smelts);
            String name = row.cell(product).strip();
            if (b.isEmpty() || name.isEmpty()) {
                if (b.isPresent()) {
                    exclude(t.at(row, product), "", "the row has no product name", "button, slag, matte, ...",
                            "name the product");
                }
                continue;
            }
            Optional<Double> m = positive(t, row, mass, massUnit);
            if (m.isEmpty()) {
                b.get().broken = true;
                continue;
            }
            Map<String, AssayValue> grades = new LinkedHashMap<>();
            cols.forEach((col, h) -> assay(t, row, col, h).ifPresent(v -> grades.put(h.analyte(), v)));
            b.get().products.add(new Product(name, role(name, role < 0 ? "" : row.cell(role), t.at(row, role)),
                    m.get(), grades, t.at(row)));
        }
        return build(smelts);
    }

    private List<Smelt> readWide(RawTable t) {
        SmeltColumns sc = SmeltColumns.of(t, this);
        Map<String, Integer> massCols = new LinkedHashMap<>();
        for (int c = 0; c < t.columns().size(); c++) {
            String n = RawTable.normalise(t.columns().get(c));
            int cut = n.lastIndexOf(' ');
            if (cut > 0 && c != sc.charge && MassUnit.parse(n.substring(cut + 1)).isPresent()) {
                massCols.put(n.substring(0, cut), c);
            }
        }
        if (massCols.isEmpty()) {
            throw new InputException(t.file() + ":" + t.headerLine() + ": smelts in the wide format need one mass "
                    + "column per product such as button_g and slag_g (or a product column for the long format); "
                    + "see docs/testwork.md.");
        }
        Map<String, Map<Integer, AnalyteHeader>> assays = new LinkedHashMap<>();
        for (String p : massCols.keySet()) {
            assays.put(p, analyteColumns(t, p));
        }
        Map<String, SmeltBuilder> smelts = new LinkedHashMap<>();
        for (RawRow row : t.rows()) {
            Optional<SmeltBuilder> b = sc.smelt(row, smelts);
            if (b.isEmpty()) {
                continue;
            }
            for (Map.Entry<String, Integer> p : massCols.entrySet()) {
                int col = p.getValue();
                if (row.cell(col).isBlank()) {
                    continue;
                }
                MassUnit unit = massUnit(t.columns().get(col), p.getKey()).orElseThrow();
                Optional<Double> m = positive(t, row, col, unit);
                if (m.isEmpty()) {
                    b.get().broken = true;
                    continue;
                }
                Map<String, AssayValue> grades = new LinkedHashMap<>();
                assays.get(p.getKey()).forEach((c, h) -> assay(t, row, c, h).ifPresent(v -> grades.put(h.analyte(), v)));
                b.get().products.add(new Product(p.getKey(), role(p.getKey(), "", t.at(row, col)), m.get(), grades,
                        t.at(row, col)));
            }
        }
        return build(smelts);
    }

    private List<Smelt> build(Map<String, SmeltBuilder> smelts) {
        List<Smelt> out = new ArrayList<>();
        for (SmeltBuilder b : smelts.values()) {
            if (b.broken || b.products.isEmpty()) {
                issues.add(new DataIssue(DataIssue.Severity.EXCLUDED, b.where, b.testId, b.testId,
                        "smelt " + b.testId + " is left out: " + (b.broken ? "a product mass could not be read"
                                : "it has no products"), "", "fix the rows of this test"));
                continue;
            }
            out.add(new Smelt(b.testId, b.condition, b.replicate, b.feed, b.chargeGrams, b.products, b.where));
        }
        return out;
    }

    private ProductRole role(String product, String cell, SourceLocation where) {
        String override = settings.productRoles().get(product.toLowerCase(Locale.ROOT));
        if (override != null) {
            return ProductRole.parse(override).orElseThrow(() -> new InputException("recovery.productRoles: '"
                    + override + "' for product '" + product + "' is not a role; use collected or loss."));
        }
        if (!cell.isBlank()) {
            Optional<ProductRole> r = ProductRole.parse(cell);
            if (r.isPresent()) {
                return r.get();
            }
            issues.add(new DataIssue(DataIssue.Severity.WARNING, where, "", cell, "unknown product role",
                    "collected or loss", "the role implied by the name '" + product + "' is used"));
        }
        return ProductRole.byName(product);
    }

    Map<Integer, AnalyteHeader> analyteColumns(RawTable t, String productPrefix) {
        Map<Integer, AnalyteHeader> out = new LinkedHashMap<>();
        String prefix = productPrefix.isEmpty() ? "" : productPrefix + " ";
        for (int c = 0; c < t.columns().size(); c++) {
            final int col = c;
            String header = t.columns().get(c);
            String n = RawTable.normalise(header);
            if (!prefix.isEmpty() && !n.startsWith(prefix)) {
                continue;
            }
            String rest = prefix.isEmpty() ? header : header.strip().substring(productPrefix.length()).strip();
            Optional<AnalyteHeader> h = headers.parse(rest.replaceFirst("^[_\\- ]+", ""));
            h.ifPresent(a -> {
                out.put(col, a);
                if (!analytes.contains(a.analyte())) {
                    analytes.add(a.analyte());
                }
            });
        }
        return out;
    }

    private Optional<AssayValue> assay(RawTable t, RawRow row, int col, AnalyteHeader h) {
        ParsedValue v = values.parse(row.cell(col), Double.NaN, t.at(row, col), h.unit());
        if (v.issue() != null) {
            issues.add(v.issue());
        }
        return v.usable() ? Optional.of(v.value().scaled(h.unit().gramsPerTonne())) : Optional.empty();
    }

    /**
     * A positive mass, in grams. Above {@link #MAX_MASS_GRAMS} it is a typing error (and mass times grade
     * could overflow), so it is refused like an unreadable mass.
     */
    Optional<Double> positive(RawTable t, RawRow row, int col, MassUnit unit) {
        String text = row.cell(col).strip();
        try {
            double d = Double.parseDouble(text);
            if (d > 0 && Double.isFinite(d) && unit.toGrams(d) <= MAX_MASS_GRAMS) {
                return Optional.of(unit.toGrams(d));
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        exclude(t.at(row, col), text, "the mass in column '" + t.columns().get(col) + "' is not a positive number "
                        + "of at most a million tonnes", "a positive mass in " + unit.symbol(),
                "correct the weighing or remove the row");
        return Optional.empty();
    }

    void exclude(SourceLocation where, String found, String problem, String expected, String fix) {
        issues.add(new DataIssue(DataIssue.Severity.EXCLUDED, where, "", found, problem, expected, fix));
    }

    static int required(RawTable t, String column) {
        int c = t.column(column);
        if (c < 0) {
            throw missingColumn(t, column);
        }
        return c;
    }

    static InputException missingColumn(RawTable t, String column) {
        return new InputException(t.file() + ":" + t.headerLine() + ": the header row has no '" + column
                + "' column (found " + MessageText.list(t.columns()) + "); add it as described in docs/testwork.md.");
    }

    static Optional<Integer> massColumn(RawTable t, String stem) {
        for (int c = 0; c < t.columns().size(); c++) {
            if (massUnit(t.columns().get(c), stem).isPresent()) {
                return Optional.of(c);
            }
        }
        return Optional.empty();
    }

    static Optional<MassUnit> massUnit(String header, String stem) {
        String n = RawTable.normalise(header).replace("(", "").replace(")", "");
        return n.startsWith(stem + " ") ? MassUnit.parse(n.substring(stem.length() + 1).strip()) : Optional.empty();
    }

    /** The identifying columns shared by both smelt formats. */
    private static final class SmeltColumns {
        final RawTable t;
        final TestworkReader reader;
        final int testId;
        final int condition;
        final int replicate;
        final int feed;
        final int charge;
        final MassUnit chargeUnit;

        private SmeltColumns(RawTable t, TestworkReader reader) {
            this.t = t;
            this.reader = reader;
            testId = required(t, "test_id");
            condition = required(t, "condition");
            feed = required(t, "feed");
            replicate = t.column("replicate", "rep");
            charge = massColumn(t, "charge").orElseThrow(() -> missingColumn(t, "charge_g (or charge_kg)"));
            chargeUnit = massUnit(t.columns().get(charge), "charge").orElseThrow();
        }

        static SmeltColumns of(RawTable t, TestworkReader reader) {
            return new SmeltColumns(t, reader);
        }

        Optional<SmeltBuilder> smelt(RawRow row, Map<String, SmeltBuilder> smelts) {
            String id = row.cell(testId).strip();
            if (id.isEmpty()) {
                reader.exclude(t.at(row, testId), "", "the row has no test ID", "a test ID", "fill in test_id");
                return Optional.empty();
            }
            SmeltBuilder existing = smelts.get(id);
            String cond = row.cell(condition).strip();
            String f = row.cell(feed).strip();
            if (existing != null) {
                if (!existing.condition.equals(cond) || !existing.feed.equals(f)) {
                    throw new InputException(t.at(row) + ": test " + id + " has condition '" + cond + "' and feed '"
                            + f + "' here but '" + existing.condition + "' and '" + existing.feed + "' at line "
                            + existing.where.line() + "; give each smelt one test ID and one condition.");
                }
                return Optional.of(existing);
            }
            Optional<Double> c = reader.positive(t, row, charge, chargeUnit);
            SmeltBuilder b = new SmeltBuilder(id, cond, replicate < 0 ? id : row.cell(replicate).strip(), f,
                    c.orElse(Double.NaN), t.at(row));
            b.broken = c.isEmpty();
            smelts.put(id, b);
            return Optional.of(b);
        }
    }

    private static final class SmeltBuilder {
        final String testId;
        final String condition;
        final String replicate;
        final String feed;
        final double chargeGrams;
        final SourceLocation where;
        final List<Product> products = new ArrayList<>();
        boolean broken;

        SmeltBuilder(String testId, String condition, String replicate, String feed, double chargeGrams,
                     SourceLocation where) {
            this.testId = testId;
            this.condition = condition;
            this.replicate = replicate;
            this.feed = feed;
            this.chargeGrams = chargeGrams;
            this.where = where;
        }
    }
}
