package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.Map;
import org.cupel.assay.AssayValue;
import org.cupel.control.crm.CrmResult;
import org.cupel.control.crm.CrmReview;
import org.cupel.control.crm.SeriesReview;
import org.cupel.demo.DemoGenerator;
import org.cupel.demo.DemoSettings;
import org.cupel.ingest.ProjectLoader;
import org.cupel.project.Project;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every output of the CRM and batch reviews of two generated demo projects (Au–Ag and the ten-analyte
 * suite), written out in full (JSON of the batch review as {@code cupel batches --json} writes it; every
 * CRM result with its reason, findings, bias and drift) and reduced to a SHA-256 digest. The digests were
 * taken from the implementation before the one-pass rewrite (commit ef122a1), so any change to an outcome,
 * a message, an order or a number shows here. On a mismatch the text is left in target/ to diff.
 *
 * <p>The 12,000-sample digest was taken again when limits came to be compared on the reported decimals
 * ({@code LimitComparison}): four CRM results there lie exactly on ±2 SD (VHC-11 Ag 4.4 on 3.8 ± 0.3
 * twice, VHC-23 Ag 10.2 on 11.4 ± 0.6, VHC-48 Cu 0.184 % on 0.2 ± 0.008), whose computed z is
 * ±2.0000000000000018; they were 1-2s warnings and are now passes, and nothing else in the text changed.
 * Both digests were taken again when a failed CRM's re-assay bracket came to be bounded by passing CRMs only
 * (a passing blank no longer ends it; reassay.crmBracket): the re-assay lists grew, each bracket note names
 * the passing CRM, and the re-assay object carries crmBracket and blankFollowing. And again when isolated
 * outliers (beyond 3 SD, no neighbour beyond 2 SD on their side) were left out of drift: every drift object
 * carries an outlier list; in the 12,000-sample project VH0003746 (VHC-23 Au, z = 3.21) is one, so its
 * series' EWMA signal now starts at VH0004040 instead of at that single result, and the drifting series are
 * the same five. And again when the batch review came to carry the batches split into primary and umpire-lab
 * batches ({@code groups}) and the samples to re-submit ({@code resubmit}): with those two parts left out of
 * the JSON, both texts still gave the previous digests.
 * Both were taken again when values came to keep the decimals the lab and the catalog wrote
 * (issue 17): each AssayValue carries {@code decimals}, each certificate and its limits {@code valueDecimals}
 * and {@code sdDecimals}, and the reasons show values as written (VHC-11 Ag {@code 4.0}, not 4; VH0001006 Au
 * {@code 3.550}) and certified values as the catalog writes them. With those fields removed and every number
 * in the text read as a double, the old and new texts are identical line for line (23,639 and 433,555 lines):
 * no outcome, order or value changed. The merge of both changes gives the decimals-keeping text followed by
 * the {@code groups} and {@code resubmit} parts, and nothing else differs.
 */
class ControlOutputDigestTest {
    private static final ObjectMapper JSON = JsonMapper.builder()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS)
            .disable(SerializationFeature.FAIL_ON_EMPTY_BEANS)
            .addMixIn(AssayValue.class, WithoutDerivedFlags.class)
            .build();

    /**
     * Jackson also writes AssayValue's isMissing / isCensored / isDetected, in an order that reflection
     * does not fix from one run to the next; they follow from the qualifier, so the digest leaves them out.
     */
    @JsonIgnoreProperties({"missing", "censored", "detected"})
    private interface WithoutDerivedFlags {
    }

    @TempDir
    Path dir;

    @ParameterizedTest
    @CsvSource({
        "2500, 20260302, c209d10c137ac10013f5ae6d990d19ccc5362759952fed5cc16b9f9ef1531806",
        "12000, 7, e14a41af1b59d1c7d2027c5c3bd31c7df970571aea3402f684d5ea7732bdbe05",
    })
    void outputsAreUnchanged(int samples, long seed, String expected) throws Exception {
        DemoGenerator.generate(new DemoSettings(samples, seed), rel -> {
            Path p = dir.resolve(rel);
            Files.createDirectories(p.getParent());
            return new BufferedWriter(Files.newBufferedWriter(p, StandardCharsets.UTF_8));
        });
        Project project = ProjectLoader.load(dir);
        CrmReview crms = CrmReview.of(project);
        BatchReview batches = BatchReview.of(project, crms.outcomes());
        String text = crmText(crms) + JSON.writeValueAsString(batches);
        String digest = sha256(text);
        if (!digest.equals(expected)) {
            Files.writeString(Path.of("target", "control-output-" + samples + ".txt"), text);
        }
        assertEquals(expected, digest, "outputs changed; text in target/control-output-" + samples + ".txt");
    }

    private static String crmText(CrmReview r) throws JsonProcessingException {
        StringBuilder out = new StringBuilder();
        for (SeriesReview s : r.series()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("analyte", s.analyte());
            m.put("certificate", s.certificate());
            m.put("limits", s.limits());
            m.put("projectLimits", s.projectLimits());
            m.put("bias", s.bias());
            m.put("drift", s.drift());
            m.put("findings", s.findings());
            m.put("counts", s.failures() + "/" + s.warnings() + "/" + s.swaps());
            out.append(JSON.writeValueAsString(m)).append('\n');
            for (CrmResult x : s.results()) {
                out.append(x.point()).append('|').append(x.z()).append('|').append(x.band()).append('|')
                        .append(x.runningMean()).append('|').append(x.verdict()).append('|').append(x.rules())
                        .append('|').append(x.reason()).append('|').append(x.triggersReassay()).append('|')
                        .append(x.swapWith()).append('\n');
            }
        }
        out.append(JSON.writeValueAsString(r.analytes())).append('\n');
        out.append(JSON.writeValueAsString(r.exceptions())).append('\n');
        out.append(JSON.writeValueAsString(r.outcomes())).append('\n');
        out.append(r.failures()).append('/').append(r.warnings()).append('/').append(r.swaps()).append('\n');
        return out.toString();
    }

    private static String sha256(String text) throws NoSuchAlgorithmException {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                .digest(text.getBytes(StandardCharsets.UTF_8)));
    }
}
