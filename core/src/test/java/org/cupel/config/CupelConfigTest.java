package org.cupel.config;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.api.Test;

class CupelConfigTest {

    /** A settings record as a feature package would declare it. */
    public record Limits(double pulp, double coarse, Map<String, Double> extra) {
        static final Limits DEFAULTS = new Limits(0.10, 0.20, Map.of());
    }

    public record Section(Limits limits, int multiple) {
        static final Section DEFAULTS = new Section(Limits.DEFAULTS, 10);
    }

    @Test
    void userKeysOverrideAndTheRestKeepDefaults() {
        CupelConfig c = CupelConfig.fromYaml("project: Test\ndup:\n  limits:\n    pulp: 0.15\n", "cupel.yaml");
        Section s = c.section("dup", Section.class, Section.DEFAULTS);
        assertEquals(0.15, s.limits().pulp());
        assertEquals(0.20, s.limits().coarse());
        assertEquals(10, s.multiple());
        assertTrue(c.isUserSet("dup.limits.pulp"));
        assertFalse(c.isUserSet("dup.limits.coarse"));
        assertEquals("Test", c.projectName("folder"));
    }

    @Test
    void missingSectionGivesDefaults() {
        assertEquals(Section.DEFAULTS, CupelConfig.defaults().section("dup", Section.class, Section.DEFAULTS));
        assertEquals("folder", CupelConfig.defaults().projectName("folder"));
    }

    @Test
    void unknownKeyIsAClearError() {
        CupelConfig c = CupelConfig.fromYaml("dup:\n  multipel: 5\n", "cupel.yaml");
        ConfigException e = assertThrows(ConfigException.class, () -> c.section("dup", Section.class, Section.DEFAULTS));
        assertEquals("cupel.yaml:2:3: 'multipel' is not a setting of dup; did you mean 'multiple'? The settings there "
                + "are limits, multiple (docs/config.md); correct or remove the key.", e.getMessage());
    }

    @Test
    void syntaxErrorNamesLine() {
        ConfigException e = assertThrows(ConfigException.class,
                () -> CupelConfig.fromYaml("a: 1\nb: [unclosed\n", "cupel.yaml"));
        assertTrue(e.getMessage().startsWith("cupel.yaml:"), e.getMessage());
    }
}
