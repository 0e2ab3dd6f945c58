# R's boot on the cluster-bootstrap benchmark case: whole clusters resampled with
# replacement, the usual way with boot (Davison & Hinkley 1997 §3.8): bootstrap the cluster
# ids and rebuild the data from the drawn clusters; percentile interval from boot.ci.
#   Rscript bench/structured/cluster.R FILE.csv R STATISTIC(mean|median) SEED
args <- commandArgs(trailingOnly = TRUE)
suppressMessages(library(boot))
d <- read.csv(args[1])
stat <- match.fun(args[3])
by_site <- split(d$reading, d$site)
set.seed(as.integer(args[4]))
t0 <- proc.time()[["elapsed"]]
b <- boot(seq_along(by_site), function(ids, i) stat(unlist(by_site[i], use.names = FALSE)), R = as.integer(args[2]))
ci <- boot.ci(b, conf = 0.95, type = "perc")
t1 <- proc.time()[["elapsed"]]
# inside: seconds spent in boot()/tsboot() and boot.ci(), without start-up and reading the data
cat(sprintf("se %.10g lower %.10g upper %.10g inside %.4f\n", sd(b$t), ci$percent[4], ci$percent[5], t1 - t0))
