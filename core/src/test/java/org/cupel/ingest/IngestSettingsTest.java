package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.assay.MissingReason;
import org.cupel.config.ConfigException;
import org.cupel.config.CupelConfig;
import org.junit.jupiter.api.Test;

class IngestSettingsTest {

    @Test
    void noConfigMeansDefaults() {
        assertEquals(IngestSettings.DEFAULTS, IngestSettings.from(CupelConfig.defaults()));
        assertEquals(ValueConventions.DEFAULTS, ValueConventions.from(CupelConfig.defaults()));
    }

    @Test
    void userSettingsOverrideAndCodeMapsExtendTheDefaults() {
        CupelConfig c = CupelConfig.fromYaml("""
                ingest:
                  decimalComma: true
                  detectionLimits: {Au: 0.005}
                  missingCodes: {LOST: NOT_RECEIVED}
                  columns: {Au1: "Au g/t FA-AAS"}
                  units: {Au: g/t}
                  methodPriority: {Au: [FA-GRAV, FA-AAS]}
                """, "cupel.yaml");
        IngestSettings s = IngestSettings.from(c);
        assertTrue(s.decimalComma());
        assertEquals(0.005, s.valueConventions().detectionLimit("Au"), 0.0);
        assertEquals(MissingReason.NOT_RECEIVED, s.missingCodes().get("LOST"));
        assertEquals(MissingReason.INSUFFICIENT_SAMPLE, s.missingCodes().get("IS"), "defaults kept");
        assertEquals(List.of("FA-GRAV", "FA-AAS"), s.methodPriority().get("Au"));
        assertEquals("Au g/t FA-AAS", s.columns().get("Au1"));
        // the value conventions alone bind from the same section, ignoring the other keys
        assertTrue(c.section("ingest", ValueConventions.class, ValueConventions.DEFAULTS).decimalComma());
    }

    @Test
    void aMisspelledSettingIsReported() {
        CupelConfig c = CupelConfig.fromYaml("ingest:\n  decimalComa: true\n", "cupel.yaml");
        assertThrows(ConfigException.class, () -> IngestSettings.from(c));
    }
}
