package org.cupel.settings;

import java.util.List;
import java.util.Objects;
import java.util.function.Function;
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
 * Every section of {@code cupel.yaml} (docs/config.md), bound to its settings record, and the check of a
 * whole config against them. Each feature binds its own section when it runs; checking them all at once,
 * when a project is opened, means that a mistyped key or a bad value in any section stops {@code cupel check}
 * as it would stop the report, before any work is done, and that a misspelt section name ({@code Ingest:},
 * {@code reprot:}) is an error instead of silently leaving every setting in it at its default.
 *
 * <p>Settings given in code ({@code Cupel.open(folder, settings -> ...)}) reach the analyses through the
 * config as well ({@link #applyTo}), so there is one way in for every setting.
 *
 * @param ingest section {@code ingest}
 * @param censored section {@code censored}
 * @param duplicates section {@code duplicates}
 * @param crm section {@code crm}
 * @param blanks section {@code blanks}
 * @param reassay section {@code reassay}
 * @param insertion section {@code insertion}
 * @param recovery section {@code recovery}
 */
public record ProjectSettings(IngestSettings ingest, CensoredSettings censored, DuplicateSettings duplicates,
                              CrmSettings crm, BlankSettings blanks, ReassaySettings reassay,
                              InsertionSettings insertion, RecoverySettings recovery) {

    /**
     * One section: its key, the record it binds to, that record's defaults, and its place in the settings.
     *
     * @param of the section's settings within a {@link ProjectSettings}
     */
    public record Section<T>(String name, Class<T> type, T defaults, Function<ProjectSettings, T> of) {
        T bind(CupelConfig config) {
            return config.section(name, type, defaults);
        }

        CupelConfig apply(CupelConfig config, ProjectSettings settings) {
            return config.with(name, type, defaults, of.apply(settings));
        }
    }

    private static final Section<IngestSettings> INGEST = new Section<>("ingest", IngestSettings.class,
            IngestSettings.DEFAULTS, ProjectSettings::ingest);
    private static final Section<CensoredSettings> CENSORED = new Section<>("censored", CensoredSettings.class,
            CensoredSettings.DEFAULTS, ProjectSettings::censored);
    private static final Section<DuplicateSettings> DUPLICATES = new Section<>("duplicates",
            DuplicateSettings.class, DuplicateSettings.DEFAULTS, ProjectSettings::duplicates);
    private static final Section<CrmSettings> CRM = new Section<>("crm", CrmSettings.class, CrmSettings.DEFAULTS,
            ProjectSettings::crm);
    private static final Section<BlankSettings> BLANKS = new Section<>("blanks", BlankSettings.class,
            BlankSettings.DEFAULTS, ProjectSettings::blanks);
    private static final Section<ReassaySettings> REASSAY = new Section<>("reassay", ReassaySettings.class,
            ReassaySettings.DEFAULTS, ProjectSettings::reassay);
    private static final Section<InsertionSettings> INSERTION = new Section<>("insertion", InsertionSettings.class,
            InsertionSettings.DEFAULTS, ProjectSettings::insertion);
    private static final Section<RecoverySettings> RECOVERY = new Section<>("recovery", RecoverySettings.class,
            RecoverySettings.DEFAULTS, ProjectSettings::recovery);

    /** The sections, in the order of docs/config.md (and of the record's components). */
    public static final List<Section<?>> SECTIONS = List.of(INGEST, CENSORED, DUPLICATES, CRM, BLANKS, REASSAY,
            INSERTION, RECOVERY);

    /** Every section at its defaults: a project folder without {@code cupel.yaml}. */
    public static final ProjectSettings DEFAULTS = of(CupelConfig.defaults());

    public ProjectSettings {
        for (Object section : new Object[] {ingest, censored, duplicates, crm, blanks, reassay, insertion, recovery}) {
            Objects.requireNonNull(section, "every section of the settings is required; start from DEFAULTS");
        }
    }

    /**
     * Binds every section of {@code config}, in the order of {@link #SECTIONS}.
     *
     * @throws ConfigException for the first problem, naming file, line, column and the fix
     */
    public static ProjectSettings of(CupelConfig config) {
        config.requireKnownSections(SECTIONS.stream().map(Section::name).toList());
        return new ProjectSettings(INGEST.bind(config), CENSORED.bind(config), DUPLICATES.bind(config),
                CRM.bind(config), BLANKS.bind(config), REASSAY.bind(config), INSERTION.bind(config),
                RECOVERY.bind(config));
    }

    /**
     * Checks every key and value of {@code config}.
     *
     * @return {@code config}, for chaining
     * @throws ConfigException for the first problem, naming file, line, column and the fix
     */
    public static CupelConfig check(CupelConfig config) {
        of(config);
        return config;
    }

    /**
     * {@code config} with every section bound to these settings ({@link CupelConfig#with}): a setting that
     * differs from the config's own counts as set by the user, as if the file gave it.
     */
    public CupelConfig applyTo(CupelConfig config) {
        CupelConfig out = config;
        for (Section<?> s : SECTIONS) {
            out = s.apply(out, this);
        }
        return out;
    }

    /** A builder holding {@link #DEFAULTS}: {@code ProjectSettings.withDefaults().duplicates(...).build()}. */
    public static Builder withDefaults() {
        return DEFAULTS.toBuilder();
    }

    /** A builder holding these settings, to replace some sections. */
    public Builder toBuilder() {
        return new Builder(this);
    }

    /** Replaces any of the sections, each named as its record component. */
    public static final class Builder {
        private IngestSettings ingest;
        private CensoredSettings censored;
        private DuplicateSettings duplicates;
        private CrmSettings crm;
        private BlankSettings blanks;
        private ReassaySettings reassay;
        private InsertionSettings insertion;
        private RecoverySettings recovery;

        private Builder(ProjectSettings s) {
            ingest = s.ingest();
            censored = s.censored();
            duplicates = s.duplicates();
            crm = s.crm();
            blanks = s.blanks();
            reassay = s.reassay();
            insertion = s.insertion();
            recovery = s.recovery();
        }

        public Builder ingest(IngestSettings value) {
            ingest = value;
            return this;
        }

        public Builder censored(CensoredSettings value) {
            censored = value;
            return this;
        }

        public Builder duplicates(DuplicateSettings value) {
            duplicates = value;
            return this;
        }

        public Builder crm(CrmSettings value) {
            crm = value;
            return this;
        }

        public Builder blanks(BlankSettings value) {
            blanks = value;
            return this;
        }

        public Builder reassay(ReassaySettings value) {
            reassay = value;
            return this;
        }

        public Builder insertion(InsertionSettings value) {
            insertion = value;
            return this;
        }

        public Builder recovery(RecoverySettings value) {
            recovery = value;
            return this;
        }

        public ProjectSettings build() {
            return new ProjectSettings(ingest, censored, duplicates, crm, blanks, reassay, insertion, recovery);
        }
    }
}
