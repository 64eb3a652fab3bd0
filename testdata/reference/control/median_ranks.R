# Ranks of the distribution-free 95 % interval for a median [x(r), x(n-r+1)] (sign-test interval,
# Conover 1999, Practical Nonparametric Statistics, 3.2): r is the largest rank with
# P(B <= r - 1) <= 0.025, B ~ Binomial(n, 1/2); coverage 1 - 2 P(B <= r - 1). n = 6..60, 100, 500, 2000, 20000.
# Run from this folder: /usr/bin/Rscript median_ranks.R > median_ranks.csv
ns <- c(6:60, 100, 500, 2000, 20000)
r <- sapply(ns, function(n) max(which(pbinom(0:(n - 1), n, 0.5) <= 0.025)))
out <- data.frame(n = ns, r = r, coverage = 1 - 2 * pbinom(r - 1, ns, 0.5))
write.csv(out, row.names = FALSE, quote = FALSE)
