package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.cupel.charts.ChartFigure;
import org.cupel.charts.FigureChecks;
import org.cupel.charts.FigureLabel;
import org.cupel.demo.DemoGenerator;
import org.cupel.demo.DemoSettings;
import org.cupel.ingest.ProjectFiles;
import org.cupel.ingest.ProjectLoader;
import org.cupel.ingest.ValueConventions;
import org.cupel.project.Project;
import org.cupel.recovery.RecoveryAnalysis;
import org.cupel.recovery.RecoveryResult;
import org.cupel.recovery.RecoverySettings;
import org.cupel.recovery.TestworkReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The figures of the demo appendix (default size and seed, testwork included), as a reader sees them: how many
 * each section has, the panels of the duplicates figures, and that nothing written lies over a plot and no two
 * labels collide, on every chart type.
 */
class DemoFiguresTest {
    /**
     * The duplicates section before the figures were combined: four charts (scatter, ranked HARD, relative
     * difference, Thompson–Howarth) for each of the 5 duplicate types of each of the 2 analytes.
     */
    static final int DUPLICATE_CHARTS_BEFORE = 4 * 5 * 2;

    @TempDir
    static Path dir;
    private static QcReport report;

    @BeforeAll
    static void buildTheDemoAppendix() throws IOException {
        DemoGenerator.generate(DemoSettings.defaults(), relative -> {
            Path file = dir.resolve(relative);
            Files.createDirectories(file.getParent());
            return new BufferedWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8));
        });
        Project p = ProjectLoader.load(dir);
        RecoverySettings rs = p.config().section("recovery", RecoverySettings.class, RecoverySettings.DEFAULTS);
        RecoveryResult testwork = RecoveryAnalysis.run(TestworkReader.read(ProjectFiles.of(dir, p.config()), rs,
                ValueConventions.from(p.config())), rs);
        report = QcAppendix.build(p, Optional.of(testwork), "all batches", Instant.parse("2026-01-01T00:00:00Z"));
    }

    private static List<ReportBlock.Figure> figures(String section) {
        return report.sections().stream().filter(s -> s.id().equals(section)).flatMap(s -> s.blocks().stream())
                .filter(b -> b instanceof ReportBlock.Figure).map(b -> (ReportBlock.Figure) b).toList();
    }

    private static List<ReportBlock.Figure> allFigures() {
        return report.sections().stream().flatMap(s -> s.blocks().stream())
                .filter(b -> b instanceof ReportBlock.Figure).map(b -> (ReportBlock.Figure) b).toList();
    }

    @Test
    void theDuplicatesShowInAThirdOfTheFiguresOrFewer() {
        List<ReportBlock.Figure> dup = figures("duplicates");
        // Before: 40 figures (one chart each) over about 20 PDF pages; now three figures of panels per analyte.
        assertTrue(dup.size() <= DUPLICATE_CHARTS_BEFORE / 3, dup.size() + " figures");
        assertEquals(List.of("duplicates-Au-pairs", "duplicates-Au-bias", "duplicates-Au-precision",
                "duplicates-Ag-pairs", "duplicates-Ag-bias", "duplicates-Ag-precision"),
                dup.stream().map(ReportBlock.Figure::name).toList());
    }

    @Test
    void eachDuplicatesFigureHasAPanelPerTypeAndOneComparingThemAllNamedInItsCaption() {
        List<String> types = List.of("Field duplicates", "Coarse-reject duplicates", "Pulp duplicates",
                "Lab repeats", "Umpire checks");
        for (ReportBlock.Figure f : figures("duplicates")) {
            ChartFigure figure = (ChartFigure) f.chart().get();
            List<ChartFigure.Panel> panels = figure.panels();
            assertEquals(6, panels.size(), f.name());
            for (int i = 0; i < panels.size(); i++) {
                String letter = "(" + (char) ('a' + i) + ")";
                assertTrue(panels.get(i).heading().startsWith(letter + " "), f.name() + ": " + panels.get(i).heading());
                assertTrue(f.caption().contains(letter), f.name() + " caption names panel " + letter);
                if (i < types.size()) {
                    assertTrue(panels.get(i).heading().startsWith(letter + " " + types.get(i)), panels.get(i).heading());
                    assertTrue(f.caption().contains(letter + " " + types.get(i).toLowerCase(java.util.Locale.ROOT)),
                            f.caption());
                } else {
                    assertTrue(panels.get(i).heading().contains("every type"), panels.get(i).heading());
                }
            }
        }
    }

    @Test
    void nothingWrittenCoversAPlotOnAnyChart() {
        List<String> kinds = new ArrayList<>();
        for (ReportBlock.Figure f : allFigures()) {
            ChartFigure figure = (ChartFigure) f.chart().get();
            FigureChecks.writingStaysOutOfThePlots(f.name(), figure);
            FigureChecks.labelsApart(f.name(), figure);
            if (!f.name().startsWith("deportment")) {
                // Names beside an axis; only the deportment chart writes values on its bars.
                FigureChecks.labelsStayOutOfThePlots(f.name(), figure);
            }
            kinds.add(f.name().replaceAll("-(Au|Ag).*$", ""));
        }
        // Every chart type of the appendix was looked at.
        assertTrue(kinds.containsAll(List.of("crm-VHC-23", "crm-z", "crm-bias", "blanks", "blank-carry-over",
                "censored-probability", "duplicates", "recovery", "recovery-differences", "deportment")),
                kinds.toString());
    }

    @Test
    void theDeportmentValuesOfTheThinPartsDoNotOverlap() {
        ChartFigure dep = (ChartFigure) figures("testwork").stream().filter(f -> f.name().equals("deportment-Au"))
                .findFirst().orElseThrow().chart().get();
        List<FigureLabel> labels = dep.layout().labels();
        // LIT90-1050: 1.21 % in the slag and 0.48 % in the matte, parts a few tenths of a millimetre high.
        FigureLabel slag = labels.stream().filter(l -> l.text().equals("1.21")).findFirst().orElseThrow();
        FigureLabel matte = labels.stream().filter(l -> l.text().equals("0.48")).findFirst().orElseThrow();
        assertTrue(!slag.box().intersects(matte.box()), slag.box() + " " + matte.box());
        assertTrue(slag.box().getMaxY() <= matte.box().getY(), "slag above matte, as in the bar");
        FigureChecks.labelsApart("deportment-Au", dep);
    }
}
