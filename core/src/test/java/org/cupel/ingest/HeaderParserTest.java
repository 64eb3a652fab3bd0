package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.cupel.units.GradeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The analyte header grammar of docs/input-formats.md (Cupel's own grammar, from headers labs commonly write). */
class HeaderParserTest {
    private final HeaderParser parser = new HeaderParser();

    @ParameterizedTest(name = "''{0}''")
    @CsvSource(delimiter = '|', value = {
        "Au_ppm|Au|PPM|", "Au (g/t)|Au|G_PER_T|", "Au ppb FA-AAS|Au|PPB|FA-AAS", "Cu %|Cu|PERCENT|",
        "Au_g/t_FA-GRAV|Au|G_PER_T|FA-GRAV", "Ag ppm ICP-AES|Ag|PPM|ICP-AES", "AU_PPM|Au|PPM|",
        "au(ppb)|Au|PPB|", "Au_ppm_FA_GRAV|Au|PPM|FA-GRAV", "Fe2O3 pct|Fe2O3|PERCENT|", "Au opt|Au|OZ_PER_SHORT_TON|",
        "Au_g_t|Au|G_PER_T|", "Au [ppm] FA50|Au|PPM|FA50"})
    void grammar(String header, String analyte, GradeUnit unit, String method) {
        AnalyteHeader h = parser.parse(header).orElseThrow();
        assertEquals(analyte, h.analyte());
        assertEquals(unit, h.unit());
        assertEquals(method == null ? "" : method, h.method());
    }

    @ParameterizedTest(name = "''{0}'' is not an analyte column")
    @CsvSource(delimiter = '|', value = {"Sample ID", "sample_id", "Batch", "Date", "from_m", "Au", "Au1",
        "QC role", "Au_xyz", "12 ppm", "Wt kg"})
    void otherColumns(String header) {
        assertTrue(parser.parse(header).isEmpty());
    }

    @Test
    void configOverridesMapAnyHeader() {
        HeaderParser p = new HeaderParser(Map.of("Au1", "Au g/t FA-AAS", "Gold repeat", "Au_g/t_FA-GRAV"));
        assertEquals(new AnalyteHeader("Au", GradeUnit.G_PER_T, "FA-AAS"), p.parse("AU1").orElseThrow());
        assertEquals("FA-GRAV", p.parse("gold_repeat").orElseThrow().method());
        assertTrue(p.isOverridden("au1"));
    }
}
