package org.cupel.ingest;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;
import org.cupel.assay.SourceLocation;
import org.cupel.config.ConfigException;
import org.cupel.config.CupelConfig;
import org.cupel.project.CrmCatalog;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.FileAccount;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;
import org.cupel.project.Project;
import org.cupel.units.GradeUnit;
import org.cupel.units.UnitChoice;

/**
 * Loads a project folder (docs/input-formats.md): {@code cupel.yaml} if present, {@code register.csv},
 * {@code crm-catalog.csv} and the lab files in {@code lab/} (or, without that folder, the table files
 * beside the register), read in name order so that results are deterministic. Each analyte is reported
 * in {@code ingest.units}, else in the unit of the first column seen for it.
 */
public final class ProjectLoader {
    public static final String CONFIG = "cupel.yaml";
    public static final String REGISTER = "register.csv";
    public static final String CATALOG = "crm-catalog.csv";
    public static final String LAB_DIR = "lab";
    /**
     * Bytes of lab files that may be parsed ahead of the join, so while the register is read. A parsed file
     * takes about five times its size and, waiting through young collections, ends as old-generation garbage:
     * at 1M samples 8 MB left the old generation as full after the ingest as before read-ahead (16 MB: +55 MB,
     * and a full collection in the analyses), while the joining thread still parses files itself.
     */
    private static final long READ_AHEAD_BYTES = 8L << 20;

    private ProjectLoader() {
    }

    /** Loads with the folder's config (defaults when there is none); a fatal input problem throws. */
    public static Project load(Path folder) {
        return load(folder, readConfig(folder));
    }

    /** @throws InputException for a file that cannot be used at all */
    public static Project load(Path folder, CupelConfig config) {
        return new Load(folder, config, true).run();
    }

    /**
     * Loads as far as possible for {@code cupel check}: a file that cannot be used becomes a FATAL entry of
     * the exceptions register (and its account shows no rows) instead of stopping the load.
     */
    public static Project inspect(Path folder) {
        return inspect(folder, UnaryOperator.identity());
    }

    /**
     * As {@link #inspect(Path)}, with the config also passed through {@code check} (which throws a
     * {@link ConfigException} for a setting it refuses): a refused config becomes a FATAL entry for
     * {@value #CONFIG}, and the files are then read with the defaults.
     */
    public static Project inspect(Path folder, UnaryOperator<CupelConfig> check) {
        CupelConfig config;
        try {
            config = check.apply(readConfig(folder));
        } catch (ConfigException | InputException e) {
            Project p = new Load(folder, CupelConfig.defaults(), false).run();
            p.exceptions().add(SampleJoin.fatal(CONFIG, e.getMessage()));
            return p;
        }
        return new Load(folder, config, false).run();
    }

    /**
     * The folder's {@code cupel.yaml}, or the defaults when there is none. A link named {@code cupel.yaml}
     * must lead to a file inside the project: the config cannot allow itself to be read from elsewhere.
     */
    public static CupelConfig readConfig(Path folder) {
        requireFolder(folder);
        Optional<Path> config = ProjectFiles.insideOnly(folder).optional(CONFIG);
        if (config.isEmpty()) {
            return CupelConfig.defaults();
        }
        try {
            return CupelConfig.fromYaml(Files.readString(config.get(), StandardCharsets.UTF_8), CONFIG);
        } catch (IOException e) {
            throw new InputException(CONFIG + ": the config could not be read (" + e.getMessage()
                    + "); save it as UTF-8 text or remove it to use the defaults.", e);
        }
    }

    /**
     * Name order without the extension first, so that {@code OAL-00001.csv} (the batch) comes before
     * {@code OAL-00001-GRAV.csv} (its re-assays): a sample's batch and position are those of the first file
     * that holds it, and later files add candidate results.
     */
    static final java.util.Comparator<Path> BY_NAME = java.util.Comparator
            .comparing((Path p) -> stem(p.getFileName().toString()))
            .thenComparing(p -> p.getFileName().toString());

    private static String stem(String name) {
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }

    /**
     * The entries of a project's lab folder (or, without {@code lab/}, of the project folder other than the
     * register and the catalog) whose names are those of table files, in name order (see {@link #BY_NAME}).
     * Whether each can be read is for {@link ProjectFiles#refusal} to say.
     */
    public static List<Path> labFiles(Path folder) {
        Path lab = folder.resolve(LAB_DIR);
        Path dir = Files.isDirectory(lab) ? lab : folder;
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> isTable(p.getFileName().toString()))
                    .filter(p -> dir == lab || !isProjectFile(p.getFileName().toString()))
                    .sorted(BY_NAME)
                    .toList();
        } catch (IOException e) {
            throw new InputException(dir + ": the folder could not be listed (" + e.getMessage()
                    + "); check its permissions.", e);
        }
    }

    /**
     * Entries of {@code folder} whose names look meant as the register ({@code Register.csv},
     * {@code register.tsv}, {@code regsiter.csv}, {@code sample-register.xlsx}), in name order.
     */
    static List<String> registerNearMisses(Path folder) {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString())
                    .filter(n -> !n.equals(REGISTER))
                    .filter(n -> n.toLowerCase(Locale.ROOT).contains("register")
                            || editDistance(n.toLowerCase(Locale.ROOT), REGISTER) <= 2)
                    .sorted()
                    .toList();
        } catch (IOException e) {
            return List.of();
        }
    }

    /** Levenshtein distance: insertions, deletions and substitutions of one character each count 1. */
    static int editDistance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int substitute = prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                cur[j] = Math.min(substitute, Math.min(prev[j], cur[j - 1]) + 1);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }

    private static boolean isTable(String name) {
        String n = name.toLowerCase(Locale.ROOT);
        return !n.startsWith(".") && !n.startsWith("~$") && (n.endsWith(".csv") || n.endsWith(".tsv")
                || n.endsWith(".txt") || n.endsWith(".xlsx"));
    }

    private static boolean isProjectFile(String name) {
        return name.equalsIgnoreCase(REGISTER) || name.equalsIgnoreCase(CATALOG);
    }

    private static void requireFolder(Path folder) {
        if (!Files.isDirectory(folder)) {
            throw new InputException(folder + ": not a folder (expected a project folder holding lab/ and "
                    + "optionally register.csv, crm-catalog.csv, cupel.yaml); give the project folder's path.");
        }
    }

    /** One load of one folder. */
    private static final class Load {
        private final Path folder;
        private final CupelConfig config;
        private final boolean strict;
        private final IngestSettings settings;
        private final ProjectFiles files;
        private final ExceptionRegister exceptions = new ExceptionRegister();
        private final List<FileAccount> failed = new ArrayList<>();

        Load(Path folder, CupelConfig config, boolean strict) {
            this.folder = folder;
            this.config = config;
            this.strict = strict;
            this.settings = IngestSettings.from(config);
            this.files = ProjectFiles.of(folder, config);
        }

        Project run() {
            requireFolder(folder);
            Map<String, GradeUnit> configured = configuredUnits();
            Map<String, GradeUnit> units = new LinkedHashMap<>(configured);
            // The lab files are parsed from the start, on the second core while this one reads the register.
            try (LabReads labs = startLabs()) {
                SampleRegister register = readRegister();
                SampleJoin join = new SampleJoin(register, units, exceptions);
                labs.readInOrder(file -> {
                    for (LabColumn c : file.columns()) {
                        units.putIfAbsent(c.analyte().analyte(), c.analyte().unit());
                    }
                    join.add(file);
                });
                return finish(join, configured, units);
            }
        }

        private Project finish(SampleJoin join, Map<String, GradeUnit> configured, Map<String, GradeUnit> units) {
            join.finishRegister();
            Map<String, UnitChoice> unitChoices = join.unitChoices(configured);
            unitChoices.forEach((analyte, choice) -> units.put(analyte, choice.unit()));
            CatalogReader.Result catalog = readCatalog(units);
            SampleTable table = join.buildSamples();
            CrmCatalog crms = catalog == null ? CrmCatalog.empty() : catalog.catalog();
            join.checkReferences(table, crms, catalog != null);
            if (catalog == null && table.rowsWithRole(QcRole.CRM).length > 0) {
                exceptions.warn(SourceLocation.ofFile(CATALOG), "", "",
                        "the project has CRM samples but no CRM catalog, so their results cannot be judged",
                        "crm-catalog.csv in the project folder", "add crm-catalog.csv (docs/input-formats.md)");
            }
            List<FileAccount> accounts = new ArrayList<>(join.accounts());
            if (catalog != null) {
                catalog.issues().forEach(exceptions::add);
                accounts.add(new FileAccount(CATALOG, "CRM catalog", catalog.rowsRead(),
                        catalog.rowsRead() - catalog.rowsExcluded(), catalog.rowsExcluded()));
            }
            accounts.addAll(failed);
            Map<String, AnalyteColumn> columns = join.buildColumns(table.size(),
                    new MethodPriority(settings.methodPriority()), unitChoices);
            String name = config.projectName(folder.toAbsolutePath().normalize().getFileName() == null
                    ? "project" : folder.toAbsolutePath().normalize().getFileName().toString());
            return new Project(name, folder, config, table, columns, crms, exceptions, accounts, unitChoices);
        }

        /**
         * Lists the lab files and starts parsing those that may be read, in name order. What cannot be used (no
         * listing, no files, an entry that may not be read) is reported when the files are received, after the
         * register, as when the files were read after it.
         */
        private LabReads startLabs() {
            List<Path> entries;
            try {
                entries = labFiles(folder);
            } catch (InputException e) {
                return new LabReads(e, true, Map.of(), null);
            }
            List<Path> readable = new ArrayList<>();
            Map<Path, String> refused = new LinkedHashMap<>();
            for (Path f : entries) {
                Optional<String> refusal = files.refusal(f, displayName(f));
                if (refusal.isPresent()) {
                    refused.put(f, refusal.get());
                } else {
                    readable.add(f);
                }
            }
            return new LabReads(null, entries.isEmpty(), refused, ReadAhead.start(readable, () -> {
                LabFileReader reader = new LabFileReader(settings);
                return f -> reader.read(f, displayName(f));
            }, TableReader::sizeOf, READ_AHEAD_BYTES));
        }

        /** The lab files being read: each entry that may not be read is a fatal problem. */
        private final class LabReads implements AutoCloseable {
            private final InputException unlisted;
            private final boolean none;
            private final Map<Path, String> refused;
            private final ReadAhead<Path, LabFile> reads;

            /**
             * @param unlisted why the folder could not be listed, or null
             * @param none whether the folder holds no table file
             * @param refused the entries that may not be read, each with why, in name order
             */
            LabReads(InputException unlisted, boolean none, Map<Path, String> refused, ReadAhead<Path, LabFile> reads) {
                this.unlisted = unlisted;
                this.none = none;
                this.refused = refused;
                this.reads = reads;
            }

            void readInOrder(java.util.function.Consumer<LabFile> sink) {
                if (unlisted != null) {
                    throw unlisted;
                }
                refused.forEach((f, why) -> fail(displayName(f), "lab results", new InputException(why)));
                if (none) {
                    fail(LAB_DIR, "lab results", new InputException(folder.resolve(LAB_DIR) + ": no lab result "
                            + "files (expected .csv, .tsv, .txt or .xlsx files in lab/); put the lab's result files there."));
                }
                reads.readInOrder(outcome -> {
                    if (outcome.error() != null) {
                        fail(displayName(outcome.item()), "lab results", outcome.error());
                    } else {
                        sink.accept(outcome.result());
                    }
                });
            }

            @Override
            public void close() {
                if (reads != null) {
                    reads.close();
                }
            }
        }

        /**
         * The register, or null when there is none (a loud warning: every QC role then comes from the lab
         * files) or it cannot be used. A file named like a register but not exactly {@code register.csv} is
         * fatal: reading the project as if it had no register would turn its CRMs, blanks and duplicates into
         * routine samples, and guessing which near miss is the register would be worse.
         */
        private SampleRegister readRegister() {
            try {
                Optional<Path> f = files.optional(REGISTER);
                if (f.isPresent()) {
                    return RegisterReader.read(f.get(), REGISTER);
                }
                List<String> nearMisses = registerNearMisses(folder);
                if (!nearMisses.isEmpty()) {
                    throw new InputException(REGISTER + ": not found, but the project folder holds "
                            + MessageText.list(nearMisses) + "; rename the sample register to register.csv (the name "
                            + "is case-sensitive and the register is a CSV file), or move the other files away.");
                }
            } catch (InputException e) {
                fail(REGISTER, "sample register", e);
                return null;
            }
            exceptions.warn(SourceLocation.ofFile(REGISTER), "", "", "the project has no sample register, so QC "
                            + "roles come only from the lab files (a qc_role column, repeat suffixes): CRMs, blanks and "
                            + "duplicates not marked there are analysed as routine samples",
                    "register.csv in the project folder", "add register.csv (docs/input-formats.md)");
            return null;
        }

        private CatalogReader.Result readCatalog(Map<String, GradeUnit> units) {
            try {
                Optional<Path> f = files.optional(CATALOG);
                return f.isEmpty() ? null : CatalogReader.read(f.get(), CATALOG, units);
            } catch (InputException e) {
                fail(CATALOG, "CRM catalog", e);
                return null;
            }
        }

        /** {@code ingest.units}; analytes not listed take the unit of the first column seen. */
        private Map<String, GradeUnit> configuredUnits() {
            Map<String, GradeUnit> units = new LinkedHashMap<>();
            settings.units().forEach((analyte, symbol) -> units.put(analyte, GradeUnit.parse(symbol)
                    .orElseThrow(() -> new ConfigException(config.source() + ": ingest.units." + analyte + " is '"
                            + symbol + "', not a unit Cupel knows (expected ppb, ppm, g/t, mg/kg, %, oz/st or oz/lt); "
                            + "correct it in cupel.yaml."))));
            return units;
        }

        private void fail(String file, String kind, InputException e) {
            if (strict) {
                throw e;
            }
            exceptions.add(SampleJoin.fatal(file, e.getMessage()));
            failed.add(new FileAccount(file, kind, 0, 0, 0));
        }

        private String displayName(Path f) {
            Path rel = folder.relativize(f);
            return rel.toString().replace('\\', '/');
        }
    }
}
