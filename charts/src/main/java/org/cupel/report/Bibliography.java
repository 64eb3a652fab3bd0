package org.cupel.report;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The full references of the sources Cupel's sections cite by author and year in their text. Each entry
 * is found by the first author's surname and the year, as written in the text ("Stanley &amp; Lawie 2007",
 * "Thompson–Howarth (1978)"). Bibliographic details follow /work/shared/reference/methods.md where it
 * gives them; journal volumes, pages and the exact titles are recalled from memory and should be checked
 * against the publications before the appendix is published.
 */
final class Bibliography {

    /** A reference and how the text cites it. */
    record Entry(String surname, int year, Reference reference) {
        boolean cites(String citedNames, int citedYear) {
            return citedYear == year && citedNames.toLowerCase(Locale.ROOT).contains(surname.toLowerCase(Locale.ROOT));
        }
    }

    static final List<Entry> ENTRIES = List.of(
            e("Abzalov", 2008, "Abzalov, M.", "Quality control of assay data: a review of procedures for measuring and "
                    + "monitoring precision and accuracy", "Exploration and Mining Geology 17(3-4), 131-144"),
            e("Conover", 1999, "Conover, W. J.", "Practical Nonparametric Statistics, 3rd edition", "Wiley, New York"),
            e("Draper", 1998, "Draper, N. R. and Smith, H.", "Applied Regression Analysis, 3rd edition",
                    "Wiley, New York"),
            e("Efron", 1993, "Efron, B. and Tibshirani, R. J.", "An Introduction to the Bootstrap",
                    "Chapman & Hall, New York"),
            e("Fieller", 1954, "Fieller, E. C.", "Some problems in interval estimation",
                    "Journal of the Royal Statistical Society, Series B 16(2), 175-185"),
            e("Games", 1976, "Games, P. A. and Howell, J. F.", "Pairwise multiple comparison procedures with unequal "
                    + "N's and/or variances: a Monte Carlo study", "Journal of Educational Statistics 1(2), 113-125"),
            e("Holm", 1979, "Holm, S.", "A simple sequentially rejective multiple test procedure",
                    "Scandinavian Journal of Statistics 6(2), 65-70"),
            e("Kaplan", 1958, "Kaplan, E. L. and Meier, P.", "Nonparametric estimation from incomplete observations",
                    "Journal of the American Statistical Association 53(282), 457-481"),
            e("Satterthwaite", 1946, "Satterthwaite, F. E.", "An approximate distribution of estimates of variance "
                    + "components", "Biometrics Bulletin 2(6), 110-114"),
            e("Schuirmann", 1987, "Schuirmann, D. J.", "A comparison of the two one-sided tests procedure and the "
                    + "power approach for assessing the equivalence of average bioavailability",
                    "Journal of Pharmacokinetics and Biopharmaceutics 15(6), 657-680"),
            e("Welch", 1947, "Welch, B. L.", "The generalization of 'Student's' problem when several different "
                    + "population variances are involved", "Biometrika 34(1-2), 28-35"),
            e("Helsel", 2012, "Helsel, D. R.", "Statistics for Censored Environmental Data Using Minitab and R, "
                    + "2nd edition", "Wiley, Hoboken"),
            e("Helsel", 1988, "Helsel, D. R. and Cohn, T. A.", "Estimation of descriptive statistics for multiply "
                    + "censored water quality data", "Water Resources Research 24(12), 1997-2004"),
            e("Hodouin", 1980, "Hodouin, D. and Everell, M. D.", "A hierarchical procedure for adjustment and "
                    + "material balancing of mineral processes data", "International Journal of Mineral Processing "
                    + "7(2), 91-116"),
            e("Kuehn", 1961, "Kuehn, D. R. and Davidson, H.", "Computer control II: mathematics of control",
                    "Chemical Engineering Progress 57(6), 44-47"),
            e("Miller", 1962, "Miller, R. L. and Kahn, J. S.", "Statistical Analysis in the Geological Sciences",
                    "Wiley, New York"),
            e("Nelson", 1984, "Nelson, L. S.", "The Shewhart control chart: tests for special causes",
                    "Journal of Quality Technology 16(4), 237-239"),
            e("Shaw", 1997, "Shaw, W. J.", "Validation of sampling and assaying quality for bankable feasibility "
                    + "studies", "The Resource Database Towards 2000, AusIMM, Melbourne"),
            e("Smee", 2024, "Smee, B. W., Bloom, L., Arne, D. and Heberlein, D.", "Article on the use and "
                    + "mix-up of reference materials in assay quality control (exact title not verified here)",
                    "Geochemistry: Exploration, Environment, Analysis 24"),
            e("Spearman", 1904, "Spearman, C.", "The proof and measurement of association between two things",
                    "American Journal of Psychology 15(1), 72-101"),
            e("Stanley", 2007, "Stanley, C. R. and Lawie, D.", "Average relative error in geochemical "
                    + "determinations: clarification, calculation, and a plea for consistency",
                    "Exploration and Mining Geology 16(3-4), 267-275"),
            e("Stanley", 2008, "Stanley, C. R. and Lawie, D.", "Thompson-Howarth error analysis: unbiased "
                    + "alternatives to the large-sample method for assessing non-normally distributed measurement "
                    + "error in geochemical samples", "Geochemistry: Exploration, Environment, Analysis 8(2), 173-182"),
            e("Student", 1908, "Student", "The probable error of a mean", "Biometrika 6(1), 1-25"),
            e("Thompson", 1978, "Thompson, M. and Howarth, R. J.", "A new approach to the estimation of analytical "
                    + "precision", "Journal of Geochemical Exploration 9(1), 23-30"),
            e("Westgard", 1981, "Westgard, J. O., Barry, P. L., Hunt, M. R. and Groth, T.", "A multi-rule Shewhart "
                    + "chart for quality control in clinical chemistry", "Clinical Chemistry 27(3), 493-501"),
            e("Zar", 1972, "Zar, J. H.", "Significance testing of the Spearman rank correlation coefficient",
                    "Journal of the American Statistical Association 67(339), 578-580"));

    private Bibliography() {
    }

    static Optional<Entry> find(String citedNames, int year) {
        return ENTRIES.stream().filter(x -> x.cites(citedNames, year)).findFirst();
    }

    private static Entry e(String surname, int year, String authors, String title, String publication) {
        return new Entry(surname, year, new Reference(authors, year, title, publication));
    }
}
