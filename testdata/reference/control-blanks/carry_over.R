# Independent check of Cupel's carry-over statistics (org.cupel.control.CarryOver) with R's stats package.
# Reads carry_over_pairs.csv; writes carry_over_expected_r.csv with Spearman's rho and its asymptotic
# two-sided p (cor.test(method = "spearman", exact = FALSE): t approximation, average ranks for ties;
# censored blanks at their limit) and the least-squares slope of blank on preceding grade over detected
# blanks (lm): slope, SE, intercept, p.
# Run: /usr/bin/Rscript testdata/reference/control-blanks/carry_over.R
args <- commandArgs(trailingOnly = FALSE)
here <- dirname(normalizePath(sub("^--file=", "", args[grep("^--file=", args)])))
d <- read.csv(file.path(here, "carry_over_pairs.csv"), colClasses = c("numeric", "numeric", "character"))
d$qualifier[is.na(d$qualifier)] <- ""
ct <- suppressWarnings(cor.test(d$preceding, d$blank, method = "spearman", exact = FALSE))
det <- d[d$qualifier == "", ]
fit <- summary(lm(blank ~ preceding, data = det))
co <- fit$coefficients
out <- data.frame(
  quantity = c("n_rank", "spearman_rho", "spearman_p", "n_regression", "slope", "slope_stderr", "intercept", "slope_p"),
  value = c(nrow(d), unname(ct$estimate), ct$p.value, nrow(det), co["preceding", "Estimate"],
            co["preceding", "Std. Error"], co["(Intercept)", "Estimate"], co["preceding", "Pr(>|t|)"]))
out$value <- sprintf("%.17g", out$value)
write.csv(out, file.path(here, "carry_over_expected_r.csv"), row.names = FALSE, quote = FALSE)
cat(R.version.string, "\n")
print(out)
