# Reference for structured-residual.test.ts: residual resampling for the least-squares
# slope on R's cars data, written with boot() on the residuals as in Davison & Hinkley
# (1997) §6.2.3 (modified residuals e / sqrt(1 - h), centred), and case resampling.
suppressMessages(library(boot))
emit <- function(name, x) cat(name, ":", sprintf("%.17g", as.numeric(x)), "\n")
set.seed(31)
R <- 20000
fit <- lm(dist ~ speed, data = cars)
h <- hatvalues(fit)
r <- residuals(fit) / sqrt(1 - h); r <- r - mean(r)
yhat <- fitted(fit)
slope <- function(y) coef(lm.fit(cbind(1, cars$speed), y))[2]
b <- boot(r, function(e, i) slope(yhat + e[i]), R = R)
emit("speed", cars$speed); emit("dist", cars$dist)
emit("cars_residual_modified", c(sd(b$t), coef(fit)))
e <- residuals(fit) - mean(residuals(fit))
b <- boot(e, function(e, i) slope(yhat + e[i]), R = R)
emit("cars_residual_raw", sd(b$t))
b <- boot(cars, function(d, i) coef(lm.fit(cbind(1, d$speed[i]), d$dist[i]))[2], R = R)
emit("cars_cases", sd(b$t))
# closed forms: Var*(b*) = mean(pool^2) / Sxx
sxx <- sum((cars$speed - mean(cars$speed))^2)
emit("cars_closed", c(sqrt(mean(r^2) / sxx), sqrt(mean(e^2) / sxx)))
