# Reference detection limits from blank replicates, base R only.
# Run from this folder:  /usr/bin/Rscript detection_limits.R
# Writes detection_limits.csv (key,value).
# blanks_a: ten invented blank results, all numerical (mean above zero); blanks_b: seven invented results with a
# negative mean (40 CFR 136 App. B Rev. 2 puts zero in place of a negative mean in MDL_b).
out <- list()
put <- function(k, v) out[[k]] <<- v
delta <- function(nu) uniroot(function(d) pt(qt(0.95, nu), nu, ncp = d) - 0.05, c(0, 50), tol = 1e-13)$root

for (nu in c(1, 2, 4, 6, 9, 19, 29, 99)) {
  put(sprintf("t95_%d", nu), qt(0.95, nu)); put(sprintf("t99_%d", nu), qt(0.99, nu))
  put(sprintf("delta_%d", nu), delta(nu))
}
limits <- function(prefix, x) {
  n <- length(x); m <- mean(x); s <- sd(x); s0 <- s * sqrt(1 + 1 / n)
  put(paste0(prefix, "_mean"), m); put(paste0(prefix, "_sd"), s)
  put(paste0(prefix, "_three_s"), 3 * s)
  put(paste0(prefix, "_lc_t"), qt(0.95, n - 1) * s0)
  put(paste0(prefix, "_ld_t"), delta(n - 1) * s0)
  put(paste0(prefix, "_lc_z"), qnorm(0.95) * s)
  put(paste0(prefix, "_ld_z"), 2 * qnorm(0.95) * s)
  put(paste0(prefix, "_mdl_b"), max(m, 0) + qt(0.99, n - 1) * s)
  put(paste0(prefix, "_mdl_s"), qt(0.99, n - 1) * s)
}
limits("blanks_a", c(0.0012, 0.0031, -0.0008, 0.0020, 0.0045, 0.0009, 0.0027, 0.0016, 0.0038, 0.0004))
limits("blanks_b", c(-0.0012, 0.0005, -0.0021, 0.0003, -0.0009, -0.0015, 0.0002))

# The t-based L_C as a prediction limit: the share of new blanks above mean + L_C, by simulation (seed 1).
set.seed(1)
n <- 7; reps <- 200000
hits <- replicate(reps, { x <- rnorm(n); y <- rnorm(1); y - mean(x) > qt(0.95, n - 1) * sd(x) * sqrt(1 + 1 / n) })
put("prediction_exceedance_n7", mean(hits))

df <- data.frame(key = names(out), value = sprintf("%.12g", unlist(out)))
write.csv(df, "detection_limits.csv", row.names = FALSE, quote = FALSE)
print(df)
