package org.cupel.settings;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Method;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.cupel.config.CupelConfig;
import org.cupel.config.SettingException;
import org.cupel.control.BlankSettings;
import org.cupel.control.crm.CrmSettings;
import org.cupel.control.crm.RuleAction;
import org.cupel.duplicates.DuplicateSettings;
import org.junit.jupiter.api.Test;

/**
 * The builders of the settings records: each sets exactly its own component, copies the rest through, and
 * checks the values together when built, as binding {@code cupel.yaml} does; and settings given in code reach
 * the config ({@link ProjectSettings#applyTo}) as settings the user set.
 */
class SettingsBuilderTest {

    /**
     * Every setting of every section at a valid value other than its default; each value is also valid on
     * its own beside the other defaults (warnMultiple 4 ≤ the default failMultiple 5, thGroupSize 12 needs
     * 24 ≤ the default thMinimumPairs 50, ...), so that one setter can be tried at a time.
     */
    private static final String EVERY_SETTING = """
            ingest:
              decimalComma: true
              negativeMeansBelowDetection: false
              thousandsSeparator: false
              belowDetectionCodes: [BDL]
              missingCodes: {"N/R": NOT_RECEIVED}
              detectionLimits: {Au: 0.005}
              repeatSuffixes: ["-R"]
              columns: {Au1: "Au g/t FA-AAS"}
              units: {Au: g/t}
              methodPriority: {Au: [FA-GRAV, FA-AAS]}
              sheet: Results
              dateFormat: DMY
              followLinksOutsideProject: true
            censored:
              kmLowestMass: AT_LOWEST_DETECT
              kmSdDivisor: SAMPLE
              bootstrapReplicates: 500
              bootstrapSeed: 7
              bootstrapMaxN: 2000
            duplicates:
              limitMultipleOfDetection: 5
              censoredAtHalfLimit: true
              acceptancePercent: 80
              fieldHardLimitPercent: 25
              coarseHardLimitPercent: 15
              pulpHardLimitPercent: 8
              labRepeatHardLimitPercent: 9
              umpireHardLimitPercent: 12
              thGroupSize: 12
              thMinimumPairs: 60
              bootstrapResamples: 500
              bootstrapSeed: 11
              bootstrapMaxPairs: 2000
              precisionGrades: [0.5, 2]
              batchTestAlpha: 0.02
              batchRuleAlpha: 0.1
            crm:
              rules: {"1-2s": "off", "R-4s": warn}
              ewmaLambda: 0.3
              ewmaWidth: 2.5
              cusumK: 0.4
              cusumH: 4
              projectLimitsMinN: 30
              swapWithinSd: 1.5
              blankLevelMultiple: 4
              confidence: 0.9
              driftAlpha: 0.01
            blanks:
              failMultiple: 8
              warnMultiple: 4
              highGradeMultiple: 20
              absolute: {Cu: {fail: 50, warn: 30}}
            reassay:
              scope: WHOLE_BATCH
              crmBracket: PASSING_CONTROL
              blankFollowing: 5
            insertion:
              crm: 0.04
              blank: 0.03
              fieldDuplicate: 0.06
              coarseDuplicate: 0.02
              pulpDuplicate: 0.035
              labRepeat: 0.01
              umpire: 0.05
            recovery:
              definition: direct
              confidence: 0.9
              alpha: 0.1
              equivalenceMargin: 1
              powerDifference: 2
              power: 0.9
              balanceTolerance: 0.1
              nearComplete: 97
              balanceResolutionGrams: 0.001
              assayRelativeSd: {slag: 0.08}
              precisionSigma0: 0.1
              precisionK: 0.02
              productRoles: {speiss: collected}
            """;

    private static final ProjectSettings CHANGED = ProjectSettings.of(CupelConfig.fromYaml(EVERY_SETTING,
            "cupel.yaml"));

    @Test
    void theFixtureChangesEverySettingOfEverySection() {
        for (ProjectSettings.Section<?> s : ProjectSettings.SECTIONS) {
            Object changed = s.of().apply(CHANGED);
            for (RecordComponent c : s.type().getRecordComponents()) {
                assertNotEquals(value(c, s.defaults()), value(c, changed), s.name() + "." + c.getName());
            }
        }
    }

    /**
     * Each builder has a setter for each component, and the setter changes that component only: a setter
     * that wrote another field, or a build that dropped one, would show here.
     */
    @Test
    void eachSetterSetsItsOwnComponentAndNoOther() throws ReflectiveOperationException {
        List<String> checked = new ArrayList<>();
        for (ProjectSettings.Section<?> s : ProjectSettings.SECTIONS) {
            Object changed = s.of().apply(CHANGED);
            for (RecordComponent c : s.type().getRecordComponents()) {
                Object builder = s.type().getMethod("toBuilder").invoke(s.defaults());
                Method setter = builder.getClass().getMethod(c.getName(), c.getType());
                setter.invoke(builder, value(c, changed));
                Object built = builder.getClass().getMethod("build").invoke(builder);
                for (RecordComponent other : s.type().getRecordComponents()) {
                    Object expected = other.getName().equals(c.getName()) ? value(other, changed) : value(other, s.defaults());
                    assertEquals(expected, value(other, built), s.name() + ": set " + c.getName() + ", read "
                            + other.getName());
                }
                checked.add(s.name() + "." + c.getName());
            }
        }
        // 13 ingest + 5 censored + 16 duplicates + 10 crm + 4 blanks + 3 reassay + 7 insertion + 13 recovery.
        assertEquals(71, checked.size(), checked.toString());
    }

    @Test
    void aBuilderFromSettingsBuildsTheSameSettings() throws ReflectiveOperationException {
        for (ProjectSettings.Section<?> s : ProjectSettings.SECTIONS) {
            Object changed = s.of().apply(CHANGED);
            Object builder = s.type().getMethod("toBuilder").invoke(changed);
            assertEquals(changed, builder.getClass().getMethod("build").invoke(builder), s.name());
        }
        assertEquals(CHANGED, CHANGED.toBuilder().build());
        assertEquals(ProjectSettings.DEFAULTS, ProjectSettings.withDefaults().build());
    }

    /**
     * The values are checked together when built, so the order of the calls does not matter: on the way
     * from the defaults (warn 3, fail 5) to warn 8 and fail 10, warn 8 above fail 5 is never judged.
     */
    @Test
    void theOrderOfTheCallsDoesNotMatter() {
        BlankSettings warnFirst = BlankSettings.withDefaults().warnMultiple(8).failMultiple(10).build();
        BlankSettings failFirst = BlankSettings.withDefaults().failMultiple(10).warnMultiple(8).build();
        assertEquals(warnFirst, failFirst);
        assertEquals(8, warnFirst.warnMultiple());
        assertThrows(IllegalArgumentException.class, () -> BlankSettings.withDefaults().warnMultiple(8).build(),
                "warn 8 above the default fail 5 is refused when built");
    }

    /** A value out of range is refused with the key the config would point at. */
    @Test
    void buildRefusesAValueAsTheConfigDoes() {
        SettingException e = assertThrows(SettingException.class,
                () -> DuplicateSettings.withDefaults().pulpHardLimitPercent(0).build());
        assertEquals(List.of("pulpHardLimitPercent"), e.key());
        assertTrue(e.getMessage().contains("is not a HARD limit"), e.getMessage());
    }

    /**
     * Settings given in code reach the config as keys the user set (the report labels them "user setting");
     * a key the file set keeps its origin, the others stay defaults.
     */
    @Test
    void settingsInCodeCountAsSetByTheUser() {
        CupelConfig file = CupelConfig.fromYaml("duplicates:\n  limitMultipleOfDetection: 5\n", "cupel.yaml");
        ProjectSettings fromFile = ProjectSettings.of(file);
        ProjectSettings strict = fromFile.toBuilder()
                .duplicates(fromFile.duplicates().toBuilder().pulpHardLimitPercent(5).build()).build();
        CupelConfig applied = strict.applyTo(file);
        assertEquals(strict, ProjectSettings.of(applied));
        assertTrue(applied.isUserSet("duplicates.pulpHardLimitPercent"));
        assertTrue(applied.isUserSet("duplicates.limitMultipleOfDetection"));
        assertFalse(applied.isUserSet("duplicates.fieldHardLimitPercent"));
        assertFalse(applied.isUserSet("crm"));
        assertEquals(5, applied.section("duplicates", DuplicateSettings.class, DuplicateSettings.DEFAULTS)
                .limitMultipleOfDetection());
        assertSame(file, fromFile.applyTo(file), "settings as the file gives them change nothing");
    }

    /**
     * A map of settings keeps the default of every key it leaves out (as in the file, where keys given
     * override the defaults one by one), so a rules map without 1-2s cannot be given in code: it would come
     * back as warn.
     */
    @Test
    void aMapThatLeavesAKeyOutIsRefused() {
        CrmSettings onlyOneRule = CrmSettings.withDefaults().rules(Map.of("1-3s", RuleAction.FAIL)).build();
        ProjectSettings settings = ProjectSettings.withDefaults().crm(onlyOneRule).build();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> settings.applyTo(CupelConfig.defaults()));
        assertTrue(e.getMessage().contains("crm settings cannot be set as given"), e.getMessage());
        Map<String, RuleAction> rules = new java.util.LinkedHashMap<>(CrmSettings.DEFAULTS.rules());
        rules.put("1-2s", RuleAction.OFF);
        CrmSettings quiet = CrmSettings.withDefaults().rules(rules).build();
        CupelConfig applied = ProjectSettings.withDefaults().crm(quiet).build().applyTo(CupelConfig.defaults());
        assertEquals(RuleAction.OFF, ProjectSettings.of(applied).crm().rules().get("1-2s"));
    }

    private static Object value(RecordComponent c, Object record) {
        try {
            return c.getAccessor().invoke(record);
        } catch (ReflectiveOperationException e) {
            throw new AssertionError(e);
        }
    }
}
