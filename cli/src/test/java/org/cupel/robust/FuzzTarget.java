package org.cupel.robust;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import org.cupel.cli.CliRun;
import org.cupel.cli.CupelCommand;

/**
 * One reader reached through the command line: the small well-formed files it starts from (invented data),
 * the file that gets damaged, and the command that reads them. Every reader of issue 9 has a target: lab
 * files, register, catalog and cupel.yaml through a project; the plain CSVs of duplicates, censored, crm and
 * blanks; testwork heads and smelts. A project target's register may also be laid out wrongly (issue 15).
 */
enum FuzzTarget {
    LAB_FILE_CHECK("lab/OAL-1.csv", dir -> args("check", dir.toString(), "--json")),
    LAB_FILE_DUPLICATES("lab/OAL-1.csv", dir -> args("duplicates", dir.toString(), "--json")),
    REGISTER("register.csv", dir -> args("duplicates", dir.toString(), "--json")),
    REGISTER_CHECK("register.csv", dir -> args("check", dir.toString())),
    CATALOG("crm-catalog.csv", dir -> args("crm", dir.toString(), "--json")),
    CONFIG("cupel.yaml", dir -> args("crm", dir.toString(), "--json")),
    CONFIG_CHECK("cupel.yaml", dir -> args("check", dir.toString(), "--json")),
    PAIRS("pairs.csv", dir -> args("duplicates", dir.resolve("pairs.csv").toString(), "--json")),
    CENSORED("assays.csv", dir -> args("censored", dir.resolve("assays.csv").toString(), "--column", "Au_ppm",
            "--json")),
    CRM_RESULTS("crm-results.csv", dir -> args("crm", "--results", dir.resolve("crm-results.csv").toString(),
            "--catalog", dir.resolve("crm-catalog.csv").toString(), "--json")),
    CRM_RESULTS_CATALOG("crm-catalog.csv", dir -> args("crm", "--results",
            dir.resolve("crm-results.csv").toString(), "--catalog", dir.resolve("crm-catalog.csv").toString())),
    BLANKS("blank-results.csv", dir -> args("blanks", dir.resolve("blank-results.csv").toString(), "--json")),
    HEADS("testwork/heads.csv", dir -> args("recovery", dir.toString(), "--json")),
    SMELTS("testwork/smelts.csv", dir -> args("recovery", dir.toString(), "--json"));

    static final String LAB = "Lab: Invented Assay Laboratory\nJob: OAL-1\nDate reported: 2025-03-03\n"
            + "Sample ID,Au_ppm_FA-AAS,Ag_ppm_AR-ICP\n"
            + "S001,0.200,8.9\nB001,<0.005,<0.5\nC001,0.405,3.9\nS002,0.407,3.8\nS002D,0.398,4.3\n"
            + "S003,0.007,1.6\nS004,1.52,12\nS004D,1.49,11.5\nS005,>10,N.S.\nS006,0.044,-0.5\n";
    static final String REGISTER_CSV = "sample_id,qc_role,reference,hole_id,from_m,to_m\n"
            + "S001,routine,,H1,0,1\nB001,blank,,,,\nC001,crm,KC-1,,,\nS002,routine,,H1,1,2\n"
            + "S002D,field_duplicate,S002,,,\nS003,routine,,H1,2,3\nS004,routine,,H1,3,4\n"
            + "S004D,pulp_duplicate,S004,,,\nS005,routine,,H1,4,5\nS006,routine,,H1,5,6\n";
    static final String CATALOG_CSV = "crm,analyte,unit,certified_value,sd,ci95_low,ci95_high,method\n"
            + "KC-1,Au,g/t,0.412,0.018,0.4044,0.4196,FA-AAS\nKC-1,Ag,ppm,3.8,0.3,3.67,3.93,AR-ICP\n";
    static final String CONFIG_YAML = "project: Fuzz project\ningest:\n  units: {Au: g/t}\n"
            + "  methodPriority: {Au: [FA-GRAV, FA-AAS]}\nduplicates:\n  bootstrapSeed: 7\n";
    static final String PAIRS_CSV = "id,batch,original,duplicate,dl\nD1,J1,0.52,0.49,0.005\nD2,J1,1.10,1.31,0.005\n"
            + "D3,J1,0.044,0.051,0.005\nD4,J2,<0.005,0.006,0.005\nD5,J2,2.4,2.2,0.005\nD6,J2,0.31,0.35,0.005\n";
    static final String CENSORED_CSV = "Sample ID,Au_ppm\nS1,<0.005\nS2,0.012\nS3,<0.01\nS4,0.031\nS5,0.007\n"
            + "S6,0.25\nS7,0.018\n";
    static final String CRM_CATALOG_CSV = "crm,analyte,unit,certified_value,sd\nLOW,Au,g/t,0.50,0.03\n"
            + "MID,Au,g/t,2.50,0.10\n";
    static final String CRM_RESULTS_CSV = "crm,batch,position,date,Au_ppm\nLOW,J1,5,2025-03-03,0.51\n"
            + "MID,J1,15,2025-03-03,2.52\nLOW,J2,5,2025-03-10,0.49\nMID,J2,15,2025-03-10,2.45\n"
            + "LOW,J3,5,2025-03-17,<0.01\nZZ-9,J3,15,2025-03-17,1.10\n";
    static final String BLANKS_CSV = "sample_id,batch,position,preceding_id,Au_ppm,preceding_Au_ppm,dl_Au\n"
            + "BLK-001,J1,5,S-004,<0.005,0.42,0.005\nBLK-002,J1,25,S-024,0.007,1.85,0.005\n"
            + "BLK-003,J1,45,S-044,0.31,25.4,0.005\nBLK-004,J2,5,S-104,0.02,3.1,0.005\n";
    static final String HEADS_CSV = "feed,replicate,Au_g/t,Ag_g/t\nF1,1,318.1,1863\nF1,2,307.4,1832\n"
            + "F1,3,312.0,1850\n";
    static final String SMELTS_CSV = "test_id,condition,replicate,feed,charge_g,product,product_role,mass_g,"
            + "Au_g/t,Ag_g/t\n"
            + "SM-01,A,1,F1,49.97,button,collected,30.64,472.5,2680\nSM-01,A,1,F1,49.97,slag,loss,40.1,3.2,20\n"
            + "SM-02,A,2,F1,50.02,button,collected,30.20,480.1,2701\nSM-02,A,2,F1,50.02,slag,loss,39.8,2.9,18\n"
            + "SM-03,B,1,F1,50.00,button,collected,31.00,470.0,2650\nSM-03,B,1,F1,50.00,slag,loss,40.0,4.1,22\n"
            + "SM-04,B,2,F1,49.95,button,collected,30.90,468.2,2644\nSM-04,B,2,F1,49.95,slag,loss,40.3,4.4,25\n";

    private static final String REGISTER_FILE = "register.csv";

    private final String damaged;
    private final Function<Path, String[]> command;

    FuzzTarget(String damaged, Function<Path, String[]> command) {
        this.damaged = damaged;
        this.command = command;
    }

    String damaged() {
        return damaged;
    }

    /** {@code cupel check} lists fatal problems as its output (stdout) and exits 2, rather than failing. */
    boolean listsProblemsOnStdout() {
        return name().endsWith("_CHECK");
    }

    /** The well-formed files of this target, by relative path. */
    Map<String, String> seeds() {
        Map<String, String> f = new LinkedHashMap<>();
        switch (this) {
            case LAB_FILE_CHECK, LAB_FILE_DUPLICATES, REGISTER, REGISTER_CHECK, CATALOG, CONFIG, CONFIG_CHECK -> {
                f.put("lab/OAL-1.csv", LAB);
                f.put("register.csv", REGISTER_CSV);
                f.put("crm-catalog.csv", CATALOG_CSV);
                f.put("cupel.yaml", CONFIG_YAML);
            }
            case PAIRS -> f.put("pairs.csv", PAIRS_CSV);
            case CENSORED -> f.put("assays.csv", CENSORED_CSV);
            case CRM_RESULTS, CRM_RESULTS_CATALOG -> {
                f.put("crm-results.csv", CRM_RESULTS_CSV);
                f.put("crm-catalog.csv", CRM_CATALOG_CSV);
            }
            case BLANKS -> f.put("blank-results.csv", BLANKS_CSV);
            case HEADS, SMELTS -> {
                f.put("testwork/heads.csv", HEADS_CSV);
                f.put("testwork/smelts.csv", SMELTS_CSV);
            }
            default -> throw new AssertionError(this);
        }
        return f;
    }

    /** Writes the seeds into {@code dir} with the damaged file replaced by {@code content}. */
    void write(Path dir, byte[] content) throws IOException {
        write(dir, content, null);
    }

    /**
     * Writes the seeds into {@code dir} with the damaged file replaced by {@code content}, and, when
     * {@code layout} is given and the target has a register, the register laid out so (absent, under a near-miss
     * name, as a folder, or as a link to nothing).
     */
    void write(Path dir, byte[] content, Mutation.RegisterLayout layout) throws IOException {
        for (Map.Entry<String, String> e : seeds().entrySet()) {
            Path p = dir.resolve(e.getKey());
            Files.createDirectories(p.getParent());
            byte[] bytes = e.getKey().equals(damaged) ? content : e.getValue().getBytes(StandardCharsets.UTF_8);
            if (layout != null && e.getKey().equals(REGISTER_FILE)) {
                layRegister(dir, bytes, layout);
            } else {
                Files.write(p, bytes);
            }
        }
    }

    private static void layRegister(Path dir, byte[] bytes, Mutation.RegisterLayout layout) throws IOException {
        switch (layout) {
            case ABSENT -> {
            }
            case WRONG_CASE -> Files.write(dir.resolve("Register.csv"), bytes);
            case TSV_NAME -> Files.write(dir.resolve("register.tsv"), bytes);
            case FOLDER -> Files.write(Files.createDirectories(dir.resolve(REGISTER_FILE)).resolve("inside.csv"), bytes);
            case DANGLING_LINK -> Files.createSymbolicLink(dir.resolve(REGISTER_FILE), dir.resolve("gone.csv"));
            default -> throw new AssertionError(layout);
        }
    }

    /**
     * The file names an input-error message may name for this target: the damaged file, and the register
     * when its layout was changed.
     */
    List<String> blamable(Mutation.RegisterLayout layout) {
        List<String> names = new ArrayList<>(List.of(Path.of(damaged).getFileName().toString()));
        if (layout != null && seeds().containsKey(REGISTER_FILE)) {
            names.add(REGISTER_FILE);
        }
        return names;
    }

    byte[] seed() {
        return seeds().get(damaged).getBytes(StandardCharsets.UTF_8);
    }

    CliRun run(Path dir) {
        return CliRun.run(command.apply(dir));
    }

    private static String[] args(String... a) {
        return new ArrayList<>(List.of(a)).toArray(String[]::new);
    }
}
