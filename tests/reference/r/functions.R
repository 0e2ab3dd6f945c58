# Reference values from base R for the engine's building blocks (key value lines):
# qnorm / pnorm, quantile type 7 on the faithful eruptions, median, mad, IQR, var, the trimmed
# mean, cor (pearson / spearman) and the lm slope on cars.
#   Rscript tests/reference/r/functions.R
out <- function(k, v) cat(k, formatC(v, digits = 17, format = "g"), "\n")
for (p in c(1e-12, 0.001, 0.025, 0.05, 0.3, 0.5, 0.9, 0.975, 0.999999)) out(paste0("qnorm.", p), qnorm(p))
for (z in c(-7, -3, -1.96, -0.5, 0, 0.7, 1.645, 2.5, 6)) out(paste0("pnorm.", z), pnorm(z))
e <- datasets::faithful$eruptions
for (p in c(0, 0.1, 0.25, 0.5, 0.75, 0.93, 1)) out(paste0("quantile.", p), quantile(e, p, type = 7, names = FALSE))
out("median", median(e)); out("mad", mad(e)); out("iqr", IQR(e)); out("var", var(e)); out("sd", sd(e))
out("trim.0.1", mean(e, trim = 0.1)); out("trim.0.25", mean(e, trim = 0.25))
cars <- datasets::cars
out("cor.pearson", cor(cars$speed, cars$dist)); out("cor.spearman", cor(cars$speed, cars$dist, method = "spearman"))
out("lm.slope", coef(lm(dist ~ speed, cars))[[2]]); out("lm.intercept", coef(lm(dist ~ speed, cars))[[1]])
