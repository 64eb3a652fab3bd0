# Reference values for the Cupel recovery tests, computed with base R (stats package).
# Run from the repository root:
#   /usr/bin/Rscript testdata/reference/recovery/recovery_reference.R
# Writes ptukey.csv, qtukey.csv, power.csv, holm.csv, welch.csv, reconciliation.csv, noncentral_t.csv and
# games_howell.csv
# beside this script.
out <- "testdata/reference/recovery"
options(digits = 15)

# Studentized range distribution: ptukey(q, nmeans, df) and qtukey(p, nmeans, df).
# df = 2 is left out: there R's own values stray from the exact two-mean identity
# P(Q <= q; 2, df) = 2 pt(q / sqrt(2), df) - 1 by up to 1.1e-4 (ptukey) and 0.13 (qtukey at p = 0.99),
# so they cannot serve as a reference; Cupel's test checks df = 2 against that identity instead.
grid <- expand.grid(q = c(0.5, 1.5, 2.5, 3.5, 5, 8), k = c(2, 3, 4, 6, 10), df = c(3, 5, 10, 30, Inf))
grid$p <- mapply(function(q, k, df) ptukey(q, k, df), grid$q, grid$k, grid$df)
write.csv(grid, file.path(out, "ptukey.csv"), row.names = FALSE)
qgrid <- expand.grid(p = c(0.9, 0.95, 0.99), k = c(2, 3, 5, 8), df = c(4, 10, 60))
qgrid$q <- mapply(function(p, k, df) qtukey(p, k, df), qgrid$p, qgrid$k, qgrid$df)
write.csv(qgrid, file.path(out, "qtukey.csv"), row.names = FALSE)

# Two-sample two-sided power (power.t.test, strict = FALSE as R's default: one tail counted).
pw <- expand.grid(n = c(2, 3, 5, 10, 20), delta = c(0.5, 1, 2, 3), sd = 1)
pw$power <- mapply(function(n, d) power.t.test(n = n, delta = d, sd = 1, sig.level = 0.05)$power, pw$n, pw$delta)
pw$kind <- "power"
nn <- data.frame(n = NA, delta = c(1, 1, 2, 0.5), sd = 1, power = c(0.9, 0.8, 0.8, 0.8), kind = "n")
nn$n <- mapply(function(d, p) power.t.test(delta = d, sd = 1, power = p, sig.level = 0.05)$n, nn$delta, nn$power)
write.csv(rbind(pw, nn), file.path(out, "power.csv"), row.names = FALSE)

# Holm step-down adjustment.
p <- c(0.01, 0.04, 0.03, 0.005)
write.csv(data.frame(p = p, holm = p.adjust(p, "holm")), file.path(out, "holm.csv"), row.names = FALSE)

# Welch t from summary statistics (AUTO83B of NIST/SEMATECH e-Handbook 1.3.5.3), by the formula R's t.test uses.
n1 <- 249; m1 <- 20.14458; s1 <- 6.41470; n2 <- 79; m2 <- 30.48101; s2 <- 6.10771
se <- sqrt(s1^2 / n1 + s2^2 / n2)
t <- (m1 - m2) / se
nu <- se^4 / ((s1^2 / n1)^2 / (n1 - 1) + (s2^2 / n2)^2 / (n2 - 1))
# And t.test on two small invented samples, for the p-value and the CI.
x <- c(99.12, 98.85, 99.30); y <- c(98.40, 98.95)
tt <- t.test(x, y, var.equal = FALSE)
write.csv(data.frame(case = c("AUTO83B", "small"), t = c(t, tt$statistic), df = c(nu, tt$parameter),
                     p = c(2 * pt(-abs(t), nu), tt$p.value), lower = c(NA, tt$conf.int[1]),
                     upper = c(NA, tt$conf.int[2])), file.path(out, "welch.csv"), row.names = FALSE)

# Metal-balance reconciliation by weighted least squares, solved a different way from Cupel's
# closed form: substitute the constraint (metal in charge = sum of metal in products) and fit the
# free product metals by weighted regression (lm), then the chi-square of the weighted residuals.
x0 <- c(0.0863, 0.0851, 0.00034); v <- c(1.2e-6, 0.8e-6, 1.1e-9)
X <- rbind(c(1, 1), c(1, 0), c(0, 1))
fit <- lm(x0 ~ X - 1, weights = 1 / v)
adj <- as.vector(X %*% coef(fit))
chi2 <- sum((x0 - adj)^2 / v)
write.csv(data.frame(variable = c("charge", "button", "slag"), measured = x0, variance = v, adjusted = adj,
                     chi2 = chi2, p = pchisq(chi2, 1, lower.tail = FALSE)),
          file.path(out, "reconciliation.csv"), row.names = FALSE)

# Noncentral t distribution function pt(t, df, ncp).
nct <- expand.grid(t = c(-1, 0.5, 2, 2.1009, 4), df = c(2, 5, 38), ncp = c(0, 1, 3.162278))
nct$p <- mapply(function(t, df, ncp) pt(t, df, ncp), nct$t, nct$df, nct$ncp)
write.csv(nct, file.path(out, "noncentral_t.csv"), row.names = FALSE)

# Games-Howell for one pair: Welch t and df from t.test, then the studentized range with k means,
# p = ptukey(sqrt(2) |t|, k, df, lower.tail = FALSE), CI half-width qtukey(0.95, k, df) / sqrt(2) * SE.
gh_cases <- list(list(a = c(97.1, 96.4, 97.9, 96.9), b = c(96.8, 97.5, 96.1, 95.2, 96.0), k = 3),
                 list(a = c(92.6, 91.5, 92.5, 93.0), b = c(98.2, 97.9, 98.9, 98.4), k = 4))
gh <- do.call(rbind, lapply(gh_cases, function(cs) {
  tt <- t.test(cs$a, cs$b, var.equal = FALSE)
  se <- unname((mean(cs$a) - mean(cs$b)) / tt$statistic)
  half <- qtukey(0.95, cs$k, tt$parameter) / sqrt(2) * se
  data.frame(a = paste(cs$a, collapse = " "), b = paste(cs$b, collapse = " "), k = cs$k,
             t = unname(tt$statistic), df = unname(tt$parameter),
             p = ptukey(sqrt(2) * abs(unname(tt$statistic)), cs$k, unname(tt$parameter), lower.tail = FALSE),
             half_width = half)
}))
write.csv(gh, file.path(out, "games_howell.csv"), row.names = FALSE)
