# Reference for structured-cluster.test.ts. R's boot package has no cluster option; the
# usual way (Davison & Hinkley 1997 §3.8) is to bootstrap the cluster ids and rebuild the
# data from the drawn clusters, which is what this does on R's ChickWeight (50 chicks,
# weights on up to 12 days) and, for boot(..., strata =), on PlantGrowth.
suppressMessages(library(boot))
emit <- function(name, x) cat(name, ":", sprintf("%.17g", as.numeric(x)), "\n")
set.seed(99)
R <- 20000
cw <- ChickWeight
by_chick <- split(cw$weight, as.character(cw$Chick))
b <- boot(seq_along(by_chick), function(ids, i) mean(unlist(by_chick[i], use.names = FALSE)), R = R)
emit("cw_weight", cw$weight); cat("cw_chick :", as.character(cw$Chick), "\n")
emit("cw_cluster_mean", sd(b$t))
b <- boot(cw$weight, function(d, i) mean(d[i]), R = R)
emit("cw_ordinary_mean", sd(b$t))
# two-stage: clusters, then rows within each drawn cluster
b <- boot(seq_along(by_chick), function(ids, i) mean(unlist(lapply(by_chick[i], function(w) w[sample.int(length(w), replace = TRUE)]), use.names = FALSE)), R = R)
emit("cw_two_stage_mean", sd(b$t))
# boot(..., strata =): difference of means of ctrl and trt1, rows resampled within groups
pg <- subset(PlantGrowth, group %in% c("ctrl", "trt1"))
g <- as.integer(pg$group == "ctrl")
b <- boot(pg$weight, function(d, i) mean(d[i][g[i] == 1]) - mean(d[i][g[i] == 0]), R = R, strata = g)
emit("pg_weight", pg$weight); cat("pg_group :", as.character(pg$group), "\n")
emit("pg_strata_diff", c(sd(b$t), sqrt(var(pg$weight[g == 1]) * 9 / 100 + var(pg$weight[g == 0]) * 9 / 100)))
# identical resamples: boot's own index array over the chick ids (boot.array), to replay
set.seed(12)
b <- boot(seq_along(by_chick), function(ids, i) median(unlist(by_chick[i], use.names = FALSE)), R = 200)
emit("cw_cluster_of_row", match(as.character(cw$Chick), names(by_chick)) - 1)
emit("cw_idx", t(boot.array(b, indices = TRUE)) - 1)
emit("cw_median_t", b$t)
