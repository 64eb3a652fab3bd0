package org.cupel.demo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.cupel.assay.QcRole;
import org.junit.jupiter.api.Test;

class DemoGeneratorTest {

    private static MemorySink generate(DemoSettings settings) throws IOException {
        MemorySink sink = new MemorySink();
        DemoGenerator.generate(settings, sink);
        return sink;
    }

    @Test
    void sameSeedGivesByteIdenticalFiles() throws IOException {
        Map<String, byte[]> first = generate(DemoSettings.defaults()).bytes();
        Map<String, byte[]> second = generate(DemoSettings.defaults()).bytes();
        assertEquals(first.keySet(), second.keySet());
        for (String path : first.keySet()) {
            assertArrayEquals(first.get(path), second.get(path), path);
        }
    }

    @Test
    void anotherSeedGivesOtherGradesButTheSameLayout() throws IOException {
        Map<String, byte[]> a = generate(DemoSettings.defaults()).bytes();
        Map<String, byte[]> b = generate(new DemoSettings(DemoSettings.DEFAULT_SAMPLES, 7)).bytes();
        assertFalse(Arrays.equals(a.get("lab/OAL-00001.csv"), b.get("lab/OAL-00001.csv")));
        assertFalse(Arrays.equals(a.get("testwork/smelts.csv"), b.get("testwork/smelts.csv")));
        // The batch files do not depend on the seed; only re-assay files come and go with the grades.
        Set<String> batchesA = new HashSet<>(a.keySet());
        batchesA.removeIf(p -> p.contains("-GRAV"));
        Set<String> batchesB = new HashSet<>(b.keySet());
        batchesB.removeIf(p -> p.contains("-GRAV"));
        assertEquals(batchesA, batchesB);
    }

    @Test
    void defaultProjectHasTwentyFiveBatchesOfAHundredRoutineSamples() throws IOException {
        MemorySink sink = new MemorySink();
        DemoSummary s = DemoGenerator.generate(DemoSettings.defaults(), sink);
        assertEquals(25, s.labBatches());
        assertEquals(5, s.umpireBatches());
        assertEquals(2500L, s.registered().get(QcRole.ROUTINE));
        assertEquals(List.of("Au", "Ag"), s.analytes().stream().map(DemoAnalyte::symbol).toList());
        assertEquals(PlantedProblem.Kind.values().length, s.planted().size());
        for (String f : s.files()) {
            assertNotNull(sink.bytes(f), f);
        }
    }

    /**
     * Every block of 20 routine samples gets exactly one sample of each QC role, so over the whole project
     * each rate is 1 in 20 (0.05); the tolerance 0.045-0.055 leaves room for the short last block of a
     * project whose size is not a multiple of 20 (common practice: one control per 20-25 samples).
     */
    @Test
    void eachQcRoleIsInsertedAboutOnceInTwentyRoutineSamples() throws IOException {
        for (int samples : new int[] {DemoSettings.DEFAULT_SAMPLES, 1_234}) {
            DemoProjectFiles files = new DemoProjectFiles(generate(new DemoSettings(samples, 3)));
            long routine = files.register.stream().filter(r -> r.role().equals("routine")).count();
            assertEquals(samples, routine);
            for (String role : List.of("CRM", "blank", "FD", "CD", "PD", "UMP")) {
                long n = files.register.stream().filter(r -> r.role().equals(role)).count();
                double rate = n / (double) routine;
                assertTrue(rate >= 0.045 && rate <= 0.055, role + " rate " + rate);
            }
            long repeats = files.allLabRows().stream().filter(r -> r.id().endsWith(DemoGenerator.REPEAT_SUFFIX)).count();
            double rate = repeats / (double) routine;
            assertTrue(rate >= 0.045 && rate <= 0.055, "lab repeat rate " + rate);
        }
    }

    @Test
    void everyReferenceResolves() throws IOException {
        DemoProjectFiles files = new DemoProjectFiles(generate(DemoSettings.defaults()));
        Set<String> crmCodes = new HashSet<>();
        files.catalog.keySet().forEach(k -> crmCodes.add(k.substring(0, k.indexOf('|'))));
        assertEquals(4, crmCodes.size());
        for (DemoProjectFiles.RegisterRow r : files.register) {
            switch (r.role()) {
                case "CRM":
                    assertTrue(crmCodes.contains(r.reference()), r.toString());
                    break;
                case "FD": case "CD": case "PD": case "UMP":
                    DemoProjectFiles.RegisterRow original = files.registerById.get(r.reference());
                    assertEquals("routine", original.role(), r.toString());
                    assertEquals(original.hole(), r.hole(), r.toString());
                    break;
                default:
                    assertEquals("", r.reference(), r.toString());
            }
        }
        Set<String> ids = new HashSet<>();
        files.register.forEach(r -> assertTrue(ids.add(r.id()), "register ID twice: " + r.id()));
    }

    @Test
    void tooFewSamplesAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> new DemoSettings(DemoSettings.MIN_SAMPLES - 1, 1));
    }

    @Test
    void typoReplacesTheFirstZeroByTheLetterO() {
        assertEquals("O.317", DemoGenerator.typo("0.317"));
        assertEquals("12.O5", DemoGenerator.typo("12.05"));
        assertEquals("O1.25", DemoGenerator.typo("1.25"));
    }
}
