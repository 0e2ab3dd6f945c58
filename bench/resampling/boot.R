# R's boot on the benchmark case: median of the values in a one-column file, ordinary
# bootstrap with R replicates, percentile interval — the way boot's documentation shows it
# (a statistic function of (data, indices), then boot.ci).
#   Rscript bench/resampling/boot.R FILE R SEED
args <- commandArgs(trailingOnly = TRUE)
library(boot)
x <- scan(args[1], quiet = TRUE)
set.seed(as.integer(args[3]))
b <- boot(x, function(d, i) median(d[i]), R = as.integer(args[2]))
ci <- boot.ci(b, conf = 0.95, type = "perc")
cat(sprintf("se %.10g lower %.10g upper %.10g\n", sd(b$t), ci$percent[4], ci$percent[5]))
