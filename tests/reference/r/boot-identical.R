# Recomputes a bootstrap in R's boot package from the resamples the Margin engine drew.
#   Rscript tests/reference/r/boot-identical.R DIR
# DIR holds: case.txt (key value lines: statistic, conf, stratified, studentized),
#   x.txt (and y.txt / g.txt as needed: one value per line), indices.txt (B lines of 1-based
#   row numbers, the engine's resamples in order).
# Prints key value lines: the replicates R computes on those resamples (t.txt in DIR), their
# SD, boot.ci's normal / basic / percentile / BCa (and studentized) end points, with jackknife
# influence values (L.txt; boot's own empinf values in Lboot.txt).
suppressMessages(library(boot))
dir <- commandArgs(trailingOnly = TRUE)[1]
kv <- read.table(file.path(dir, "case.txt"), stringsAsFactors = FALSE)
case <- setNames(as.list(kv$V2), kv$V1)
conf <- as.numeric(case$conf)
x <- scan(file.path(dir, "x.txt"), quiet = TRUE)
has <- function(f) file.exists(file.path(dir, f))
d <- data.frame(x = x)
if (has("y.txt")) d$y <- scan(file.path(dir, "y.txt"), quiet = TRUE)
if (has("g.txt")) d$g <- scan(file.path(dir, "g.txt"), what = "", quiet = TRUE)
idx <- as.matrix(read.table(file.path(dir, "indices.txt")))

theta <- switch(case$statistic,
  mean = function(d) mean(d$x),
  median = function(d) median(d$x),
  variance = function(d) var(d$x),
  correlation = function(d) cor(d$x, d$y),
  spearman = function(d) cor(d$x, d$y, method = "spearman"),
  slope = function(d) coef(lm(y ~ x, data = d))[[2]],
  "mean-difference" = function(d) mean(d$x[d$g == case$a]) - mean(d$x[d$g == case$b]),
  stop("unknown statistic"))

studentized <- identical(case$studentized, "yes")
# Jackknife variance of a resample, written out in R (the engine's inner SE to compare with).
jackvar <- function(dd) {
  m <- nrow(dd)
  tj <- sapply(seq_len(m), function(j) theta(dd[-j, , drop = FALSE]))
  (m - 1) / m * sum((tj - mean(tj))^2)
}
stat <- function(data, i) {
  dd <- data[i, , drop = FALSE]
  if (studentized) c(theta(dd), jackvar(dd)) else theta(dd)
}

strata <- if (has("g.txt")) factor(d$g) else rep(1, nrow(d))
b <- boot(d, stat, R = 2, strata = strata)
t <- t(apply(idx, 1, function(i) stat(d, i)))
if (!studentized) t <- matrix(t, ncol = 1)
b$t <- t
b$R <- nrow(t)
b$t0 <- stat(d, seq_len(nrow(d)))
write(formatC(t[, 1], digits = 17, format = "g"), file.path(dir, "t.txt"), ncolumns = 1)

thetaI <- function(data, i) theta(data[i, , drop = FALSE])
# boot's own influence values (empinf, "usual jackknife": (n_s - 1)(t0 - t_(j)), centred at t0)
Lboot <- if (has("g.txt")) {
  empinf(data = d, statistic = thetaI, strata = strata, type = "jack", stype = "i")
} else {
  empinf(data = d, statistic = thetaI, type = "jack", stype = "i")
}
# Efron's (1987; Efron & Tibshirani 1993 eq. 14.15) jackknife influence, centred at the mean of
# the leave-one-out values, written out here: L_j = (n_s - 1)(mean_s(t_(.)) - t_(j)).
L <- numeric(nrow(d))
for (s in unique(strata)) {
  gp <- which(strata == s)
  tj <- sapply(gp, function(j) theta(d[-j, , drop = FALSE]))
  L[gp] <- (length(gp) - 1) * (mean(tj) - tj)
}
write(formatC(L, digits = 17, format = "g"), file.path(dir, "L.txt"), ncolumns = 1)
write(formatC(Lboot, digits = 17, format = "g"), file.path(dir, "Lboot.txt"), ncolumns = 1)

types <- if (identical(case$bca, "no")) c("norm", "basic", "perc") else c("norm", "basic", "perc", "bca")
ci <- boot.ci(b, conf = conf, type = types, L = L, index = 1)
out <- function(k, v) cat(k, formatC(v, digits = 17, format = "g"), "\n")
out("t0", b$t0[1])
out("sd", sd(t[, 1]))
out("ties", sum(t[, 1] == b$t0[1]))
out("normal.lower", ci$normal[2]); out("normal.upper", ci$normal[3])
out("basic.lower", ci$basic[4]); out("basic.upper", ci$basic[5])
out("percentile.lower", ci$percent[4]); out("percentile.upper", ci$percent[5])
if (!is.null(ci$bca)) { out("bca.lower", ci$bca[4]); out("bca.upper", ci$bca[5]) }
out("a", sum(L^3) / (6 * sum(L^2)^1.5))
if (studentized) {
  s <- boot.ci(b, conf = conf, type = "stud", var.t0 = b$t0[2], index = c(1, 2))
  out("studentized.lower", s$student[4]); out("studentized.upper", s$student[5])
  out("se0", sqrt(b$t0[2]))
}
