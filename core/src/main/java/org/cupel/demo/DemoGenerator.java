package org.cupel.demo;

import java.io.IOException;
import java.io.Writer;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.SplittableRandom;
import org.cupel.assay.QcRole;

/**
 * Writes the invented Vellmar Hills gold–silver drilling programme: lab files of the primary lab
 * (Orrindale Assay Laboratory) and the umpire lab (Brisk Fen Analytical), the sample register, the CRM
 * catalog and a metallurgical testwork set. All names are invented. One {@link SplittableRandom} seeded
 * from {@link DemoSettings#seed()} drives everything, and only one batch is held in memory at a time, so
 * 1,000,000 samples stream.
 *
 * <p><b>Insertion.</b> Every block of 20 routine samples gets one CRM (the four CRMs in rotation), one
 * blank, one field duplicate, one coarse-reject duplicate and one pulp duplicate (duplicates right after
 * their original, CRM and blank at random places), one lab repeat (the lab's row {@code <ID>-R}) and one
 * umpire pulp (renumbered {@code VU...}, sent in groups of five batches to the umpire lab, which reads
 * 3 % high). Sampling errors are multiplicative with log SD 0.55 for field duplicates (0.1 of them 1.3:
 * nugget effect), 0.22 coarse-reject, 0.07 pulp, 0.04 lab repeat, times the analyte's nugget factor
 * for field and coarse duplicates.
 *
 * <p><b>Planted problems</b> (see docs/demo.md):
 * <ol>
 *   <li>CRM {@value DemoCrm#DRIFTING} Au drifts high, linearly from 0 to +{@value #DRIFT_TOTAL_SD} certified
 *       SD over the programme (about +0.16 SD per batch at the default size): late batches fail.</li>
 *   <li>One CRM registered as {@value DemoCrm#SWAP_REGISTERED} is really {@value DemoCrm#SWAP_ACTUAL} (a swap),
 *       at about a third of the programme.</li>
 *   <li>One blank right after a 9.2 g/t Au sample carries {@value DemoLabModel#CARRY_OVER} of it over (Au about 0.21 g/t).</li>
 *   <li>One batch (at 60 % of the programme) has pulp duplicates six times as scattered as the others.</li>
 *   <li>Au above 10 ppm and Ag above 100 ppm are reported {@code >10}, {@code >100} and re-assayed by
 *       fire assay with gravimetric finish in {@code lab/<JOB>-GRAV.csv}; below-detection values are
 *       {@code <0.005}, in three batches in 25 {@code -0.005}.</li>
 * </ol>
 * Data-entry problems: one sample ID twice in one file (a second, different row), one gold cell with a
 * letter O for a zero, one registered sample the lab never received, and {@code IS}/{@code NR} codes in
 * a few batches. One file is tab-separated, one has a byte-order mark and Windows line endings.
 */
public final class DemoGenerator {

    public static final String PROJECT = "Vellmar Hills gold-silver project";
    public static final String CLIENT = "Vellmar Exploration";
    public static final String LAB = "Orrindale Assay Laboratory";
    public static final String UMPIRE_LAB = "Brisk Fen Analytical";
    /** Suffix of the lab's repeat rows (one of the ingest's default repeat markers). */
    public static final String REPEAT_SUFFIX = "-R";
    static final double DRIFT_TOTAL_SD = 4.0;
    static final double UMPIRE_BIAS = 1.03;
    static final int UMPIRE_GROUP = 5;
    static final double HIGH_GRADE_AU = 9.2;
    static final double HIGH_GRADE_AG = 85;
    private static final LocalDate FIRST_REPORT = LocalDate.of(2025, 3, 3);

    private final DemoSettings settings;
    private final DemoSink sink;
    private final List<DemoAnalyte> analytes;
    private final List<DemoCrm> crms;
    private final DemoRandom random;
    private final DemoRandom testworkRandom;
    private final DrillHoles holes;
    private final PlantedBatches plan;
    private final DemoLabModel lab;
    private final List<String> files = new ArrayList<>();
    private final EnumMap<QcRole, Long> registered = new EnumMap<>(QcRole.class);
    private final List<Submission> pendingUmpire = new ArrayList<>();
    private final PlantLog log = new PlantLog();
    private Writer register;
    private int routineDone;
    private long ticket;
    private long umpireTicket;
    private int globalBlock;
    private int umpireBatches;
    private long labRepeats;

    private DemoGenerator(DemoSettings settings, DemoSink sink) {
        this.settings = settings;
        this.sink = sink;
        this.analytes = settings.analytes();
        this.crms = DemoCrm.catalog(analytes);
        DemoRandom root = new DemoRandom(new SplittableRandom(settings.seed()));
        this.testworkRandom = root.split();
        this.random = root.split();
        this.holes = new DrillHoles(random, analytes);
        this.plan = new PlantedBatches(settings.batches());
        this.lab = new DemoLabModel(random, analytes, crms, settings.batches(), plan.poorPulp);
    }

    /** Writes the whole demo project into {@code sink}. */
    public static DemoSummary generate(DemoSettings settings, DemoSink sink) throws IOException {
        return new DemoGenerator(settings, sink).run();
    }

    private DemoSummary run() throws IOException {
        writeCatalog();
        register = open("register.csv");
        register.write("sample_id,qc_role,reference,hole_id,from_m,to_m\n");
        int batches = settings.batches();
        for (int b = 0; b < batches; b++) {
            writeBatch(b);
            if ((b + 1) % UMPIRE_GROUP == 0 || b == batches - 1) {
                flushUmpire(b);
            }
        }
        register.close();
        DemoTestwork.write(testworkRandom, this::open);
        List<PlantedProblem> planted = log.problems(plan, settings, crms, analytes);
        writeReadme(planted);
        return new DemoSummary(files, registered, labRepeats, batches, umpireBatches, log.reassayFiles.size(),
                analytes, planted);
    }

    private Writer open(String path) throws IOException {
        files.add(path);
        return sink.open(path);
    }

    static String job(int b) {
        return "OAL-" + DrillHoles.pad(b + 1L, 5);
    }

    static String labFile(int b) {
        return "lab/" + job(b) + "." + LabFileStyle.forBatch(b).extension();
    }

    private LocalDate reported(int b) {
        return FIRST_REPORT.plusDays((long) b * (settings.batches() <= 100 ? 7 : 1));
    }

    // ---------------------------------------------------------------- batches

    private void writeBatch(int b) throws IOException {
        int routine = Math.min(settings.routinePerBatch(), settings.samples() - routineDone);
        routineDone += routine;
        List<Submission> order = new ArrayList<>(routine * 3 / 2);
        for (int start = 0, j = 0; start < routine; start += DemoSettings.BLOCK, j++) {
            order.addAll(block(b, j, Math.min(DemoSettings.BLOCK, routine - start)));
        }
        for (Submission s : order) {
            s.id = "VH" + DrillHoles.pad(++ticket, 7);
        }
        writeRegister(order);
        writeLabFile(b, order);
        writeReassays(b, order);
    }

    private List<Submission> block(int b, int j, int size) {
        List<Submission> routine = new ArrayList<>(size);
        for (int i = 0; i < size; i++) {
            DrillInterval iv = holes.next();
            Submission s = new Submission(QcRole.ROUTINE, iv, null, null, iv.grade());
            s.values = lab.measure(s.truth);
            routine.add(s);
        }
        Submission carryHigh = j == 0 ? plantBatchProblems(b, routine) : null;
        List<Submission> free = routine.stream().filter(s -> !s.special).toList();
        List<Submission> order = new ArrayList<>(size + 6);
        if (free.isEmpty()) {
            order.addAll(routine);
        } else {
            Submission fd = pick(free, false);
            Submission cd = pick(free, false);
            Submission pd = pick(free, true);
            pick(free, false).labRepeat = true;
            pendingUmpire.add(pick(free, true));
            for (Submission r : routine) {
                order.add(r);
                addDuplicates(order, r, fd, cd, pd, b);
            }
        }
        boolean swapHere = b == plan.swap && j == 0;
        String code = swapHere ? DemoCrm.SWAP_REGISTERED : crms.get(globalBlock % crms.size()).code();
        globalBlock++;
        int at = random.below(order.size() + 1);
        Submission crm = lab.crm(code, b, swapHere);
        if (swapHere) {
            log.swap = crm;
        }
        order.add(at, crm);
        if (carryHigh == null) {
            order.add(random.below(order.size() + 1), lab.blank());
        } else {
            Submission blank = lab.contaminatedBlank(carryHigh);
            order.add(order.indexOf(carryHigh) + 1, blank);
            log.carryBlank = blank;
        }
        return order;
    }

    private void addDuplicates(List<Submission> order, Submission r, Submission fd, Submission cd, Submission pd,
                               int b) {
        if (r == fd) {
            order.add(lab.duplicate(QcRole.FIELD_DUPLICATE, r, b));
        }
        if (r == cd) {
            order.add(lab.duplicate(QcRole.COARSE_DUPLICATE, r, b));
        }
        if (r == pd) {
            Submission dup = lab.duplicate(QcRole.PULP_DUPLICATE, r, b);
            order.add(dup);
            if (b == plan.poorPulp) {
                log.poorPulp.add(dup);
            }
        }
    }

    /** Marks the batch's planted data problems on distinct routine samples of its first block. */
    private Submission plantBatchProblems(int b, List<Submission> routine) {
        Submission high = null;
        if (b == plan.carryOver) {
            high = special(routine, false);
            high.truth[0] = HIGH_GRADE_AU;
            high.truth[1] = HIGH_GRADE_AG;
            high.values = lab.measure(high.truth);
            log.carryHigh = high;
        }
        if (b == plan.neverReceived) {
            Submission s = special(routine, false);
            s.neverReceived = true;
            log.neverReceived.add(s);
        }
        if (b == plan.duplicateRow) {
            log.duplicateRow = special(routine, false);
        }
        if (b == plan.typo) {
            Submission s = special(routine, true);
            s.typoText = typo(LabTableWriter.cellText(analytes.get(0), s.values[0], LabFileStyle.forBatch(b)));
            log.typo = s;
        }
        if (PlantedBatches.hasInsufficientSample(b)) {
            Submission s = special(routine, false);
            s.rowCode = "IS";
            log.insufficient.add(s);
        }
        if (PlantedBatches.hasNotReceivedCode(b)) {
            Submission s = special(routine, false);
            s.rowCode = "NR";
            log.notReceivedCode.add(s);
        }
        return high;
    }

    /** A letter O typed for the first zero (or in front, when the text has no zero). */
    static String typo(String text) {
        int zero = text.indexOf('0');
        return zero < 0 ? "O" + text : text.substring(0, zero) + 'O' + text.substring(zero + 1);
    }

    private Submission special(List<Submission> routine, boolean mineralised) {
        List<Submission> free = routine.stream().filter(s -> !s.special).toList();
        Submission s = pick(free, mineralised);
        s.special = true;
        return s;
    }

    /** A random sample of {@code from}; when {@code mineralised}, up to five more tries for Au of 10 DL or more. */
    private Submission pick(List<Submission> from, boolean mineralised) {
        Submission s = from.get(random.below(from.size()));
        double floor = 10 * DemoAnalyte.GOLD.detectionLimit();
        for (int t = 0; mineralised && t < 5 && s.values[0] < floor; t++) {
            s = from.get(random.below(from.size()));
        }
        return s;
    }

    // ---------------------------------------------------------------- files

    private void writeRegister(List<Submission> order) throws IOException {
        StringBuilder line = new StringBuilder(96);
        for (Submission s : order) {
            registerLine(line, s);
        }
    }

    private void registerLine(StringBuilder line, Submission s) throws IOException {
        line.setLength(0);
        line.append(s.id).append(',').append(roleCode(s.role)).append(',').append(s.reference()).append(',');
        if (s.interval != null) {
            line.append(s.interval.hole()).append(',');
            FixedDecimal.append(line, s.interval.from(), 1).append(',');
            FixedDecimal.append(line, s.interval.to(), 1);
        } else {
            line.append(",,");
        }
        register.append(line.append('\n'));
        registered.merge(s.role, 1L, Long::sum);
    }

    /** The register's role codes, in the short forms of docs/input-formats.md. */
    static String roleCode(QcRole role) {
        switch (role) {
            case CRM: return "CRM";
            case BLANK: return "blank";
            case FIELD_DUPLICATE: return "FD";
            case COARSE_DUPLICATE: return "CD";
            case PULP_DUPLICATE: return "PD";
            case LAB_REPEAT: return "LR";
            case UMPIRE: return "UMP";
            default: return "routine";
        }
    }

    private List<String> headerBlock(String lab, String job, LocalDate date) {
        return List.of("Lab: " + lab, "Job: " + job, "Date reported: " + date, "Client: " + CLIENT,
                "Project: " + PROJECT);
    }

    private void writeLabFile(int b, List<Submission> order) throws IOException {
        LabFileStyle style = LabFileStyle.forBatch(b);
        try (LabTableWriter w = new LabTableWriter(open(labFile(b)), style, analytes,
                headerBlock(LAB, job(b), reported(b)))) {
            for (Submission s : order) {
                if (s.neverReceived) {
                    continue;
                }
                w.row(s.id, s.values, s.rowCode, s.typoText);
                if (s.labRepeat) {
                    w.row(s.id + REPEAT_SUFFIX, lab.measure(lab.repeatTruth(s)), null, null);
                    labRepeats++;
                }
            }
            if (b == plan.duplicateRow) {
                Submission d = log.duplicateRow;
                w.row(d.id, lab.measure(d.truth), null, null);
            }
        }
    }

    private void writeReassays(int b, List<Submission> order) throws IOException {
        List<Submission> over = new ArrayList<>();
        for (Submission s : order) {
            if (!s.neverReceived && s.rowCode == null && s.typoText == null
                    && (s.values[0] > analytes.get(0).upperLimit() || s.values[1] > analytes.get(1).upperLimit())) {
                over.add(s);
            }
        }
        if (over.isEmpty()) {
            return;
        }
        String path = "lab/" + job(b) + "-GRAV.csv";
        log.reassayFiles.add(path);
        List<DemoAnalyte> grav = List.of(DemoAnalyte.GRAV_GOLD, DemoAnalyte.GRAV_SILVER);
        try (LabTableWriter w = new LabTableWriter(open(path), LabFileStyle.PLAIN, grav,
                headerBlock(LAB, job(b), reported(b).plusDays(6)))) {
            for (Submission s : over) {
                log.overLimit.add(s);
                log.overLimitAu += s.values[0] > analytes.get(0).upperLimit() ? 1 : 0;
                log.overLimitAg += s.values[1] > analytes.get(1).upperLimit() ? 1 : 0;
                double[] v = new double[2];
                for (int a = 0; a < 2; a++) {
                    v[a] = s.truth[a] * random.logFactor(DemoLabModel.GRAV_RSD) + grav.get(a).absoluteSd() * random.gaussian();
                }
                w.row(s.id, v, null, null);
            }
        }
    }

    private void flushUmpire(int lastBatch) throws IOException {
        if (pendingUmpire.isEmpty()) {
            return;
        }
        umpireBatches++;
        String job = "BFA-U" + DrillHoles.pad(umpireBatches, 4);
        List<DemoAnalyte> cols = List.of(DemoAnalyte.UMPIRE_GOLD, DemoAnalyte.UMPIRE_SILVER);
        StringBuilder line = new StringBuilder(96);
        try (LabTableWriter w = new LabTableWriter(open("lab/umpire-" + job + ".csv"), LabFileStyle.PLAIN, cols,
                headerBlock(UMPIRE_LAB, job, reported(lastBatch).plusDays(24)))) {
            for (Submission o : pendingUmpire) {
                double[] truth = {o.truth[0] * UMPIRE_BIAS, o.truth[1] * UMPIRE_BIAS};
                Submission u = new Submission(QcRole.UMPIRE, o.interval, o, null, truth);
                u.id = "VU" + DrillHoles.pad(++umpireTicket, 7);
                double[] v = new double[2];
                for (int a = 0; a < 2; a++) {
                    v[a] = lab.measure(cols.get(a), truth[a]);
                }
                registerLine(line, u);
                w.row(u.id, v, null, null);
            }
        }
        pendingUmpire.clear();
    }

    private void writeCatalog() throws IOException {
        try (Writer w = open("crm-catalog.csv")) {
            w.write("crm,analyte,unit,certified_value,sd,ci95_low,ci95_high,method\n");
            StringBuilder line = new StringBuilder();
            for (DemoCrm c : crms) {
                for (int a = 0; a < analytes.size(); a++) {
                    catalogLine(line, c, a);
                    w.append(line);
                }
            }
        }
    }

    /**
     * One catalog row. The 95 % interval of the certified mean is {@code value +- 0.42 SD}, as for a
     * round robin of 24 labs ({@code t(0.975, 23) / sqrt(24) = 2.069 / 4.899}; t quantile recalled from memory).
     */
    private void catalogLine(StringBuilder line, DemoCrm c, int a) {
        DemoAnalyte an = analytes.get(a);
        int d = an == DemoAnalyte.GOLD ? 3 : an == DemoAnalyte.SILVER ? 1 : an.decimals() + 1;
        double half = 0.42 * c.sd()[a];
        line.setLength(0);
        line.append(c.code()).append(',').append(an.symbol()).append(',')
                .append(an == DemoAnalyte.GOLD ? "g/t" : an.unit()).append(',');
        FixedDecimal.append(line, c.certified()[a], d).append(',');
        FixedDecimal.append(line, c.sd()[a], d).append(',');
        FixedDecimal.append(line, c.certified()[a] - half, d + 1).append(',');
        FixedDecimal.append(line, c.certified()[a] + half, d + 1).append(',');
        line.append(an.method()).append('\n');
    }

    private void writeReadme(List<PlantedProblem> planted) throws IOException {
        try (Writer w = open("README.md")) {
            w.write("# " + PROJECT + " (invented demo data)\n\n");
            w.write("Written by `cupel demo` with seed " + settings.seed() + " and " + settings.samples()
                    + " routine samples. Every name and number here is invented.\n"
                    + "Primary lab: " + LAB + "; umpire lab: " + UMPIRE_LAB + ". See docs/demo.md.\n\n"
                    + "## Planted problems\n\n");
            for (PlantedProblem p : planted) {
                w.write("- **" + p.kind() + "** (" + p.where() + "): " + p.detail() + "\n");
            }
        }
    }
}
