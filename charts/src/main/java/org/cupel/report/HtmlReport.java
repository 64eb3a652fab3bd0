package org.cupel.report;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;

/**
 * Renders a {@link QcReport} as one self-contained {@code index.html}: inline CSS, no script, no web font,
 * no remote resource. Charts are PNG files in {@code charts/} beside the page rather than base64 inside
 * it: the PNGs are part of the output anyway, so embedding them would store every chart twice and make
 * the page many megabytes at 300 dpi; the folder works offline as a whole (copy it, open index.html).
 * Every text passes through {@link Html#escape(String)}.
 */
public final class HtmlReport {
    static final DateTimeFormatter STAMP =
            DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT).withZone(ZoneOffset.UTC);

    private static final java.util.regex.Pattern DATE = java.util.regex.Pattern.compile("\\d{4}-\\d{2}-\\d{2}");

    private final QcReport report;
    private final ReportFiles files;
    private final StringBuilder out = new StringBuilder(64 * 1024);

    private HtmlReport(QcReport report, ReportFiles files) {
        this.report = report;
        this.files = files;
    }

    public static String render(QcReport report, ReportFiles files) {
        return new HtmlReport(report, files).page();
    }

    private String page() {
        out.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .append("<title>").append(e(report.project())).append(" — ").append(QcReport.TITLE)
                .append("</title>\n<style>\n").append(HtmlStyle.CSS).append("</style>\n</head>\n<body>\n");
        header();
        toc();
        out.append("<main>\n");
        List<ReportSection> sections = report.sections();
        for (int i = 0; i < sections.size(); i++) {
            section(i + 1, sections.get(i));
        }
        out.append("</main>\n<footer>").append(e(report.project())).append(" · ").append(QcReport.TITLE)
                .append(" · generated ").append(e(STAMP.format(report.generated()))).append(" by Cupel</footer>\n")
                .append("</body>\n</html>\n");
        return out.toString();
    }

    private void header() {
        out.append("<header>\n<p class=\"kicker\">").append(QcReport.TITLE).append("</p>\n<h1>")
                .append(e(report.project())).append("</h1>\n<p class=\"meta\">Covers ")
                .append(e(report.selection())).append(" · generated ")
                .append(e(STAMP.format(report.generated()))).append("</p>\n</header>\n");
    }

    private void toc() {
        out.append("<nav aria-label=\"Contents\">\n<h2>Contents</h2>\n<ol>\n");
        for (ReportSection s : report.sections()) {
            out.append("<li><a href=\"#").append(e(anchor(s))).append("\">").append(e(s.title()))
                    .append("</a></li>\n");
        }
        out.append("</ol>\n</nav>\n");
    }

    private void section(int number, ReportSection s) {
        out.append("<section id=\"").append(e(anchor(s))).append("\">\n<h2><span class=\"num\">").append(number)
                .append("</span> ").append(e(s.title())).append("</h2>\n");
        for (ReportBlock b : s.blocks()) {
            if (b instanceof ReportBlock.Paragraph p) {
                out.append("<p>").append(e(p.text())).append("</p>\n");
            } else if (b instanceof ReportBlock.Callout c) {
                callout(c);
            } else if (b instanceof ReportBlock.Table t) {
                table(t.table());
            } else if (b instanceof ReportBlock.Figure f) {
                figure(f);
            }
        }
        out.append("</section>\n");
    }

    private void callout(ReportBlock.Callout c) {
        String level = c.level().name().toLowerCase(Locale.ROOT);
        out.append("<div class=\"callout ").append(level).append("\"><strong>").append(label(c.level()))
                .append("</strong> ").append(e(body(c))).append("</div>\n");
    }

    private void table(ReportTable t) {
        out.append("<figure class=\"table\">\n<figcaption>").append(e(t.title()))
                .append(" <a class=\"csv\" href=\"").append(e(files.table(t))).append("\">CSV</a></figcaption>\n")
                .append(t.columns().size() >= PdfTableLayout.WIDE_TABLE_COLUMNS ? "<div class=\"scroll wide\">"
                        : "<div class=\"scroll\">").append("<table>\n<thead><tr>");
        for (String c : t.columns()) {
            out.append("<th scope=\"col\">").append(e(c)).append("</th>");
        }
        out.append("</tr></thead>\n<tbody>\n");
        for (List<String> row : t.rows().subList(0, Math.min(t.rows().size(), TableLimit.SHOWN))) {
            out.append("<tr>");
            for (String cell : row) {
                out.append(TableLimit.isNumeric(cell) ? "<td class=\"n\">"
                        : keepWhole(cell) ? "<td class=\"d\">" : "<td>").append(e(NoBreak.ranges(cell)))
                        .append("</td>");
            }
            out.append("</tr>\n");
        }
        if (t.rows().isEmpty()) {
            out.append("<tr><td class=\"empty\" colspan=\"").append(t.columns().size())
                    .append("\">No rows.</td></tr>\n");
        }
        out.append("</tbody>\n</table></div>\n");
        String note = TableLimit.note(t, files.table(t));
        if (!note.isEmpty()) {
            out.append("<p class=\"note\">").append(e(note)).append("</p>\n");
        }
        out.append("</figure>\n");
    }

    private void figure(ReportBlock.Figure f) {
        out.append("<figure class=\"chart\">\n<img src=\"").append(e(files.chart(f))).append("\" alt=\"")
                .append(e(f.caption())).append("\">\n<figcaption>").append(e(f.caption()))
                .append("</figcaption>\n</figure>\n");
    }

    /** Dates, IDs and file names: short tokens without spaces that read badly when broken at a hyphen. */
    private static boolean keepWhole(String cell) {
        return DATE.matcher(cell).matches() || cell.length() <= 28 && cell.indexOf(' ') < 0;
    }

    static String label(ReportBlock.Level level) {
        switch (level) {
            case PASS: return "Pass.";
            case WARN: return "Warning.";
            case FAIL: return "Fail.";
            case CAUTION: return "Caution.";
            case CANNOT_JUDGE: return "Cannot judge.";
            default: return "Note.";
        }
    }

    /**
     * The callout's text without a leading repeat of its label ("Caution: ..." under the label "Caution."),
     * which core results sometimes carry so that they read on their own in the CLI.
     */
    static String body(ReportBlock.Callout c) {
        String word = label(c.level()).replace(".", "");
        String t = c.text().strip();
        if (t.regionMatches(true, 0, word, 0, word.length()) && t.length() > word.length()
                && t.charAt(word.length()) == ':') {
            t = t.substring(word.length() + 1).strip();
            return t.isEmpty() ? t : Character.toUpperCase(t.charAt(0)) + t.substring(1);
        }
        return t;
    }

    /** Section anchors come from sanitised IDs, so a hostile ID cannot break out of the attribute. */
    static String anchor(ReportSection s) {
        return "s-" + FileNames.safe(s.id());
    }

    private static String e(String s) {
        return Html.escape(s);
    }
}
