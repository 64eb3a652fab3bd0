package org.cupel.settings;

import java.util.List;
import org.cupel.censored.CensoredSettings;
import org.cupel.config.ConfigException;
import org.cupel.config.CupelConfig;
import org.cupel.control.BlankSettings;
import org.cupel.control.InsertionSettings;
import org.cupel.control.ReassaySettings;
import org.cupel.control.crm.CrmSettings;
import org.cupel.duplicates.DuplicateSettings;
import org.cupel.ingest.IngestSettings;
import org.cupel.recovery.RecoverySettings;

/**
 * Every section of {@code cupel.yaml} (docs/config.md), and the check of a whole config against them. Each
 * feature binds its own section when it runs; checking them all at once, when a project is opened, means
 * that a mistyped key or a bad value in any section stops {@code cupel check} as it would stop the report,
 * before any work is done, and that a misspelt section name ({@code Ingest:}, {@code reprot:}) is an error
 * instead of silently leaving every setting in it at its default.
 */
public final class ProjectSettings {

    /** One section: its key, the record it binds to and that record's defaults. */
    public record Section<T>(String name, Class<T> type, T defaults) {
        void bind(CupelConfig config) {
            config.section(name, type, defaults);
        }
    }

    /** The sections, in the order of docs/config.md. */
    public static final List<Section<?>> SECTIONS = List.of(
            new Section<>("ingest", IngestSettings.class, IngestSettings.DEFAULTS),
            new Section<>("censored", CensoredSettings.class, CensoredSettings.DEFAULTS),
            new Section<>("duplicates", DuplicateSettings.class, DuplicateSettings.DEFAULTS),
            new Section<>("crm", CrmSettings.class, CrmSettings.DEFAULTS),
            new Section<>("blanks", BlankSettings.class, BlankSettings.DEFAULTS),
            new Section<>("reassay", ReassaySettings.class, ReassaySettings.DEFAULTS),
            new Section<>("insertion", InsertionSettings.class, InsertionSettings.DEFAULTS),
            new Section<>("recovery", RecoverySettings.class, RecoverySettings.DEFAULTS));

    private ProjectSettings() {
    }

    /**
     * Checks every key and value of {@code config}.
     *
     * @return {@code config}, for chaining
     * @throws ConfigException for the first problem, naming file, line, column and the fix
     */
    public static CupelConfig check(CupelConfig config) {
        config.requireKnownSections(SECTIONS.stream().map(Section::name).toList());
        for (Section<?> s : SECTIONS) {
            s.bind(config);
        }
        return config;
    }
}
