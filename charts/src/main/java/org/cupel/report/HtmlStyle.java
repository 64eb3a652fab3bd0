package org.cupel.report;

/**
 * The report's stylesheet: a single readable column, a contents list, quiet tables with right-aligned
 * numbers, callouts marked by a word as well as a colour (Okabe–Ito hues, so colour-blind readers lose
 * nothing), wide tables that scroll sideways in their own box (never cut off by the page), and print rules:
 * A4/Letter margins, each section on a new page, table headers repeated.
 */
final class HtmlStyle {
    static final String CSS = String.join("\n",
            ":root{--ink:#1d2330;--muted:#5b6270;--rule:#d9dce1;--band:#f4f5f7;--accent:#0072b2;}",
            "*{box-sizing:border-box}",
            "html{font-size:16px}",
            "body{margin:0;color:var(--ink);background:#fff;font-family:\"DejaVu Sans\",\"Segoe UI\",Helvetica,Arial,"
                    + "sans-serif;line-height:1.5}",
            "header,nav,main,footer{max-width:68rem;margin:0 auto;padding:0 1.5rem}",
            "header{padding-top:2rem;padding-bottom:1rem}", "header::after{content:\"\";display:block;margin-top:1rem;border-bottom:3px solid var(--accent)}",
            ".kicker{margin:0;text-transform:uppercase;letter-spacing:.12em;font-size:.8rem;color:var(--accent);"
                    + "font-weight:bold}",
            "h1{margin:.2rem 0 .4rem;font-size:2rem;line-height:1.2}",
            ".meta{margin:0;color:var(--muted);font-size:.9rem}",
            "nav{padding-top:1rem;padding-bottom:1rem}",
            "nav h2{font-size:1rem;margin:0 0 .3rem;color:var(--muted);text-transform:uppercase;letter-spacing:.08em}",
            "nav ol{margin:0;padding-left:1.6rem;columns:2;column-gap:2rem}",
            "nav a{color:var(--accent);text-decoration:none}",
            "nav a:hover{text-decoration:underline}",
            "section{padding:1rem 0 1.5rem;border-top:1px solid var(--rule)}",
            "h2{font-size:1.45rem;margin:.6rem 0 .8rem}",
            "h2 .num{display:inline-block;min-width:1.8rem;color:var(--accent)}",
            "p{margin:.5rem 0;max-width:48rem}",
            "figure{margin:1rem 0 1.4rem}",
            "figcaption{font-weight:bold;margin-bottom:.35rem}",
            "figure.chart figcaption{font-weight:normal;color:var(--muted);font-size:.9rem;margin-top:.3rem}",
            "figure.chart img{display:block;width:100%;max-width:52rem;height:auto;border:1px solid var(--rule)}",
            // A table of few columns keeps to the text column and wraps its text; a table of many columns
            // (class wide) may use the window out to its right margin. What is wider still scrolls sideways in
            // its own box, never cut off by the page, with the first column (what names the row) kept in view.
            ".scroll{overflow-x:auto;width:fit-content;min-width:100%;"
                    + "max-width:calc(100vw - 3rem - max(0px, (100vw - 68rem) / 2))}",
            ".scroll.wide{width:max-content}",
            ".wide table{font-size:.8rem}",
            ".wide th,.wide td{padding:.28rem .45rem}",
            ".wide th:first-child,.wide td:first-child{box-shadow:inset -1px 0 0 var(--rule)}",
            "table{border-collapse:collapse;font-size:.86rem;min-width:50%}",
            "th,td{padding:.28rem .6rem;border-bottom:1px solid var(--rule);text-align:left;vertical-align:top}",
            // Headers wrap between words, never inside one (no overflow-wrap, no automatic hyphens).
            "th{background:var(--band);border-bottom:2px solid #9aa1ab;overflow-wrap:normal;hyphens:manual}",
            "th:first-child,td:first-child{position:sticky;left:0;z-index:1;background:#fff}",
            "th:first-child{background:var(--band)}",
            "tbody tr:nth-child(even),tbody tr:nth-child(even) td:first-child{background:#fafbfc}",
            "td.n{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}",
            "td.d{white-space:nowrap}",
            "td.empty{color:var(--muted);font-style:italic}",
            "a.csv{font-weight:normal;font-size:.8rem;margin-left:.5rem;color:var(--accent)}",
            ".note{color:var(--muted);font-size:.85rem;margin-top:.3rem}",
            ".callout{margin:.8rem 0;padding:.55rem .8rem;border-left:6px solid #999;background:var(--band);"
                    + "max-width:48rem}",
            ".callout.pass{border-color:#009e73}",
            ".callout.warn{border-color:#e69f00}",
            ".callout.fail{border-color:#d55e00}",
            ".callout.caution{border-color:#cc79a7}",
            ".callout.info{border-color:#56b4e9}",
            ".callout.cannot_judge{border-color:#000000;border-left-style:dashed}",
            "footer{padding-top:1rem;padding-bottom:2rem;color:var(--muted);font-size:.8rem;"
                    + "border-top:1px solid var(--rule)}",
            "@media print{",
            "  @page{margin:18mm 16mm}",
            "  html{font-size:10.5pt}",
            "  header,nav,main,footer{max-width:none;padding:0}",
            "  nav ol{columns:1}",
            "  section{break-before:page;border-top:none}",
            "  a{color:inherit;text-decoration:none}",
            "  a.csv{display:none}",
            // On paper nothing scrolls: a table takes the text width, and wide tables print smaller.
            "  .scroll,.scroll.wide{overflow:visible;width:auto;max-width:none}",
            "  th:first-child,td:first-child{position:static}",
            "  table{font-size:8pt}",
            "  .wide table{font-size:7pt}",
            "  thead{display:table-header-group}",
            "  tr,figure.chart,.callout{break-inside:avoid}",
            "  h2,figure.table figcaption{break-after:avoid}",
            "  tbody tr:nth-child(even),tbody tr:nth-child(even) td:first-child{background:none}",
            "}",
            "");

    private HtmlStyle() {
    }
}
