# Reference for structured-blocks.test.ts: block bootstraps of series from R's datasets
# package with R's boot::tsboot (Canty & Ripley, boot package; Davison & Hinkley 1997 §8.2).
# tsboot's defaults: sim = "fixed" uses end correction (circular blocks); sim = "geom" has
# block lengths 1 + rgeom(1/l) and wraps around. Prints `name : values` lines.
suppressMessages(library(boot))
emit <- function(name, x) cat(name, ":", sprintf("%.17g", as.numeric(x)), "\n")
set.seed(4242)
R <- 20000
b <- tsboot(as.numeric(lynx), mean, R = R, l = 10, sim = "fixed")
emit("lynx", lynx); emit("lynx_fixed_10", c(sd(b$t), mean(b$t)))
b <- tsboot(as.numeric(Nile), mean, R = R, l = 8, sim = "geom")
emit("nile", Nile); emit("nile_geom_8", c(sd(b$t), mean(b$t)))
b <- tsboot(as.numeric(LakeHuron), median, R = R, l = 6, sim = "fixed")
emit("huron", LakeHuron); emit("huron_fixed_6_median", sd(b$t))
# the ordinary bootstrap of the same mean, for contrast
b <- boot(as.numeric(lynx), function(d, i) mean(d[i]), R = R)
emit("lynx_ordinary", sd(b$t))
# identical resamples: tsboot's own index arrays (boot.array), to replay in the engine
set.seed(11)
b <- tsboot(as.numeric(LakeHuron), median, R = 200, l = 6, sim = "fixed")
a <- boot.array(b, indices = TRUE)
emit("huron_idx", t(a) - 1)  # 0-based, resample after resample
emit("huron_t", b$t)
