package org.cupel.ingest;

import java.util.List;
import java.util.Map;
import org.cupel.assay.MissingReason;
import org.cupel.assay.Numbers;
import org.cupel.config.CupelConfig;
import org.cupel.config.SettingException;
import org.cupel.units.GradeUnit;

/**
 * Every setting of the {@code ingest} section of {@code cupel.yaml} (docs/config.md). The value
 * conventions are flat here, as a user writes them, and grouped by {@link #valueConventions()}.
 *
 * @param columns header → the header Cupel should read it as ({@code Au1: "Au g/t FA-AAS"})
 * @param units analyte → the unit values are reported in ({@code Au: g/t}); else the first column's unit
 * @param methodPriority analyte → methods in order of preference for the reported value
 * @param sheet the XLSX sheet to read; empty for the first
 * @param dateFormat how dates are written: {@code ISO} ({@code 2025-03-14}), {@code DMY} or {@code MDY}
 *     (with {@code /}, {@code -} or {@code .})
 * @param followLinksOutsideProject whether a symbolic link in the project may lead to a file outside the
 *     project folder (see {@link ProjectFiles}); default false
 */
public record IngestSettings(boolean decimalComma, boolean negativeMeansBelowDetection, boolean thousandsSeparator,
                             List<String> belowDetectionCodes, Map<String, MissingReason> missingCodes,
                             Map<String, Double> detectionLimits, List<String> repeatSuffixes,
                             Map<String, String> columns, Map<String, String> units,
                             Map<String, List<String>> methodPriority, String sheet, String dateFormat,
                             boolean followLinksOutsideProject) {

    public static final IngestSettings DEFAULTS = of(ValueConventions.DEFAULTS);

    public IngestSettings {
        columns = columns == null ? Map.of() : Map.copyOf(columns);
        units = units == null ? Map.of() : Map.copyOf(units);
        methodPriority = methodPriority == null ? Map.of() : Map.copyOf(methodPriority);
        sheet = sheet == null ? "" : sheet;
        dateFormat = dateFormat == null || dateFormat.isBlank() ? "ISO" : dateFormat;
        requirePositiveLimits(detectionLimits);
        units.forEach((analyte, symbol) -> {
            if (symbol == null || GradeUnit.parse(symbol).isEmpty()) {
                throw new SettingException("'" + symbol + "' is not a unit Cupel knows; write one of ppb, ppm, g/t, "
                        + "mg/kg, %, oz/st or oz/lt", "units", analyte);
            }
        });
    }

    /**
     * A configured detection limit stands for the value of a below-detection code: zero or a negative
     * number cannot be one, and was formerly accepted and then ignored (the code stayed without a limit).
     */
    private static void requirePositiveLimits(Map<String, Double> limits) {
        if (limits == null) {
            return;
        }
        limits.forEach((analyte, limit) -> {
            if (limit == null || !(limit > 0) || limit.isInfinite()) {
                throw new SettingException((limit == null ? "an empty value" : Numbers.compact(limit)) + " is not a "
                        + "detection limit: it must be a positive number in the unit of the lab file's column; "
                        + "write it as, for example, " + analyte + ": 0.005, or remove the key",
                        "detectionLimits", analyte);
            }
        });
    }

    public static IngestSettings from(CupelConfig config) {
        return config.section("ingest", IngestSettings.class, DEFAULTS);
    }

    public ValueConventions valueConventions() {
        return new ValueConventions(decimalComma, negativeMeansBelowDetection, thousandsSeparator,
                belowDetectionCodes, missingCodes, detectionLimits, repeatSuffixes);
    }

    private static IngestSettings of(ValueConventions v) {
        return new IngestSettings(v.decimalComma(), v.negativeMeansBelowDetection(), v.thousandsSeparator(),
                v.belowDetectionCodes(), v.missingCodes(), v.detectionLimits(), v.repeatSuffixes(),
                Map.of(), Map.of(), Map.of(), "", "ISO", false);
    }
}
