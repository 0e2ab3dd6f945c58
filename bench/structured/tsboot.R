# R's boot::tsboot on the block-bootstrap benchmark case: mean of a series in a one-column
# file, fixed-length circular blocks (sim = "fixed", end correction on: tsboot's default),
# percentile interval from boot.ci.
#   Rscript bench/structured/tsboot.R FILE R BLOCKLENGTH SEED
args <- commandArgs(trailingOnly = TRUE)
suppressMessages(library(boot))
x <- scan(args[1], quiet = TRUE)
set.seed(as.integer(args[4]))
t0 <- proc.time()[["elapsed"]]
b <- tsboot(x, mean, R = as.integer(args[2]), l = as.integer(args[3]), sim = "fixed")
ci <- boot.ci(b, conf = 0.95, type = "perc")
t1 <- proc.time()[["elapsed"]]
# inside: seconds spent in boot()/tsboot() and boot.ci(), without start-up and reading the data
cat(sprintf("se %.10g lower %.10g upper %.10g inside %.4f\n", sd(b$t), ci$percent[4], ci$percent[5], t1 - t0))
