package org.cupel.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Consumer;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/**
 * What a section cites: author–year citations ("Stanley &amp; Lawie (2007)", "Westgard, Barry, Hunt &amp;
 * Groth 1981", "Helsel–Cohn 1988") and the methods it names ("Welch t", "Kaplan–Meier"; the names are those
 * of {@link Bibliography#methods()}), found in every text a reader sees: the title, paragraphs, callouts,
 * captions, table titles, notes, column headings and the cells of the rows shown. The methods section
 * lists the full reference of each.
 */
final class Citations {
    private static final String NAME = "[A-Z][a-zA-Z'’]+(?:[–-][A-Z][a-zA-Z'’]+)*";
    /** Names joined by commas, "&amp;" or "and", or by a space within a name of several words ("Western Electric"). */
    private static final Pattern CITATION = Pattern.compile("\\b(" + NAME + "(?:(?:,\\s*|\\s+(?:&|and)\\s+|,\\s+(?:&|and)"
            + "\\s+|\\s+)" + NAME + ")*(?:\\s+et al\\.)?)\\s*,?\\s*\\(?((?:19|20)\\d{2})\\b(?![-:.]\\d)");
    private static final Set<String> MONTHS = Set.of("January", "February", "March", "April", "May", "June",
            "July", "August", "September", "October", "November", "December");
    /** Capitalised words before a year that are not authors. */
    private static final Set<String> NOT_AUTHORS = Stream.concat(MONTHS.stream(), Stream.of("In", "The", "See",
            "Since", "Table", "Section", "Figure", "Appendix", "Part", "Note", "CFR", "From", "To", "Until", "Year",
            "Reported", "Date", "Version", "Edition", "As", "Of", "After", "Before", "By"))
            .collect(Collectors.toUnmodifiableSet());

    /** One citation as written: the names and the year. */
    record Cited(String names, int year) {
        String asWritten() {
            return names + " " + year;
        }
    }

    private Citations() {
    }

    static List<Cited> in(ReportSection s) {
        return in(distinctTexts(s));
    }

    /** The citations in {@code texts} (a section's {@link #distinctTexts}), in order of first appearance. */
    static List<Cited> in(Set<String> texts) {
        Set<Cited> found = new LinkedHashSet<>();
        for (String text : texts) {
            scan(text, found);
        }
        return new ArrayList<>(found);
    }

    /**
     * The methods of {@code bibliography} that the section names, in the bibliography's order. The patterns are
     * searched in one {@link PatternScan} of the section's distinct texts joined by line breaks (no method name
     * is written across one): a section of a large project shows 500 rows of many tables, and a matcher per
     * pattern per cell took seconds at a million samples. {@code CitationsTest#methodsFoundInTheJoinedTexts
     * AreThoseOfEachText} checks the result against each pattern searched in each text.
     */
    static List<Bibliography.Method> methodsIn(ReportSection s, Bibliography bibliography) {
        return methodsIn(distinctTexts(s), bibliography);
    }

    /** As {@link #methodsIn(ReportSection, Bibliography)}, for a section's {@link #distinctTexts}. */
    static List<Bibliography.Method> methodsIn(Set<String> texts, Bibliography bibliography) {
        List<Bibliography.Method> methods = bibliography.methods();
        BitSet named = new PatternScan(methods.stream().map(Bibliography.Method::pattern).toList())
                .matching(String.join("\n", texts));
        return named.stream().mapToObj(methods::get).toList();
    }

    /** The section's texts, each once, in the order a reader first meets them. */
    static Set<String> distinctTexts(ReportSection s) {
        Set<String> texts = new LinkedHashSet<>();
        texts(s, texts::add);
        return texts;
    }

    /** Every text of the section a reader sees, in reading order; null and empty texts are skipped. */
    static void texts(ReportSection s, Consumer<String> each) {
        Consumer<String> scan = text -> {
            if (text != null && !text.isEmpty()) {
                each.accept(text);
            }
        };
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
    }

    static void scan(String text, Set<Cited> out) {
        if (text == null || text.isEmpty()) {
            return;
        }
        Matcher m = CITATION.matcher(text);
        while (m.find()) {
            String names = authors(m.group(1));
            if (!names.isEmpty()) {
                out.add(new Cited(names, Integer.parseInt(m.group(2))));
            }
        }
    }

    /**
     * The names without the common words before them ("See Helsel" is Helsel); empty when none is left or a
     * month is among them (a date such as "in March 2025" is not a citation).
     */
    private static String authors(String names) {
        String[] words = names.split("\\s+");
        int first = 0;
        while (first < words.length && NOT_AUTHORS.contains(words[first].replace(",", ""))) {
            first++;
        }
        for (int i = first; i < words.length; i++) {
            if (MONTHS.contains(words[i].replace(",", ""))) {
                return "";
            }
        }
        return String.join(" ", Arrays.copyOfRange(words, first, words.length));
    }
}
