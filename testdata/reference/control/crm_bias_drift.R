# Reference values for org.cupel.control.crm bias and drift tests.
# Run from this folder: /usr/bin/Rscript crm_bias_drift.R > crm_bias_drift.csv
# Invented CRM series: certified 2.50 g/t, SD 0.10 g/t, 12 results on the given days.
certified <- 2.50
sd_cert <- 0.10
x <- c(2.48, 2.55, 2.61, 2.43, 2.58, 2.66, 2.52, 2.71, 2.57, 2.63, 2.69, 2.60)
day <- c(0, 7, 14, 21, 28, 35, 42, 49, 56, 63, 70, 77)
b <- 100 * (x - certified) / certified
tt <- t.test(b, conf.level = 0.95)
# Distribution-free CI for the median (sign-test interval, Conover 1999 3.2):
# largest r with P(B <= r-1) <= 0.025, B ~ Binomial(n, 1/2); interval [x(r), x(n-r+1)].
n <- length(b)
r <- max(which(pbinom(0:(n - 1), n, 0.5) <= 0.025))  # index k+1 where P(B <= k) <= 0.025, so r = k+1
s <- sort(b)
z <- (x - certified) / sd_cert
fit <- lm(z ~ day)
ci <- confint(fit, level = 0.95)
# Bias vs grade across CRMs: mean bias % of four CRMs against certified value.
cert4 <- c(0.52, 1.21, 2.50, 6.84)
bias4 <- c(0.8, 1.9, 3.6, 6.1)
fit4 <- lm(bias4 ~ cert4)
ci4 <- confint(fit4, level = 0.95)
out <- data.frame(
  key = c("mean_bias_pct", "mean_low_pct", "mean_high_pct", "median_bias_pct", "median_low_pct",
          "median_high_pct", "median_coverage", "slope", "slope_low", "slope_high", "intercept", "slope_p",
          "r_squared", "grade_slope", "grade_slope_low", "grade_slope_high", "grade_intercept", "grade_p"),
  value = c(mean(b), tt$conf.int[1], tt$conf.int[2], median(b), s[r], s[n - r + 1],
            1 - 2 * pbinom(r - 1, n, 0.5),
            coef(fit)[2], ci[2, 1], ci[2, 2], coef(fit)[1], summary(fit)$coefficients[2, 4],
            summary(fit)$r.squared,
            coef(fit4)[2], ci4[2, 1], ci4[2, 2], coef(fit4)[1], summary(fit4)$coefficients[2, 4]))
write.csv(out, row.names = FALSE, quote = FALSE)
