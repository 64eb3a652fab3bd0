package org.cupel.report;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Consumer;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Finds author–year citations ("Stanley &amp; Lawie (2007)", "Westgard, Barry, Hunt &amp; Groth 1981",
 * "Helsel–Cohn 1988") in the text of a section: paragraphs, callouts, captions, table titles, notes and the
 * cells of the rows shown. The methods section lists each with its full reference.
 */
final class Citations {
    private static final String NAME = "[A-Z][a-zA-Z'’]+(?:[–-][A-Z][a-zA-Z'’]+)*";
    private static final Pattern CITATION = Pattern.compile("\\b(" + NAME + "(?:(?:,\\s*|\\s+(?:&|and)\\s+|,\\s+(?:&|and)"
            + "\\s+)" + NAME + ")*(?:\\s+et al\\.)?)\\s*,?\\s*\\(?((?:19|20)\\d{2})\\b(?![-:.]\\d)");
    /** Capitalised words before a year that are not authors. */
    private static final Set<String> NOT_AUTHORS = Set.of("January", "February", "March", "April", "May", "June",
            "July", "August", "September", "October", "November", "December", "In", "The", "See", "Since", "Table",
            "Section", "Figure", "Appendix", "Part", "Note", "CFR", "From", "To", "Until", "Year", "Reported", "Date",
            "Version", "Edition", "As", "Of", "After", "Before", "By");

    /** One citation as written: the names and the year. */
    record Cited(String names, int year) {
        String asWritten() {
            return names + " " + year;
        }
    }

    private Citations() {
    }

    static List<Cited> in(ReportSection s) {
        Set<Cited> found = new LinkedHashSet<>();
        Consumer<String> scan = text -> scan(text, found);
        scan.accept(s.title());
        for (ReportBlock b : s.blocks()) {
            if (b instanceof ReportBlock.Paragraph p) {
                scan.accept(p.text());
            } else if (b instanceof ReportBlock.Callout c) {
                scan.accept(c.text());
            } else if (b instanceof ReportBlock.Figure f) {
                scan.accept(f.caption());
            } else if (b instanceof ReportBlock.Table t) {
                scan.accept(t.table().title());
                scan.accept(t.table().note());
                t.table().columns().forEach(scan);
                t.table().rows().stream().limit(TableLimit.SHOWN).forEach(row -> row.forEach(scan));
            }
        }
        return new ArrayList<>(found);
    }

    static void scan(String text, Set<Cited> out) {
        if (text == null || text.isEmpty()) {
            return;
        }
        Matcher m = CITATION.matcher(text);
        while (m.find()) {
            String names = m.group(1);
            String first = names.split("[\\s,–-]+")[0];
            if (!NOT_AUTHORS.contains(first)) {
                out.add(new Cited(names, Integer.parseInt(m.group(2))));
            }
        }
    }
}
