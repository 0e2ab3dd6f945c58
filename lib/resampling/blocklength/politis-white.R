# Independent transcription in R of the Politis & White (2004) block-length rule with the
# Patton, Politis & White (2009) correction, built on R's own stats::acf. Used by
# blocklength.test.ts to cross-check the TypeScript (m-hat, M, and both block lengths).
# Conventions as documented in optimal-block-length.ts: c = 2, K_N = max(5, ceiling(sqrt(log10 n))),
# m_max = ceiling(sqrt(n)) + K_N, m-hat = smallest positive m with lags m+1..m+K_N insignificant.
pw_block_length <- function(x, c = 2) {
  n <- length(x)
  KN <- max(5, ceiling(sqrt(log10(n))))
  mmax <- min(ceiling(sqrt(n)) + KN, n - 1)
  rho <- acf(x, lag.max = mmax, plot = FALSE)$acf[-1]
  band <- c * sqrt(log10(n) / n)
  insig <- abs(rho) < band
  mhat <- NA
  for (m in seq_len(mmax - KN)) if (all(insig[(m + 1):(m + KN)])) { mhat <- m; break }
  if (is.na(mhat)) { sig <- which(!insig); mhat <- if (length(sig)) max(sig) else 1 }
  M <- min(2 * mhat, mmax)
  lam <- function(s) ifelse(abs(s) <= 0.5, 1, ifelse(abs(s) <= 1, 2 * (1 - abs(s)), 0))
  k <- -M:M
  R <- acf(x, lag.max = M, type = "covariance", plot = FALSE)$acf[abs(k) + 1]
  G <- sum(lam(k / M) * abs(k) * R)
  g0 <- sum(lam(k / M) * R)
  c(mhat = mhat, M = M,
    stationary = (2 * G^2 / (2 * g0^2))^(1/3) * n^(1/3),
    circular = (2 * G^2 / ((4/3) * g0^2))^(1/3) * n^(1/3))
}
