# scipy.stats.bootstrap on the benchmark case: median, percentile interval, vectorised
# statistic (np.median with axis), as scipy's documentation recommends for speed.
#   /usr/bin/python3 bench/resampling/scipy_bench.py FILE B SEED [BATCH]
import sys
import numpy as np
from scipy.stats import bootstrap

x = np.loadtxt(sys.argv[1])
B = int(sys.argv[2])
rng = np.random.default_rng(int(sys.argv[3]))
batch = int(sys.argv[4]) if len(sys.argv) > 4 and sys.argv[4] != "none" else None
res = bootstrap((x,), np.median, n_resamples=B, batch=batch, vectorized=True, method="percentile",
                confidence_level=0.95, random_state=rng)
ci = res.confidence_interval
print(f"se {res.standard_error:.10g} lower {ci.low:.10g} upper {ci.high:.10g}")
