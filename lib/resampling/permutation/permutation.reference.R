# Exact two-group permutation p-values by full enumeration with utils::combn, used by
# permutation.test.ts as the outside reference. For each split of the pooled values into
# groups of the original sizes, the statistic is recomputed; counts use the same rule as
# the engine (two-sided |T*| >= |T_obs|, with a relative tie tolerance of
# sqrt(.Machine$double.eps), the default tolerance of all.equal).
count_extreme <- function(t, obs) {
  tol <- sqrt(.Machine$double.eps) * abs(obs)
  c(total = length(t),
    greater = sum(t >= obs - tol), less = sum(t <= obs + tol),
    two_sided = sum(abs(t) >= abs(obs) - tol),
    # the same count without any tolerance: smaller when rounding breaks exact ties
    strict_two_sided = sum(abs(t) >= abs(obs)))
}
# Any statistic, one call per split (slow: use for up to ~200,000 splits).
perm_counts <- function(a, b, stat) {
  pooled <- c(a, b); n1 <- length(a)
  splits <- combn(length(pooled), n1)
  count_extreme(apply(splits, 2, function(i) stat(pooled[i], pooled[-i])), stat(a, b))
}
# Difference of means, vectorised over splits with colSums.
perm_counts_mean <- function(a, b) {
  pooled <- c(a, b); n1 <- length(a); n2 <- length(b)
  sa <- colSums(matrix(pooled[combn(length(pooled), n1)], nrow = n1))
  count_extreme(sa / n1 - (sum(pooled) - sa) / n2, mean(a) - mean(b))
}
median_diff <- function(a, b) median(a) - median(b)
# Difference of medians, vectorised: the values of each split's two groups as matrix
# columns, sorted within columns by order(col, value), medians from the middle rows.
perm_counts_median <- function(a, b) {
  pooled <- c(a, b); n1 <- length(a); n2 <- length(b); N <- n1 + n2
  splits <- combn(N, n1); S <- ncol(splits)
  inA <- matrix(FALSE, N, S)
  inA[cbind(as.vector(splits), rep(seq_len(S), each = n1))] <- TRUE
  vals <- matrix(pooled, N, S)
  col_median <- function(m) {
    s <- matrix(m[order(col(m), m)], nrow = nrow(m)); k <- nrow(m)
    if (k %% 2) s[(k + 1) / 2, ] else (s[k / 2, ] + s[k / 2 + 1, ]) / 2
  }
  ma <- col_median(matrix(vals[inA], nrow = n1))
  mb <- col_median(matrix(vals[!inA], nrow = n2))
  count_extreme(ma - mb, median_diff(a, b))
}
