# R's boot with its own random numbers (set.seed(SEED)), for comparisons within Monte Carlo error.
#   Rscript tests/reference/r/boot-own.R DATASET COLUMN STATISTIC R SEED CONF
suppressMessages(library(boot))
a <- commandArgs(trailingOnly = TRUE)
d <- get(a[1], envir = as.environment("package:datasets"))
x <- if (is.data.frame(d)) d[[a[2]]] else as.numeric(d)
x <- x[is.finite(x)]
f <- switch(a[3], mean = function(d, i) mean(d[i]), median = function(d, i) median(d[i]), sd = function(d, i) sd(d[i]))
set.seed(as.integer(a[5]))
b <- boot(x, f, R = as.integer(a[4]))
ci <- boot.ci(b, conf = as.numeric(a[6]), type = c("norm", "perc"))
out <- function(k, v) cat(k, formatC(v, digits = 17, format = "g"), "\n")
out("se", sd(b$t[, 1])); out("bias", mean(b$t[, 1]) - b$t0)
out("percentile.lower", ci$percent[4]); out("percentile.upper", ci$percent[5])
out("normal.lower", ci$normal[2]); out("normal.upper", ci$normal[3])
