package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.cupel.config.CupelConfig;
import org.junit.jupiter.api.Test;

class CensoredSettingsTest {

    @Test
    void userKeysOverrideDefaultsAndTheRestStay() {
        CupelConfig c = CupelConfig.fromYaml("censored:\n  kmLowestMass: AT_LOWEST_DETECT\n  bootstrapSeed: 42\n",
                "cupel.yaml");
        CensoredSettings s = CensoredSettings.from(c);
        assertEquals(KaplanMeier.LowestMass.AT_LOWEST_DETECT, s.kmLowestMass());
        assertEquals(42, s.bootstrapSeed());
        assertEquals(CensoredSettings.DEFAULTS.bootstrapReplicates(), s.bootstrapReplicates());
        assertEquals(CensoredSettings.DEFAULTS, CensoredSettings.from(CupelConfig.defaults()));
    }
}
