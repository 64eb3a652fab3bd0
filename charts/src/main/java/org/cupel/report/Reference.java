package org.cupel.report;

/**
 * A source cited in the report, listed in its "Methods and references" section.
 *
 * @param authors authors as cited ("Thompson, M. and Howarth, R. J.") or the issuing body
 * @param year year of publication; 0 for an undated web page, printed "n.d."
 * @param title title of the work
 * @param publication journal with volume and pages, publisher, or web address; may be empty
 */
public record Reference(String authors, int year, String title, String publication) {
    public Reference {
        if (authors == null || authors.isBlank() || title == null || title.isBlank()) {
            throw new IllegalArgumentException("a reference needs authors and a title");
        }
        publication = publication == null ? "" : publication;
    }

    /** "Okabe, M. and Ito, K. (2008). Color Universal Design. J*Fly." */
    public String citation() {
        StringBuilder sb = new StringBuilder().append(authors).append(" (").append(year == 0 ? "n.d." : year)
                .append("). ").append(title);
        if (!title.endsWith(".") && !title.endsWith("?")) {
            sb.append('.');
        }
        if (!publication.isEmpty()) {
            sb.append(' ').append(publication);
            if (!publication.endsWith(".")) {
                sb.append('.');
            }
        }
        return sb.toString();
    }
}
