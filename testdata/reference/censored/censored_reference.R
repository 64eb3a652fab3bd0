# Reference values for org.cupel.censored tests, from R's survival package.
# Run from this folder:  /usr/bin/Rscript censored_reference.R
# Writes survival_reference.csv (key,value). Data: manganese.csv is USEPA (2009) Unified Guidance
# Example 15-1 (ppb); mixed.csv is the same data with two <5 values turned into the interval (2, 5]
# and 106.3 replaced by the right-censored value >50 (invented, to exercise interval and right censoring).
library(survival)
out <- list()
put <- function(k, v) out[[k]] <<- v

mn <- read.csv("manganese.csv")
x <- mn$value; cen <- as.logical(mn$censored)
M <- 200  # flipping constant, larger than every value (Helsel 2012, ch. 6)
km <- survfit(Surv(M - x, !cen) ~ 1)
tab <- summary(km, rmean = "common")$table
put("km_mean", M - tab[["rmean"]])
put("km_mean_se", tab[["se(rmean)"]])
s <- summary(km)
for (i in seq_along(s$time)) {
  # F(x) = P(X <= x) at each detect: the flipped survival just before the flipped time
  put(sprintf("km_cdf_at_%g", M - s$time[i]), if (i == 1) 1 else s$surv[i - 1])
}
q <- quantile(km, c(0.25, 0.5, 0.75), conf.int = FALSE)
put("km_p25", M - q[["75"]]); put("km_p50", M - q[["50"]]); put("km_p75", M - q[["25"]])

ln <- survreg(Surv(x, !cen, type = "left") ~ 1, dist = "lognormal")
mu <- unname(coef(ln)); sg <- ln$scale
put("mle_lognormal_mu", mu); put("mle_lognormal_sigma", sg)
put("mle_lognormal_se_mu", sqrt(ln$var[1, 1])); put("mle_lognormal_se_logsigma", sqrt(ln$var[2, 2]))
put("mle_lognormal_loglik", ln$loglik[2])
put("mle_lognormal_mean", exp(mu + sg^2 / 2)); put("mle_lognormal_cv", sqrt(exp(sg^2) - 1))

# Profile likelihood 95% CI for the lognormal mean m: maximise over sigma with mu = log(m) - sigma^2/2.
z <- log(x)
ll <- function(mu, sg) sum(ifelse(cen, pnorm((z - mu) / sg, log.p = TRUE), dnorm(z, mu, sg, log = TRUE) - z))
prof <- function(m) optimize(function(s) ll(log(m) - s^2 / 2, s), c(0.05, 10), maximum = TRUE, tol = 1e-12)$objective
llmax <- ll(mu, sg)
crit <- qchisq(0.95, 1) / 2
mhat <- exp(mu + sg^2 / 2)
put("mle_lognormal_mean_profile_lower", uniroot(function(m) llmax - prof(m) - crit, c(mhat / 10, mhat), tol = 1e-12)$root)
put("mle_lognormal_mean_profile_upper", uniroot(function(m) llmax - prof(m) - crit, c(mhat, mhat * 50), tol = 1e-12)$root)

nm <- survreg(Surv(x, !cen, type = "left") ~ 1, dist = "gaussian")
put("mle_normal_mu", unname(coef(nm))); put("mle_normal_sigma", nm$scale)
put("mle_normal_se_mu", sqrt(nm$var[1, 1])); put("mle_normal_se_logsigma", sqrt(nm$var[2, 2]))

mx <- read.csv("mixed.csv")
lo <- ifelse(mx$lower <= 0, NA, mx$lower); hi <- ifelse(is.infinite(mx$upper), NA, mx$upper)
mi <- survreg(Surv(lo, hi, type = "interval2") ~ 1, dist = "lognormal")
put("mixed_lognormal_mu", unname(coef(mi))); put("mixed_lognormal_sigma", mi$scale)
put("mixed_lognormal_se_mu", sqrt(mi$var[1, 1])); put("mixed_lognormal_se_logsigma", sqrt(mi$var[2, 2]))
lo0 <- ifelse(mx$lower <= 0, -Inf, mx$lower); lo0 <- ifelse(is.infinite(lo0), NA, lo0)
mg <- survreg(Surv(lo0, hi, type = "interval2") ~ 1, dist = "gaussian")
put("mixed_normal_mu", unname(coef(mg))); put("mixed_normal_sigma", mg$scale)
put("mixed_normal_se_mu", sqrt(mg$var[1, 1])); put("mixed_normal_se_logsigma", sqrt(mg$var[2, 2]))

df <- data.frame(key = names(out), value = sprintf("%.12g", unlist(out)))
write.csv(df, "survival_reference.csv", row.names = FALSE, quote = FALSE)
print(df)
