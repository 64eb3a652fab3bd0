package org.cupel.demo;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cupel.demo.PlantedProblem.Kind;

/** The samples that carry planted problems, collected while batches stream by, turned into the summary at the end. */
final class PlantLog {

    Submission carryHigh;
    Submission carryBlank;
    Submission swap;
    Submission duplicateRow;
    Submission typo;
    final List<Submission> poorPulp = new ArrayList<>();
    final List<Submission> neverReceived = new ArrayList<>();
    final List<Submission> insufficient = new ArrayList<>();
    final List<Submission> notReceivedCode = new ArrayList<>();
    final List<Submission> overLimit = new ArrayList<>();
    final List<String> reassayFiles = new ArrayList<>();
    int overLimitAu;
    int overLimitAg;

    List<PlantedProblem> problems(PlantedBatches plan, DemoSettings settings, List<DemoCrm> crms,
                                  List<DemoAnalyte> analytes) {
        int n = settings.batches();
        List<PlantedProblem> out = new ArrayList<>();
        DemoCrm drifting = DemoCrm.byCode(crms, DemoCrm.DRIFTING);
        int beyond = PlantedBatches.firstBatchBeyondThreeSd(n);
        out.add(new PlantedProblem(Kind.CRM_DRIFT, DemoCrm.DRIFTING, List.of(), String.format(Locale.ROOT,
                "Au of %s (certified %.3f g/t, SD %.3f) reads high by a bias growing linearly from 0 to +%.1f SD"
                        + " (+%.3f SD per batch); from batch %s on the bias exceeds +3 SD.",
                drifting.code(), drifting.certified()[0], drifting.sd()[0], DemoGenerator.DRIFT_TOTAL_SD,
                PlantedBatches.driftSd(1, n), DemoGenerator.job(beyond))));
        DemoCrm actual = DemoCrm.byCode(crms, DemoCrm.SWAP_ACTUAL);
        DemoCrm registered = DemoCrm.byCode(crms, DemoCrm.SWAP_REGISTERED);
        out.add(new PlantedProblem(Kind.CRM_SWAP, DemoGenerator.labFile(plan.swap), ids(List.of(swap)),
                String.format(Locale.ROOT, "registered as %s (Au %.3f g/t) but the material is %s (Au %.3f g/t):"
                        + " reported Au %.3f, Ag %.1f.", registered.code(), registered.certified()[0],
                        actual.code(), actual.certified()[0], swap.values[0], swap.values[1])));
        out.add(new PlantedProblem(Kind.BLANK_CARRY_OVER, DemoGenerator.labFile(plan.carryOver),
                ids(List.of(carryBlank, carryHigh)), String.format(Locale.ROOT,
                "blank %s right after %s (Au %.3f g/t) reports Au %.3f g/t: %.1f %% carry-over.",
                carryBlank.id, carryHigh.id, carryHigh.values[0], carryBlank.values[0],
                100 * DemoLabModel.CARRY_OVER)));
        out.add(new PlantedProblem(Kind.POOR_PULP_PRECISION, DemoGenerator.labFile(plan.poorPulp), ids(poorPulp),
                String.format(Locale.ROOT, "the %d pulp duplicates of this batch scatter with log SD %.2f instead of"
                        + " %.2f.", poorPulp.size(), DemoLabModel.POOR_PULP_FACTOR * DemoLabModel.PULP_SD,
                        DemoLabModel.PULP_SD)));
        out.add(new PlantedProblem(Kind.OVER_LIMIT_REASSAY, reassayFiles.size() + " re-assay files lab/*-GRAV.csv",
                ids(overLimit), String.format(Locale.ROOT, "%d Au results >%s and %d Ag results >%s, re-assayed by"
                        + " FA-GRAV; below-detection values are written <DL, and -DL in batches %s.", overLimitAu,
                        analytes.get(0).upperLimitText(), overLimitAg, analytes.get(1).upperLimitText(),
                        negativeBatches(n))));
        out.add(new PlantedProblem(Kind.DUPLICATE_ID_ROW, DemoGenerator.labFile(plan.duplicateRow),
                ids(List.of(duplicateRow)), "sample " + duplicateRow.id
                        + " appears twice; the second row, at the end of the file, has different values."));
        out.add(new PlantedProblem(Kind.TEXT_TYPO, DemoGenerator.labFile(plan.typo), ids(List.of(typo)),
                "the Au cell of " + typo.id + " reads '" + typo.typoText + "' (letter O for a zero)."));
        out.add(new PlantedProblem(Kind.NEVER_RECEIVED, "register.csv", ids(neverReceived),
                "registered but absent from every lab file (batch " + DemoGenerator.job(plan.neverReceived) + ")."));
        out.add(new PlantedProblem(Kind.INSUFFICIENT_SAMPLE_CODE, "lab files", ids(insufficient),
                "reported IS (insufficient sample) in every analyte column."));
        out.add(new PlantedProblem(Kind.NOT_RECEIVED_CODE, "lab files", ids(notReceivedCode),
                "reported NR (not received) in every analyte column."));
        return out;
    }

    private static String negativeBatches(int n) {
        StringBuilder sb = new StringBuilder();
        int shown = 0;
        for (int b = 0; b < n && shown < 3; b++) {
            if (LabFileStyle.usesNegativeBelowDetection(b)) {
                sb.append(shown++ == 0 ? "" : ", ").append(DemoGenerator.job(b));
            }
        }
        return n > 24 ? sb + " (one in eight)" : sb.toString();
    }

    private static List<String> ids(List<Submission> samples) {
        List<String> ids = new ArrayList<>(samples.size());
        for (Submission s : samples) {
            ids.add(s.id);
        }
        return ids;
    }
}
