package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.io.IOException;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.cupel.demo.DemoGenerator;
import org.cupel.demo.DemoSettings;
import org.cupel.settings.ProjectSettings;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every number of every section of {@code cupel.yaml}, set on its own to an absurd value (negative, zero,
 * 10^12), ends in the analyses' results or in one clear input error (exit 2 naming
 * {@code cupel.yaml}), never in an internal error: exit 3 is for bugs, and a bad setting is the user's to
 * fix. The numeric settings are found from the defaults of {@link ProjectSettings#SECTIONS}, so a setting
 * added later is covered. Runs {@code cupel analyse} (every analysis of the report, without writing) on a
 * 500-sample demo project with testwork.
 */
class SettingExtremesTest {
    private static final List<String> VALUES = List.of("-1", "0", "1000000000000");
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final ObjectMapper YAML = new YAMLMapper();
    private static final Map<String, Map<String, Integer>> QUICK = Map.of(
            "censored", Map.of("bootstrapReplicates", 0),
            "duplicates", Map.of("bootstrapResamples", 100));

    @TempDir
    static Path project;

    @BeforeAll
    static void smallDemoProject() throws IOException {
        DemoGenerator.generate(new DemoSettings(DemoSettings.MIN_SAMPLES, DemoSettings.DEFAULT_SEED),
                DemoCommand.folderSink(project));
    }

    /**
     * A numeric setting: its path of keys from the top of the config, and whether it is a list of numbers
     * (then the value is written as a one-item list).
     */
    record Leaf(List<String> path, boolean list) {
        /**
         * The config: this setting at {@code value}, over {@link #QUICK} (the bootstraps cost most of a run and
         * are not what the other settings are about; a bootstrap setting under test replaces its quick value).
         */
        String yaml(String value) throws IOException {
            ObjectNode root = JSON.createObjectNode();
            QUICK.forEach((section, settings) -> root.set(section, JSON.valueToTree(settings)));
            ObjectNode at = root;
            for (String key : path.subList(0, path.size() - 1)) {
                at = at.has(key) ? (ObjectNode) at.get(key) : at.putObject(key);
            }
            JsonNode number = JSON.readTree(value);
            at.set(path.get(path.size() - 1), list ? JSON.createArrayNode().add(number) : number);
            return YAML.writeValueAsString(root);
        }

        String name() {
            return String.join(".", path);
        }
    }

    /**
     * Every numeric setting, found by walking the settings records' components: numbers, optional numbers
     * (null by default), lists of numbers, and the numbers inside maps (under the keys of the defaults, or
     * an analyte {@code Au} when the default map is empty).
     */
    static List<Leaf> numericSettings() {
        List<Leaf> out = new ArrayList<>();
        for (ProjectSettings.Section<?> s : ProjectSettings.SECTIONS) {
            collect(s.type(), JSON.valueToTree(s.defaults()), List.of(s.name()), out);
        }
        return out;
    }

    private static void collect(Type type, JsonNode defaults, List<String> path, List<Leaf> into) {
        Class<?> raw = raw(type);
        if (raw == null) {
            return;
        }
        if (isNumber(raw)) {
            into.add(new Leaf(path, false));
        } else if (raw.isRecord()) {
            for (RecordComponent c : raw.getRecordComponents()) {
                collect(c.getGenericType(), defaults == null ? null : defaults.get(c.getName()),
                        with(path, c.getName()), into);
            }
        } else if (Map.class.isAssignableFrom(raw)) {
            Type value = ((ParameterizedType) type).getActualTypeArguments()[1];
            List<String> keys = new ArrayList<>();
            if (defaults != null) {
                defaults.fieldNames().forEachRemaining(keys::add);
            }
            for (String key : keys.isEmpty() ? List.of("Au") : keys) {
                collect(value, defaults == null ? null : defaults.get(key), with(path, key), into);
            }
        } else if (List.class.isAssignableFrom(raw)
                && isNumber(raw(((ParameterizedType) type).getActualTypeArguments()[0]))) {
            into.add(new Leaf(path, true));
        }
    }

    private static boolean isNumber(Class<?> c) {
        return c != null && (Number.class.isAssignableFrom(c) || c == int.class || c == long.class
                || c == double.class);
    }

    private static Class<?> raw(Type t) {
        return t instanceof Class<?> c ? c : t instanceof ParameterizedType p ? (Class<?>) p.getRawType() : null;
    }

    private static List<String> with(List<String> path, String key) {
        List<String> out = new ArrayList<>(path);
        out.add(key);
        return List.copyOf(out);
    }

    @Test
    void everyNumericSettingCoversTheSectionsOfTheDocs() {
        List<Leaf> leaves = numericSettings();
        for (String setting : List.of("ingest.detectionLimits.Au", "censored.bootstrapReplicates",
                "duplicates.bootstrapResamples", "duplicates.precisionGrades", "crm.ewmaLambda",
                "blanks.absolute.Au.fail", "insertion.crm", "recovery.precisionSigma0",
                "recovery.assayRelativeSd.head")) {
            assertTrue(leaves.stream().anyMatch(l -> l.name().equals(setting)), setting + " in " + leaves);
        }
    }

    @Test
    void absurdValuesEndInResultsOrOneClearInputError() throws IOException {
        List<String> failures = new ArrayList<>();
        for (Leaf leaf : numericSettings()) {
            for (String value : VALUES) {
                String yaml = leaf.yaml(value);
                Files.writeString(project.resolve("cupel.yaml"), yaml);
                CliRun run = CliRun.run("analyse", project.toString());
                int code = run.code();
                String err = run.err();
                boolean clearInputError = code == CupelCommand.INPUT_ERROR
                        && err.startsWith("cupel: cupel.yaml:") && err.strip().lines().count() == 1;
                if (!(code == CupelCommand.OK || clearInputError)) {
                    failures.add(leaf.name() + " = " + value + " -> exit " + code + ": "
                            + err.strip());
                }
            }
        }
        assertEquals(List.of(), failures, String.join("\n", failures));
    }
}
