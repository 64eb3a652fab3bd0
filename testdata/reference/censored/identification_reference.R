# Reference maximum-likelihood fits for data with at most one distinct detected value, from R's survival
# package. Run from this folder:  /usr/bin/Rscript identification_reference.R
# Writes identification_reference.csv (key,value).
# smokedfish.csv: the smokedfish data set of the R package fitdistrplus 1.1-8 (Listeria monocytogenes in
# smoked fish, CFU/g; Busschaert et al. 2010, Int. J. Food Microbiol. 138, 260-269), 103 values: one exact
# value (15), left-censored, right-censored and interval-censored values. Written verbatim from the package by
#   Rscript -e 'library(fitdistrplus); data(smokedfish); lo <- ifelse(is.na(smokedfish$left), 0, smokedfish$left);
#     hi <- ifelse(is.na(smokedfish$right), Inf, smokedfish$right);
#     write.csv(data.frame(lower = lo, upper = hi), "smokedfish.csv", row.names = FALSE, quote = FALSE)'
# one_detect.csv: invented; one distinct detect (2, twice) and values below detection limits 0.5, 1 and 3.
# intervals_only.csv: invented; no detected value, values in the classes (1, 2], (2, 4], (4, 8] and below 1.
# All files: lower 0 = below detection (upper is the limit), upper Inf = above range, lower = upper a detect.
library(survival)
out <- list()
put <- function(k, v) out[[k]] <<- v

fit <- function(prefix, lo, hi, dist) {
  # rel.tolerance tightened from the default 1e-9 so the estimates are converged to about 1e-10
  m <- survreg(Surv(lo, hi, type = "interval2") ~ 1, dist = dist, control = survreg.control(rel.tolerance = 1e-13))
  put(paste0(prefix, "_mu"), unname(coef(m))); put(paste0(prefix, "_sigma"), m$scale)
  put(paste0(prefix, "_se_mu"), sqrt(m$var[1, 1])); put(paste0(prefix, "_se_logsigma"), sqrt(m$var[2, 2]))
  put(paste0(prefix, "_loglik"), m$loglik[2])
}
both <- function(prefix, d) {
  hi <- ifelse(is.infinite(d$upper), NA, d$upper)
  # lognormal: below detection is (0, DL], i.e. left-censored on the log scale
  fit(paste0(prefix, "_lognormal"), ifelse(d$lower <= 0, NA, d$lower), hi, "lognormal")
  # gaussian: below detection is (-Inf, DL]
  fit(paste0(prefix, "_normal"), ifelse(d$lower <= 0 & d$upper > 0 & d$lower != d$upper, NA, d$lower), hi, "gaussian")
}
both("smokedfish", read.csv("smokedfish.csv"))
od <- read.csv("one_detect.csv")
both("one_detect", od)
both("intervals_only", read.csv("intervals_only.csv"))
# The same fit of one_detect.csv through left censoring, Surv(x, event, type = "left"), as a cross-check.
x <- od$upper; ev <- od$lower == od$upper
m <- survreg(Surv(x, ev, type = "left") ~ 1, dist = "lognormal", control = survreg.control(rel.tolerance = 1e-13))
put("one_detect_left_lognormal_mu", unname(coef(m))); put("one_detect_left_lognormal_sigma", m$scale)
# Two values below 1 and one detect 3 (invented): the smallest identified left-censored set.
m <- survreg(Surv(c(1, 1, 3), c(FALSE, FALSE, TRUE), type = "left") ~ 1, dist = "lognormal",
             control = survreg.control(rel.tolerance = 1e-13))
put("tiny_lognormal_mu", unname(coef(m))); put("tiny_lognormal_sigma", m$scale)

df <- data.frame(key = names(out), value = sprintf("%.12g", unlist(out)))
write.csv(df, "identification_reference.csv", row.names = FALSE, quote = FALSE)
print(df)
