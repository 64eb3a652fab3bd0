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

    /** A builder holding {@link #DEFAULTS}: {@code IngestSettings.withDefaults().someSetting(value).build()}. */
    public static Builder withDefaults() {
        return DEFAULTS.toBuilder();
    }

    /** A builder holding these settings, to change some of them. */
    public Builder toBuilder() {
        return new Builder(this);
    }

    /**
     * Sets any of the settings, each named as its record component; {@link #build} checks them together, as the
     * config does, so the order of the calls does not matter.
     */
    public static final class Builder {
        private boolean decimalComma;
        private boolean negativeMeansBelowDetection;
        private boolean thousandsSeparator;
        private List<String> belowDetectionCodes;
        private Map<String, MissingReason> missingCodes;
        private Map<String, Double> detectionLimits;
        private List<String> repeatSuffixes;
        private Map<String, String> columns;
        private Map<String, String> units;
        private Map<String, List<String>> methodPriority;
        private String sheet;
        private String dateFormat;
        private boolean followLinksOutsideProject;

        private Builder(IngestSettings s) {
            decimalComma = s.decimalComma();
            negativeMeansBelowDetection = s.negativeMeansBelowDetection();
            thousandsSeparator = s.thousandsSeparator();
            belowDetectionCodes = s.belowDetectionCodes();
            missingCodes = s.missingCodes();
            detectionLimits = s.detectionLimits();
            repeatSuffixes = s.repeatSuffixes();
            columns = s.columns();
            units = s.units();
            methodPriority = s.methodPriority();
            sheet = s.sheet();
            dateFormat = s.dateFormat();
            followLinksOutsideProject = s.followLinksOutsideProject();
        }

        public Builder decimalComma(boolean value) {
            decimalComma = value;
            return this;
        }

        public Builder negativeMeansBelowDetection(boolean value) {
            negativeMeansBelowDetection = value;
            return this;
        }

        public Builder thousandsSeparator(boolean value) {
            thousandsSeparator = value;
            return this;
        }

        public Builder belowDetectionCodes(List<String> value) {
            belowDetectionCodes = value;
            return this;
        }

        public Builder missingCodes(Map<String, MissingReason> value) {
            missingCodes = value;
            return this;
        }

        public Builder detectionLimits(Map<String, Double> value) {
            detectionLimits = value;
            return this;
        }

        public Builder repeatSuffixes(List<String> value) {
            repeatSuffixes = value;
            return this;
        }

        public Builder columns(Map<String, String> value) {
            columns = value;
            return this;
        }

        public Builder units(Map<String, String> value) {
            units = value;
            return this;
        }

        public Builder methodPriority(Map<String, List<String>> value) {
            methodPriority = value;
            return this;
        }

        public Builder sheet(String value) {
            sheet = value;
            return this;
        }

        public Builder dateFormat(String value) {
            dateFormat = value;
            return this;
        }

        public Builder followLinksOutsideProject(boolean value) {
            followLinksOutsideProject = value;
            return this;
        }

        /** @throws org.cupel.config.SettingException or IllegalArgumentException for a value out of range */
        public IngestSettings build() {
            return new IngestSettings(decimalComma, negativeMeansBelowDetection, thousandsSeparator,
                    belowDetectionCodes, missingCodes, detectionLimits, repeatSuffixes, columns, units, methodPriority,
                    sheet, dateFormat, followLinksOutsideProject);
        }
    }
}
