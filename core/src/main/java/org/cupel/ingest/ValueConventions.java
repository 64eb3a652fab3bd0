package org.cupel.ingest;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.cupel.assay.MissingReason;
import org.cupel.config.CupelConfig;

/**
 * How a lab writes values in analyte cells. Read from the {@code ingest} section of {@code cupel.yaml}
 * ({@link #from(CupelConfig)}); every setting has the default documented in docs/config.md.
 *
 * @param decimalComma whether {@code 1,23} means 1.23 (then {@code .} and space group thousands)
 * @param negativeMeansBelowDetection whether {@code -0.005} means below detection at 0.005; some labs
 *     write it so, others never report negatives and a negative is then an error
 * @param thousandsSeparator whether grouped numbers ({@code 1,234.5}) are accepted
 * @param belowDetectionCodes text codes meaning "below detection" at the stated limit of the method
 * @param missingCodes text codes meaning "no value", with the reason; matched ignoring case and runs of space
 * @param detectionLimits analyte → the detection limit that a below-detection code stands for, in the unit
 *     of the file's column
 * @param repeatSuffixes endings of a sample ID that mark a lab repeat of the ID without the ending
 */
@JsonIgnoreProperties(ignoreUnknown = true)
public record ValueConventions(boolean decimalComma, boolean negativeMeansBelowDetection, boolean thousandsSeparator,
                               List<String> belowDetectionCodes, Map<String, MissingReason> missingCodes,
                               Map<String, Double> detectionLimits, List<String> repeatSuffixes) {

    public static final ValueConventions DEFAULTS = new ValueConventions(false, true, true,
            List.of("BDL", "ND", "<DL", "LTD", "LOD", "<LOD", "BLD"),
            defaultMissingCodes(), Map.of(),
            List.of(" R", "-R", "_R", " RPT", "-RPT", "_RPT", " Rpt", "_DUP", " DUP"));

    public ValueConventions {
        belowDetectionCodes = belowDetectionCodes == null ? List.of() : List.copyOf(belowDetectionCodes);
        missingCodes = missingCodes == null ? Map.of() : Map.copyOf(missingCodes);
        detectionLimits = detectionLimits == null ? Map.of() : Map.copyOf(detectionLimits);
        repeatSuffixes = repeatSuffixes == null ? List.of() : List.copyOf(repeatSuffixes);
    }

    /** The conventions set in the config's {@code ingest} section over {@link #DEFAULTS}. */
    public static ValueConventions from(CupelConfig config) {
        return IngestSettings.from(config).valueConventions();
    }

    /** The configured detection limit for {@code analyte}'s below-detection codes, or NaN. */
    public double detectionLimit(String analyte) {
        Double d = detectionLimits.get(analyte);
        return d == null ? Double.NaN : d;
    }

    /**
     * The original sample ID when {@code id} ends with a repeat marker ({@code S1001 R} → {@code S1001});
     * matched ignoring case; the longest marker wins.
     */
    public Optional<String> repeatOf(String id) {
        String best = null;
        for (String suffix : repeatSuffixes) {
            int from = id.length() - suffix.length();
            if (from > 0 && id.regionMatches(true, from, suffix, 0, suffix.length())
                    && (best == null || suffix.length() > best.length())) {
                best = suffix;
            }
        }
        return best == null ? Optional.empty() : Optional.of(id.substring(0, id.length() - best.length()).strip());
    }

    private static Map<String, MissingReason> defaultMissingCodes() {
        Map<String, MissingReason> m = new LinkedHashMap<>();
        for (String c : List.of("NR", "NRS", "LNR", "not received", "sample not received")) {
            m.put(c, MissingReason.NOT_RECEIVED);
        }
        for (String c : List.of("IS", "I.S.", "INS", "NSS", "insufficient", "insufficient sample")) {
            m.put(c, MissingReason.INSUFFICIENT_SAMPLE);
        }
        for (String c : List.of("NA", "N/A", "N.A.", "not analysed", "not analyzed", "-", "--")) {
            m.put(c, MissingReason.NOT_ANALYSED);
        }
        return m;
    }
}
