package org.cupel.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.cupel.api.Cupel;
import org.cupel.control.AnalyteVerdict;
import org.cupel.control.BatchInsertion;
import org.cupel.control.BatchReview;
import org.cupel.control.BatchVerdict;
import org.cupel.control.InsertionRate;
import org.cupel.control.ReassayEntry;
import org.cupel.control.ReassaySettings;
import org.cupel.control.ResubmitEntry;
import org.cupel.control.UmpireLab;
import org.cupel.control.Verdict;
import org.cupel.control.VerdictReason;
import org.cupel.project.Project;
import org.cupel.report.CsvTables;
import org.cupel.report.control.InsertionRateSection;
import org.cupel.report.control.VerdictSection;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code cupel batches}: the batch-by-batch review of a project. */
@Command(name = "batches", mixinStandardHelpOptions = true,
        description = {"Judge every lab batch of a project: pass / warn / fail per analyte with the control",
                "sample and rule behind each, the re-assay list, blank and carry-over findings, and the",
                "insertion rates of CRMs, blanks and duplicates against their targets."},
        footer = {"", "Example:", "  cupel batches demo-project --reassay-csv reassay.csv --fail-on-qc"})
final class BatchesCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "PROJECT-FOLDER", description = "The project folder.")
    Path folder;

    @Option(names = "--json", description = "Print the review as JSON (docs/json-batches.md).")
    boolean json;

    @Option(names = "--reassay-csv", paramLabel = "FILE", description = "Also write the re-assay list as CSV.")
    Path reassayCsv;

    @Option(names = "--fail-on-qc", description = "Exit with status 1 when any batch fails.")
    boolean failOnQc;

    @Mixin
    WideOption terminal;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        if (reassayCsv != null) {
            CsvTables.prepare();
        }
        Cupel cupel = Cupel.open(folder);
        Project project = cupel.project();
        BatchReview review = cupel.batches();
        if (reassayCsv != null) {
            try {
                CsvTables.write(VerdictSection.reassayTable(review.reassay()), reassayCsv);
            } catch (IOException e) {
                throw new UncheckedIOException("could not write " + reassayCsv + ": " + e.getMessage(), e);
            }
        }
        if (json) {
            Map<String, Object> doc = new LinkedHashMap<>();
            doc.put("project", project.name());
            doc.put("anyBatchFailed", review.anyBatchFailed());
            doc.put("verdicts", review.verdicts());
            doc.put("reassay", review.reassay());
            doc.put("blanks", review.blanks());
            doc.put("insertion", review.insertion());
            doc.put("outcomes", review.outcomes());
            doc.put("umpireLabs", review.groups().umpireLabs());
            doc.put("resubmit", review.resubmit().entries());
            Json.print(out, doc);
        } else {
            print(terminal.text(out), project, review);
        }
        return failOnQc && review.anyBatchFailed() ? CupelCommand.QC_FAILED : CupelCommand.OK;
    }

    private static void print(PrintWriter out, Project project, BatchReview review) {
        out.println("Batch verdicts: " + project.name());
        TextTable t = new TextTable("Batch", "Lab", "Samples", "Verdict", "Per analyte (control results)");
        for (BatchVerdict v : review.groups().primary()) {
            List<String> per = new ArrayList<>();
            for (AnalyteVerdict a : v.analytes()) {
                per.add(a.analyte() + " " + label(a.verdict()) + " (" + a.nControls() + ")");
            }
            t.row(v.batch(), v.lab(), v.nSamples(), label(v.verdict()), String.join(", ", per));
        }
        t.print(out);
        for (UmpireLab u : review.groups().umpireLabs()) {
            out.println(wrap(VerdictSection.umpireLine(u), LINE));
        }
        out.println();
        out.println("Reasons");
        boolean any = false;
        for (BatchVerdict v : review.groups().primary()) {
            for (VerdictReason r : v.reasons()) {
                any = true;
                out.println("  " + v.batch() + "  " + label(r.verdict()) + "  " + VerdictSection.reason(r));
            }
        }
        if (!any) {
            // A batch without control results has no reason listed when no analyte has a control at all.
            boolean judged = !review.groups().primary().isEmpty()
                    && review.groups().primary().stream().allMatch(v -> v.verdict() == Verdict.PASS);
            out.println(judged ? "  every control result passed"
                    : "  no control results (no CRM or blank result in any batch): no batch can be judged");
        }
        out.println();
        if (review.reassay().entries().isEmpty()) {
            out.println("Re-assay list: empty (no control failure calls for re-assay).");
        } else {
            out.println("Re-assay list (" + review.reassay().entries().size() + " sample results, scope "
                    + review.reassay().scope() + (review.reassay().scope() == ReassaySettings.Scope.BRACKET
                    ? ", CRM brackets bounded by " + (review.reassay().crmBracket()
                    == ReassaySettings.CrmBracket.PASSING_CRM ? "passing CRMs" : "passing CRMs or blanks") : "")
                    + ")");
            TextTable r = new TextTable("Sample", "Batch", "Position", "Analyte", "Triggered by");
            for (ReassayEntry e : review.reassay().entries()) {
                r.row(e.sampleId(), e.batch(), e.position(), e.analyte(), String.join(", ", e.triggeredBy()));
            }
            r.print(out);
        }
        out.println();
        printResubmit(out, review);
        out.println();
        BlankTables.print(out, review.blanks());
        out.println();
        printInsertion(out, review);
    }

    /** Terminal width the prose lines are wrapped to. */
    private static final int LINE = 120;

    /** {@code text} broken at spaces into lines of at most {@code width} characters (a longer word stands alone). */
    static String wrap(String text, int width) {
        StringBuilder out = new StringBuilder();
        int lineStart = 0;
        for (String word : text.split(" ")) {
            if (out.length() > lineStart && out.length() - lineStart + 1 + word.length() > width) {
                out.append('\n');
                lineStart = out.length();
            } else if (out.length() > lineStart) {
                out.append(' ');
            }
            out.append(word);
        }
        return out.toString();
    }

    private static void printResubmit(PrintWriter out, BatchReview review) {
        if (review.resubmit().entries().isEmpty()) {
            out.println("Samples to re-submit: none (the lab reported no sample insufficient or not received).");
            return;
        }
        out.println("Samples to re-submit (" + review.resubmit().entries().size()
                + ", reported insufficient or not received: no result to re-assay)");
        TextTable r = new TextTable("Sample", "Batch", "Position", "Analytes", "Lab code", "Reason", "File", "Line");
        for (ResubmitEntry e : review.resubmit().entries()) {
            r.row(e.sampleId(), e.batch(), e.position(), String.join(", ", e.analytes()),
                    String.join(", ", e.labCodes()), e.reasonText(), e.source().file(), e.source().line());
        }
        r.print(out);
    }

    private static final List<String> SHORT = InsertionRateSection.SHORT_NAMES;

    private static void printInsertion(PrintWriter out, BatchReview review) {
        List<String> headers = new ArrayList<>(List.of("Batch", "Routine"));
        headers.addAll(SHORT);
        headers.add("Below target");
        TextTable t = new TextTable(headers.toArray(new String[0]));
        List<BatchInsertion> rows = new ArrayList<>(review.insertion().batches());
        rows.add(review.insertion().overall());
        for (BatchInsertion b : rows) {
            List<Object> cells = new ArrayList<>(List.of(b.batch(), b.nRoutine()));
            List<String> low = new ArrayList<>();
            for (int i = 0; i < b.rates().size(); i++) {
                InsertionRate r = b.rates().get(i);
                cells.add(r.count() + " (" + (Double.isNaN(r.rate()) ? "-" : InsertionRateSection.percent(r.rate())) + ")");
                if (r.belowTarget()) {
                    low.add(SHORT.get(i));
                }
            }
            cells.add(String.join(", ", low));
            t.row(cells.toArray());
        }
        out.println("Insertion rates: count (per routine sample); targets "
                + InsertionRateSection.targets(review.insertion()));
        t.print(out);
    }

    private static String label(Verdict v) {
        return VerdictSection.label(v);
    }
}
