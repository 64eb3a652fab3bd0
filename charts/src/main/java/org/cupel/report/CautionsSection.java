package org.cupel.report;

import java.util.List;
import java.util.Map;

/**
 * Section "Cautions": the limits of what QC statistics can say, and the hazards of the fire assay and
 * smelting behind the numbers, with deference to local rules and licensed practice.
 */
public final class CautionsSection {
    public static final String ID = "cautions";

    /** The two OSHA standards the section names: the lead standard of 1978 and the silica rule of 2016. */
    static final List<Reference> SOURCES = List.of(Bibliography.get("osha1978"), Bibliography.get("osha2016"));

    private CautionsSection() {
    }

    public static ReportSection build() {
        List<ReportBlock> blocks = List.of(
                new ReportBlock.Callout(ReportBlock.Level.CAUTION, "These QC results support, and do not replace, the "
                        + "judgement of the Qualified Person or Competent Person responsible for the public report. "
                        + "A pass does not prove the data fit for purpose, and a failure does not by itself condemn "
                        + "a batch: the responsible person weighs both with the geology, the sampling and the lab's "
                        + "own QC."),
                new ReportBlock.Paragraph("Statistics here rest on the inputs as given: roles from the sample register, "
                        + "certified values and standard deviations from the CRM certificates, and the settings "
                        + "listed under Methods and references. An error in those inputs carries into every result."),
                new ReportBlock.Callout(ReportBlock.Level.CAUTION, "Fire assay and smelting are hazardous. Fluxes "
                        + "contain litharge (lead oxide), and lead fume is released, above all at cupellation; molten "
                        + "metal and slag burn, and explode into steam on damp moulds; furnaces radiate intense heat; "
                        + "flux handling raises silica dust; parting uses nitric acid; some ores release arsenic, "
                        + "antimony, selenium or mercury."),
                new ReportBlock.Paragraph("Nothing in this report is safety guidance. Follow the local codes and "
                        + "regulations that apply to the laboratory (in the United States, for example, the OSHA "
                        + "standards for lead, 29 CFR 1910.1025, and respirable crystalline silica, 29 CFR 1910.1053) "
                        + "and licensed, supervised practice."));
        return new ReportSection(ID, "Cautions", blocks, Map.of("cautions", 2), SOURCES);
    }
}
