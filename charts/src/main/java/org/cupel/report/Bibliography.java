package org.cupel.report;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;
import java.util.regex.PatternSyntaxException;

/**
 * The one bibliography of the QC appendix, read once from the resource {@code references.yaml} beside this
 * class: each source has exactly one entry, found by its key ({@link #get}) or by the author and year the
 * text cites ({@link #resolve}), and each method the report names has the keys of its sources
 * ({@link #methods}). How each entry was checked is in docs/references.md. Loading refuses two entries for
 * one source (same authors and year, or same title), a method citing a key that has no entry, and a missing
 * field, so that a second, differing copy of a reference cannot reach the report.
 */
public final class Bibliography {
    private static final String RESOURCE = "references.yaml";

    /**
     * An entry: its key, the reference as the report prints it, the short form the methods table uses
     * ("Stanley &amp; Lawie 2007") and the first author's name as the text writes it before the year.
     */
    public record Entry(String key, Reference reference, String shortForm, String citedAs) {
        /** Whether the author–year citation {@code c} names this entry: same year, and the names start with it. */
        boolean isCitedBy(Citations.Cited c) {
            if (c.year() != reference.year()) {
                return false;
            }
            String names = normalise(c.names());
            String first = normalise(citedAs);
            return names.equals(first) || names.startsWith(first)
                    && !Character.isLetter(names.charAt(first.length()));
        }
    }

    /**
     * A method the report names ("Welch t-test"), how the text names it, and the keys of its sources; a method
     * listed without a source is flagged wherever the report names it.
     */
    public record Method(String name, Pattern pattern, List<String> sources) {
        public Method {
            sources = List.copyOf(sources);
        }
    }

    private static final class Holder {
        static final Bibliography INSTANCE = load();
    }

    private final Map<String, Entry> entries;
    private final List<Method> methods;

    private Bibliography(Map<String, Entry> entries, List<Method> methods) {
        this.entries = entries;
        this.methods = List.copyOf(methods);
    }

    /** The bibliography of the report. */
    public static Bibliography standard() {
        return Holder.INSTANCE;
    }

    /** The reference filed under {@code key}; an unknown key is a bug in the calling section. */
    public static Reference get(String key) {
        Entry e = standard().entries.get(key);
        if (e == null) {
            throw new IllegalArgumentException("no bibliography entry " + key + " in " + RESOURCE);
        }
        return e.reference();
    }

    /** Every entry, in the order of the file. */
    public List<Entry> entries() {
        return List.copyOf(entries.values());
    }

    /** Every method the report may name, with its sources. */
    public List<Method> methods() {
        return methods;
    }

    public Optional<Entry> entry(String key) {
        return Optional.ofNullable(entries.get(key));
    }

    /** The entry whose reference is {@code r} exactly, if any. */
    public Optional<Entry> entryOf(Reference r) {
        return entries.values().stream().filter(e -> e.reference().equals(r)).findFirst();
    }

    /** The entries that the author–year citation {@code c} names: one when the citation is sound. */
    public List<Entry> resolve(Citations.Cited c) {
        return entries.values().stream().filter(e -> e.isCitedBy(c)).toList();
    }

    static Bibliography load() {
        try (InputStream in = Bibliography.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("the resource " + RESOURCE + " is missing from the build");
            }
            return read(in);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + RESOURCE, e);
        }
    }

    /** Reads and checks a bibliography file (the form of {@code references.yaml}). */
    static Bibliography read(InputStream in) throws IOException {
        ObjectMapper yaml = new ObjectMapper(new YAMLFactory())
                .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);
        FileForm file = yaml.readValue(in, FileForm.class);
        Map<String, Entry> entries = new LinkedHashMap<>();
        Map<String, String> byAuthorsYear = new HashMap<>();
        Map<String, String> byTitle = new HashMap<>();
        for (EntryForm f : file.entries) {
            Entry e = f.toEntry();
            if (entries.put(e.key(), e) != null) {
                throw new IllegalStateException(RESOURCE + ": the key " + e.key() + " is used twice");
            }
            String authorsYear = normalise(e.reference().authors()) + " " + e.reference().year();
            unique(byAuthorsYear, authorsYear, e.key(), "authors and year");
            unique(byTitle, normalise(e.reference().title()), e.key(), "title");
        }
        List<Method> methods = new ArrayList<>();
        for (MethodForm m : file.methods) {
            for (String key : m.sources) {
                if (!entries.containsKey(key)) {
                    throw new IllegalStateException(RESOURCE + ": the method " + m.name + " cites " + key
                            + ", which has no entry");
                }
            }
            methods.add(m.toMethod());
        }
        return new Bibliography(entries, methods);
    }

    private static void unique(Map<String, String> seen, String value, String key, String what) {
        String other = seen.put(value, key);
        if (other != null) {
            throw new IllegalStateException(RESOURCE + ": the entries " + other + " and " + key + " have the same "
                    + what + "; a source has one entry");
        }
    }

    /** Lower case, one kind of dash and of ampersand, single spaces: how two spellings of a name compare. */
    static String normalise(String s) {
        return s.toLowerCase(Locale.ROOT).replace('–', '-').replace('—', '-').replace('’', '\'')
                .replace(" and ", " & ").replaceAll("\\s+", " ").trim();
    }

    /** The file's form; Jackson fills it. */
    static final class FileForm {
        public List<EntryForm> entries = List.of();
        public List<MethodForm> methods = List.of();
    }

    static final class EntryForm {
        public String key;
        @com.fasterxml.jackson.annotation.JsonProperty("short")
        public String shortForm;
        public String cite;
        public String authors;
        public Integer year;
        public String title;
        public String publication;

        Entry toEntry() {
            require(key, "key", key);
            require(shortForm, "short", key);
            require(authors, "authors", key);
            require(title, "title", key);
            if (year == null || year < 0) {
                throw new IllegalStateException(RESOURCE + ": the entry " + key + " has no year (0 for n.d.)");
            }
            if (year == 0 && (publication == null || !publication.startsWith("https://"))) {
                throw new IllegalStateException(RESOURCE + ": the undated entry " + key + " needs its web address");
            }
            String firstAuthor = authors.contains(",") ? authors.substring(0, authors.indexOf(',')) : authors;
            return new Entry(key, new Reference(authors, year, title, publication), shortForm,
                    cite == null ? firstAuthor : cite);
        }
    }

    static final class MethodForm {
        private static final Pattern BACK_REFERENCE = Pattern.compile("\\\\(?:[1-9]|k<)");

        public String name;
        public String pattern;
        public List<String> sources = List.of();

        Method toMethod() {
            require(name, "name", name);
            require(pattern, "pattern", name);
            if (BACK_REFERENCE.matcher(pattern).find()) {
                // The report searches each pattern in a section's texts joined by line breaks (Citations), where
                // a back-reference could join two texts; no method name needs one.
                throw new IllegalStateException(RESOURCE + ": the pattern of " + name + " uses a back-reference ("
                        + pattern + "); write the name out instead");
            }
            try {
                return new Method(name, Pattern.compile(pattern), sources);
            } catch (PatternSyntaxException e) {
                throw new IllegalStateException(RESOURCE + ": the pattern of " + name + " is not a valid expression: "
                        + e.getDescription(), e);
            }
        }
    }

    private static void require(String value, String field, String owner) {
        if (value == null || value.isBlank()) {
            throw new IllegalStateException(RESOURCE + ": " + (owner == null ? "an entry" : owner) + " has no "
                    + field);
        }
    }
}
