# Reference for structured-parametric.test.ts: boot(..., sim = "parametric") from R's boot
# package, with models fitted by MASS::fitdistr (maximum likelihood), on data from R's
# datasets package. Prints `name : values` lines.
suppressMessages({ library(boot); library(MASS) })
emit <- function(name, x) cat(name, ":", sprintf("%.17g", as.numeric(x)), "\n")
set.seed(777)
R <- 20000
oz <- as.numeric(na.omit(airquality$Ozone))
f <- fitdistr(oz, "exponential")
b <- boot(oz, function(d) mean(d), R = R, sim = "parametric",
          ran.gen = function(d, mle) rexp(length(d), mle), mle = f$estimate[["rate"]])
emit("ozone", oz); emit("ozone_exp_mean", c(sd(b$t), f$estimate))
x <- as.numeric(nhtemp)
f <- fitdistr(x, "normal")
b <- boot(x, median, R = R, sim = "parametric",
          ran.gen = function(d, mle) rnorm(length(d), mle[1], mle[2]), mle = f$estimate)
emit("nhtemp", x); emit("nhtemp_norm_median", c(sd(b$t), f$estimate))
f <- fitdistr(rivers, "lognormal")
b <- boot(rivers, median, R = R, sim = "parametric",
          ran.gen = function(d, mle) rlnorm(length(d), mle[1], mle[2]), mle = f$estimate)
emit("rivers", rivers); emit("rivers_lnorm_median", c(sd(b$t), f$estimate))
br <- warpbreaks$breaks
f <- fitdistr(br, "poisson")
b <- boot(br, function(d) var(d), R = R, sim = "parametric",
          ran.gen = function(d, mle) rpois(length(d), mle), mle = f$estimate[["lambda"]])
emit("breaks", br); emit("breaks_pois_var", c(sd(b$t), f$estimate))
