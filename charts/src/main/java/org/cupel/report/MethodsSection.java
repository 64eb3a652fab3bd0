package org.cupel.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.config.CupelConfig;

/**
 * Section "Methods and references": every source the other sections cite (found by author and year in
 * their text, see {@link Citations}, or listed in {@link ReportSection#references()}), numbered in order of first
 * citation with the sections citing it, the sources of the report format itself, the thresholds in force
 * with their origin (published source, common practice or user setting; {@link ThresholdsInForce}), and the
 * settings the user changed in the project config.
 */
public final class MethodsSection {
    public static final String ID = "methods";

    /** Sources of the report's own conventions (chart colours, CSV format and safety). */
    static final List<Reference> OWN = List.of(
            new Reference("Okabe, M. and Ito, K.", 2008, "Color Universal Design (CUD): how to make figures and "
                    + "presentations that are friendly to colorblind people", "J*Fly, jfly.uni-koeln.de/color"),
            new Reference("Shafranovich, Y.", 2005, "Common Format and MIME Type for Comma-Separated Values (CSV) "
                    + "Files", "IETF RFC 4180"),
            new Reference("OWASP Foundation", 2024, "CSV Injection", "owasp.org/www-community/attacks/CSV_Injection"));

    private MethodsSection() {
    }

    public static ReportSection build(List<ReportSection> cited, CupelConfig config) {
        Map<String, List<String>> citedIn = new LinkedHashMap<>();
        Map<String, Reference> byCitation = new LinkedHashMap<>();
        List<String> missing = new ArrayList<>();
        for (ReportSection s : cited) {
            List<Reference> refs = new ArrayList<>(s.references());
            for (Citations.Cited c : Citations.in(s)) {
                var entry = Bibliography.find(c.names(), c.year());
                if (entry.isPresent()) {
                    refs.add(entry.get().reference());
                } else if (!citedInOwnList(s, c) && !missing.contains(c.asWritten())) {
                    missing.add(c.asWritten());
                }
            }
            for (Reference r : refs) {
                byCitation.putIfAbsent(r.citation(), r);
                List<String> where = citedIn.computeIfAbsent(r.citation(), k -> new ArrayList<>());
                if (!where.contains(s.title())) {
                    where.add(s.title());
                }
            }
        }
        for (Reference r : OWN) {
            byCitation.putIfAbsent(r.citation(), r);
            citedIn.computeIfAbsent(r.citation(), k -> new ArrayList<>()).add("report format");
        }
        List<List<String>> rows = new ArrayList<>();
        int n = 1;
        for (Map.Entry<String, Reference> e : byCitation.entrySet()) {
            rows.add(List.of(String.valueOf(n++), e.getKey(), String.join("; ", citedIn.get(e.getKey()))));
        }
        List<ReportBlock> blocks = new ArrayList<>();
        blocks.add(new ReportBlock.Paragraph("Each section states the formulas it applies beside its tables and "
                + "charts, and the thresholds in force with their origin: a published source, common practice in "
                + "assay QC, or a setting made in the project config. The sources are listed here."));
        blocks.add(new ReportBlock.Table(new ReportTable("references", "References",
                List.of("No.", "Source", "Cited in"), rows, "Sources found cited by author and year in the sections' "
                        + "text, and those the sections list; journal details are to be checked against the "
                        + "publications before the appendix is published.")));
        if (!missing.isEmpty()) {
            blocks.add(new ReportBlock.Callout(ReportBlock.Level.WARN, "Cited in the text but without a full "
                    + "reference in Cupel's bibliography: " + String.join("; ", missing) + "."));
        }
        blocks.add(new ReportBlock.Paragraph("The thresholds in force, as the analyses applied them, and where "
                + "each comes from:"));
        ReportTable thresholds = ThresholdsInForce.table(config);
        blocks.add(new ReportBlock.Table(thresholds));
        List<List<String>> settings = new ArrayList<>();
        flatten("", config.tree(), settings);
        blocks.add(new ReportBlock.Paragraph(settings.isEmpty()
                ? "No setting was changed in a project config file: every threshold is at its documented default."
                : "Settings changed in the project config (" + config.source() + "); every other setting is at its "
                        + "documented default:"));
        if (!settings.isEmpty()) {
            blocks.add(new ReportBlock.Table(new ReportTable("user-settings", "Settings changed by the user",
                    List.of("Setting", "Value"), settings, "As written in " + config.source() + ".")));
        }
        Map<String, Object> h = new LinkedHashMap<>();
        h.put("references", rows.size());
        h.put("citationsWithoutReference", missing.size());
        h.put("userSettings", settings.size());
        h.put("thresholds", thresholds.rows().size());
        return new ReportSection(ID, "Methods and references", blocks, h);
    }

    /** A citation that names a source the section already lists in full ("Okabe & Ito 2008"). */
    private static boolean citedInOwnList(ReportSection s, Citations.Cited c) {
        return s.references().stream().anyMatch(r -> r.year() == c.year()
                && c.names().contains(r.authors().split("[,\\s]+")[0]));
    }

    private static void flatten(String prefix, JsonNode node, List<List<String>> out) {
        if (node.isObject()) {
            Iterator<Map.Entry<String, JsonNode>> it = node.fields();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                flatten(prefix.isEmpty() ? e.getKey() : prefix + "." + e.getKey(), e.getValue(), out);
            }
        } else {
            out.add(List.of(prefix, node.isValueNode() ? node.asText() : node.toString()));
        }
    }
}
