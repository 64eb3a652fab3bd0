package org.cupel.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.cupel.config.CupelConfig;

/**
 * Section "Methods and references": the methods the report names, each with its sources; every source the
 * sections cite by author and year ({@link Citations}), list ({@link ReportSection#references()}) or rely
 * on through a named method, numbered in order of first citation with the sections citing it, all from the
 * one {@link Bibliography}; the sources of the report format itself; the thresholds in force with their
 * origin ({@link ThresholdsInForce}); and the settings the user changed in the project config.
 *
 * <p>A citation that names no entry, or more than one, a listed reference that is not the bibliography's
 * own, and a method named in the text that the bibliography gives no source for, are shown in a warning and
 * counted in the headline {@code citationsWithoutReference}.
 */
public final class MethodsSection {
    public static final String ID = "methods";
    private static final String TITLE = "Methods and references";

    /** Sources of the report's own conventions (chart colours, CSV format and safety). */
    static final List<Reference> OWN = List.of(Bibliography.get("okabe2008"), Bibliography.get("rfc4180"),
            Bibliography.get("owasp"));

    private MethodsSection() {
    }

    public static ReportSection build(List<ReportSection> cited, CupelConfig config) {
        return build(cited, config, Bibliography.standard());
    }

    static ReportSection build(List<ReportSection> cited, CupelConfig config, Bibliography bibliography) {
        ReportTable thresholds = ThresholdsInForce.table(config);
        List<ReportSection> all = new ArrayList<>(cited);
        // The thresholds table cites too ("Westgard et al. 1981"), and is named as the place that cites.
        all.add(new ReportSection(ID, thresholds.title(), List.of(new ReportBlock.Table(thresholds)), Map.of()));
        Sources sources = new Sources(bibliography);
        // Searching the texts is the costly part (seconds at a million samples), so the sections are searched
        // on every core; what they cite is then recorded in the sections' order.
        for (Found f : all.parallelStream().map(s -> Found.in(s, bibliography)).toList()) {
            sources.collect(f);
        }
        for (Reference r : OWN) {
            sources.add(r, "report format");
        }
        List<ReportBlock> blocks = new ArrayList<>();
        blocks.add(new ReportBlock.Paragraph("Each section states the formulas it applies beside its tables and "
                + "charts, and the thresholds in force with their origin: a published source, common practice in "
                + "assay QC, or a setting made in the project config. The methods the report names and every "
                + "source it cites are listed here; the numbers in brackets are those of the references table."));
        blocks.add(new ReportBlock.Table(new ReportTable("method-sources", "Methods named in the report",
                List.of("Method", "Sources", "Used in"), sources.methodRows(), "Each method is listed with the "
                        + "sources of its formulas, whether or not the sentence naming it gives the author and year.")));
        blocks.add(new ReportBlock.Table(new ReportTable("references", "References",
                List.of("No.", "Source", "Cited in"), sources.referenceRows(), "Sources cited by author and year "
                        + "in the sections, listed by a section, behind a method the report names, or behind the "
                        + "report format (chart colours, CSV files).")));
        if (!sources.problems.isEmpty()) {
            blocks.add(new ReportBlock.Callout(ReportBlock.Level.WARN, "Cited or named in the text but without exactly "
                    + "one entry in Cupel's bibliography: " + String.join("; ", sources.problems) + "."));
        }
        blocks.add(new ReportBlock.Paragraph("The thresholds in force, as the analyses applied them, and where "
                + "each comes from:"));
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
        h.put("references", sources.byCitation.size());
        h.put("methodsNamed", sources.methodsUsedIn.size());
        h.put("citationsWithoutReference", sources.problems.size());
        h.put("userSettings", settings.size());
        h.put("thresholds", thresholds.rows().size());
        return new ReportSection(ID, TITLE, blocks, h);
    }

    /** What one section cites by author and year and the methods it names. */
    private record Found(ReportSection section, List<Citations.Cited> cited, List<Bibliography.Method> methods) {
        static Found in(ReportSection s, Bibliography bibliography) {
            Set<String> texts = Citations.distinctTexts(s); // collected once for both searches
            return new Found(s, Citations.in(texts), Citations.methodsIn(texts, bibliography));
        }
    }

    /** The sources found so far, in order of first citation, with where each is cited and what is wrong. */
    private static final class Sources {
        private final Bibliography bibliography;
        private final Map<String, Reference> byCitation = new LinkedHashMap<>();
        private final Map<String, List<String>> citedIn = new LinkedHashMap<>();
        private final Map<Bibliography.Method, List<String>> methodsUsedIn = new LinkedHashMap<>();
        private final List<String> problems = new ArrayList<>();

        Sources(Bibliography bibliography) {
            this.bibliography = bibliography;
        }

        void collect(Found f) {
            ReportSection s = f.section();
            for (Reference r : s.references()) {
                if (bibliography.entryOf(r).isPresent()) {
                    add(r, s.title());
                } else {
                    problem(r.citation() + " (listed by " + s.title() + ", not the bibliography's entry)");
                }
            }
            for (Citations.Cited c : f.cited()) {
                List<Bibliography.Entry> found = bibliography.resolve(c);
                if (found.size() == 1) {
                    add(found.get(0).reference(), s.title());
                } else {
                    problem(c.asWritten() + (found.isEmpty() ? "" : " (names " + found.size() + " entries)"));
                }
            }
            for (Bibliography.Method m : f.methods()) {
                addOnce(methodsUsedIn.computeIfAbsent(m, k -> new ArrayList<>()), s.title());
                if (m.sources().isEmpty()) {
                    problem(m.name() + " (named in " + s.title() + ", no source in the bibliography)");
                }
                for (String key : m.sources()) {
                    add(bibliography.entry(key).orElseThrow().reference(), s.title());
                }
            }
        }

        void add(Reference r, String where) {
            byCitation.putIfAbsent(r.citation(), r);
            addOnce(citedIn.computeIfAbsent(r.citation(), k -> new ArrayList<>()), where);
        }

        private void problem(String what) {
            if (!problems.contains(what)) {
                problems.add(what);
            }
        }

        List<List<String>> referenceRows() {
            List<List<String>> rows = new ArrayList<>();
            int n = 1;
            for (String citation : byCitation.keySet()) {
                rows.add(List.of(String.valueOf(n++), citation, String.join("; ", citedIn.get(citation))));
            }
            return rows;
        }

        List<List<String>> methodRows() {
            List<String> numbers = new ArrayList<>(byCitation.keySet());
            List<List<String>> rows = new ArrayList<>();
            for (Map.Entry<Bibliography.Method, List<String>> e : methodsUsedIn.entrySet()) {
                List<String> cites = new ArrayList<>();
                for (String key : e.getKey().sources()) {
                    Bibliography.Entry entry = bibliography.entry(key).orElseThrow();
                    cites.add(entry.shortForm() + " [" + (numbers.indexOf(entry.reference().citation()) + 1) + "]");
                }
                rows.add(List.of(e.getKey().name(), String.join("; ", cites), String.join("; ", e.getValue())));
            }
            return rows;
        }

        private static void addOnce(List<String> list, String value) {
            if (!list.contains(value)) {
                list.add(value);
            }
        }
    }

    private static void flatten(String prefix, JsonNode node, List<List<String>> out) {
        if (node.isObject()) {
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                flatten(prefix.isEmpty() ? e.getKey() : prefix + "." + e.getKey(), e.getValue(), out);
            }
        } else {
            out.add(List.of(prefix, node.isValueNode() ? node.asText() : node.toString()));
        }
    }
}
