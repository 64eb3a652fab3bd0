package org.cupel.config;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.cupel.ingest.IngestSettings;
import org.cupel.settings.ProjectSettings;
import org.junit.jupiter.api.Test;

/**
 * The mistakes a user makes in {@code cupel.yaml} end in one sentence that names the file, line and column,
 * says what was expected in the user's words and how to fix it (issue 15, item 6). Every expected message is
 * written out in full, so that a change of wording is a deliberate one.
 */
class ConfigMistakesTest {

    /** A settings record with a nested record and a map, as the feature sections have. */
    public record Limits(double fail, Double warn) {
    }

    public record Section(Map<String, Double> limits, Map<String, Limits> absolute, int replicates,
                          List<String> codes) {
        static final Section DEFAULTS = new Section(Map.of(), Map.of(), 1000, List.of("BDL"));
    }

    private static ConfigException refused(String yaml) {
        return assertThrows(ConfigException.class,
                () -> CupelConfig.fromYaml(yaml, "cupel.yaml").section("sec", Section.class, Section.DEFAULTS));
    }

    private static ConfigException refusedByProject(String yaml) {
        return assertThrows(ConfigException.class,
                () -> ProjectSettings.check(CupelConfig.fromYaml(yaml, "cupel.yaml")));
    }

    @Test
    void aMisspeltSectionIsAnErrorWithDidYouMean() {
        assertEquals("cupel.yaml:2:1: 'Ingest' is not a section of the config; did you mean 'ingest'? The top-level "
                + "keys are project, ingest, censored, duplicates, crm, blanks, reassay, insertion, recovery "
                + "(docs/config.md); correct or remove it.",
                refusedByProject("project: P\nIngest:\n  decimalComma: true\n").getMessage());
        assertEquals("cupel.yaml:1:1: 'reprot' is not a section of the config. The top-level keys are project, "
                + "ingest, censored, duplicates, crm, blanks, reassay, insertion, recovery (docs/config.md); "
                + "correct or remove it.", refusedByProject("reprot:\n  out: x\n").getMessage());
    }

    @Test
    void anUnknownKeyAtAnyDepthIsAnErrorWithDidYouMean() {
        assertEquals("cupel.yaml:4:10: 'fial' is not a setting of sec.absolute.Cu; did you mean 'fail'? The settings "
                + "there are fail, warn (docs/config.md); correct or remove the key.",
                refused("sec:\n  absolute:\n    Cu:\n         fial: 5\n").getMessage());
        assertEquals("cupel.yaml:2:3: 'replicate' is not a setting of sec; did you mean 'replicates'? The settings "
                + "there are limits, absolute, replicates, codes (docs/config.md); correct or remove the key.",
                refused("sec:\n  replicate: 5\n").getMessage());
        ConfigException nested = refusedByProject("duplicates:\n  limitMultipleOfDetecton: 5\n");
        assertTrue(nested.getMessage().startsWith("cupel.yaml:2:3: 'limitMultipleOfDetecton' is not a setting of "
                + "duplicates; did you mean 'limitMultipleOfDetection'?"), nested.getMessage());
    }

    @Test
    void typeErrorsSpeakTheUsersWords() {
        assertEquals("cupel.yaml:2:11: sec.limits should be a mapping of names to numbers (name: value, one per "
                + "line), but the config has a list; correct the value (docs/config.md describes each setting).",
                refused("sec:\n  limits: [1, 2]\n").getMessage());
        assertEquals("cupel.yaml:2:15: sec.replicates should be a whole number, but the config has a list; correct "
                + "the value (docs/config.md describes each setting).",
                refused("sec:\n  replicates: [1]\n").getMessage());
        assertEquals("cupel.yaml:2:15: sec.replicates should be a whole number, but the config has the number 2.5; "
                + "correct the value (docs/config.md describes each setting).",
                refused("sec:\n  replicates: 2.5\n").getMessage());
        assertEquals("cupel.yaml:2:15: sec.replicates should be a whole number from -2147483648 to 2147483647, but "
                + "the config has the number 1000000000000; correct the value (docs/config.md describes each "
                + "setting).", refused("sec:\n  replicates: 1000000000000\n").getMessage());
        assertEquals("cupel.yaml:2:10: sec.codes should be a list of texts ([a, b] or one '- item' per line), but "
                + "the config has a mapping (key: value); correct the value (docs/config.md describes each "
                + "setting).", refused("sec:\n  codes: {a: 1}\n").getMessage());
        for (String yaml : List.of("sec:\n  limits: [1, 2]\n", "sec:\n  replicates: abc\n", "sec:\n  codes: {a: 1}\n",
                "sec:\n  absolute: 5\n", "sec: [1]\n", "sec:\n  replicates:\n")) {
            String m = refused(yaml).getMessage();
            assertFalse(m.matches("(?s).*(java\\.|Map<|LinkedHashMap|`|Cannot deserialize|Integer|Double).*"), m);
        }
    }

    @Test
    void anEmptyValueIsNamedAsSuch() {
        assertEquals("cupel.yaml:2:14: sec.replicates should be a whole number, but the config has nothing (the key "
                + "has no value); correct the value (docs/config.md describes each setting).",
                refused("sec:\n  replicates:\n").getMessage());
    }

    @Test
    void anAliasIsRefusedRatherThanReadAsItsAnchorsName() {
        ConfigException e = assertThrows(ConfigException.class, () -> CupelConfig.fromYaml(
                "blanks: &strict\n  failMultiple: 7\ncrm:\n  ewmaLambda: *strict\n", "cupel.yaml"));
        assertEquals("cupel.yaml:4:15: '*strict' is a YAML alias, which Cupel does not expand (it would be read as "
                + "the text 'strict'); write the value out in full here.", e.getMessage());
    }

    @Test
    void aKeyGivenTwiceIsRefused() {
        ConfigException e = assertThrows(ConfigException.class, () -> CupelConfig.fromYaml(
                "ingest:\n  decimalComma: true\n  decimalComma: false\n", "cupel.yaml"));
        assertEquals("cupel.yaml:3:3: the key 'decimalComma' is given twice in one section (first on line 2), and "
                + "only one of the two would be read; keep one of them.", e.getMessage());
    }

    @Test
    void zeroAndNegativeDetectionLimitsAreRefusedWithKeyAndFix() {
        for (String limit : List.of("-0.005", "0")) {
            ConfigException e = assertThrows(ConfigException.class, () -> IngestSettings.from(CupelConfig.fromYaml(
                    "ingest:\n  detectionLimits:\n    Ag: 0.5\n    Au: " + limit + "\n", "cupel.yaml")));
            assertEquals("cupel.yaml:4:9: ingest.detectionLimits.Au: " + (limit.equals("0") ? "0" : "-0.005")
                    + " is not a detection limit: it must be a positive number in the unit of the lab file's column; "
                    + "write it as, for example, Au: 0.005, or remove the key", e.getMessage());
        }
        assertEquals(0.005, IngestSettings.from(CupelConfig.fromYaml("ingest:\n  detectionLimits: {Au: 0.005}\n",
                "cupel.yaml")).detectionLimits().get("Au"));
    }

    @Test
    void absurdBootstrapCountsAreInputErrorsNamingTheKey() {
        assertEquals("cupel.yaml:2:24: censored.bootstrapReplicates: 2000000000 is outside 0 to 100000 resamples; "
                + "write a whole number in that range (the default is 1000; 0 for no bootstrap)",
                refusedByProject("censored:\n  bootstrapReplicates: 2000000000\n").getMessage());
        assertEquals("cupel.yaml:2:23: duplicates.bootstrapResamples: -5 is outside 100 to 100000 resamples; write a "
                + "whole number in that range (the default is 1000)",
                refusedByProject("duplicates:\n  bootstrapResamples: -5\n").getMessage());
    }

    @Test
    void theProjectCheckAcceptsTheDocumentedExample() {
        CupelConfig c = CupelConfig.fromYaml("project: Tallow Creek 2025 drilling\ningest:\n  decimalComma: false\n"
                + "  detectionLimits: {Au: 0.005, Ag: 0.5}\n  units: {Au: g/t}\n"
                + "  methodPriority: {Au: [FA-GRAV, FA-AAS]}\ncrm:\n  rules: {\"1-2s\": \"off\", \"R-4s\": fail}\n"
                + "blanks:\n  absolute:\n    Cu: {fail: 50, warn: 30}\n", "cupel.yaml");
        assertEquals(c, ProjectSettings.check(c));
    }

    @Test
    void didYouMeanOnlyForNearKeys() {
        assertEquals("ingest", Suggestion.closest("Ingest", List.of("project", "ingest")).orElseThrow());
        assertEquals("report", Suggestion.closest("reprot", List.of("report", "recovery")).orElseThrow());
        assertTrue(Suggestion.closest("xyz", List.of("crm", "ingest")).isEmpty());
        // Optimal string alignment distance, hand-worked: "ab" → "ba" is one transposition; "kitten" → "sitting"
        // is 3 (k→s, e→i, insert g), the textbook Levenshtein example.
        assertEquals(1, Suggestion.distance("ab", "ba"));
        assertEquals(3, Suggestion.distance("kitten", "sitting"));
    }
}
