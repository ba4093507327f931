#!/usr/bin/python3
"""Outside check of Pitchloop's match-to-match variation model (model/variation.h) against
Debian's scipy (python3-scipy 1.10).

Usage:
    /usr/bin/python3 tests/python/variation_check.py --driver PATH_TO_stats_driver

1. Design effects, exactly: for a beta-binomial with n trials, scipy.stats.betabinom(n, a, b)
   has variance n·p(1 − p)·(1 + (n − 1)·rho) with rho = 1/(a + b + 1); for a negative binomial
   with mean mu and dispersion phi (scipy.stats.nbinom(r = 1/phi, p = r/(r + mu))) the variance
   is mu·(1 + phi·mu). Pitchloop's designEffect must equal scipy's var / (binomial or Poisson
   var) to 1e-9.
1b. The single-match tail P(X >= k) or P(X <= k) of a per-match count: scipy.stats.nbinom
   (or poisson when phi = 0) sf / cdf, relative 1e-9.
2. The estimators, by simulation: seasons of 30 zones × 200 matches drawn with scipy.stats.
   betabinom / nbinom (seeded numpy generator) at known rho / phi; the raw moment estimate
   (no prior) must come within 15 % (relative) or 0.04 of the truth — a count's phi at mean 2
   has a sampling SD of about 0.016 with 6,000 matches — and be near 0 (|est| < 0.015) when
   there is no variation.
"""
import argparse
import json
import subprocess
import sys

import numpy as np
from scipy import stats


def ask(driver, requests):
    text = "\n".join(json.dumps(r) for r in requests) + "\n"
    out = subprocess.run([driver], input=text, capture_output=True, text=True, check=True).stdout
    replies = [json.loads(line) for line in out.splitlines()]
    for r in replies:
        if "error" in r:
            raise SystemExit("driver error: %s" % r)
    return [r["result"] for r in replies]


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--driver", required=True)
    driver = ap.parse_args().driver
    failures = 0

    # 1. design effects
    rng = np.random.default_rng(20261204)
    cases, expected = [], []
    for _ in range(200):
        n = int(rng.integers(1, 120))
        a, b = rng.uniform(0.5, 40, 2)
        rho = 1 / (a + b + 1)
        p = a / (a + b)
        cases.append({"fn": "designEffect", "args": ["rate", rho, n, p]})
        expected.append(stats.betabinom(n, a, b).var() / (n * p * (1 - p)))
    for _ in range(200):
        mu = float(rng.uniform(0.1, 15))
        phi = float(rng.uniform(0.01, 2))
        r = 1 / phi
        cases.append({"fn": "designEffect", "args": ["count", phi, 1, mu]})
        expected.append(stats.nbinom(r, r / (r + mu)).var() / mu)
    got = ask(driver, cases)
    for c, g, e in zip(cases, got, expected):
        if abs(g - e) > 1e-9 * abs(e):
            failures += 1
            print("designEffect %s: got %r, scipy %r" % (c["args"], g, e))
    print("design effects: %d cases against scipy betabinom/nbinom variances" % len(cases))

    # 1b. the single-match tail against scipy.stats.nbinom / poisson
    cases, expected = [], []
    for _ in range(300):
        mu = float(rng.uniform(0.2, 12))
        phi = float(rng.choice([0.0, rng.uniform(0.01, 2)]))
        k = int(rng.integers(0, 40))
        upper = bool(rng.integers(0, 2))
        cases.append({"fn": "countTail", "args": [k, mu, phi, upper]})
        if phi == 0:
            d = stats.poisson(mu)
        else:
            r = 1 / phi
            d = stats.nbinom(r, r / (r + mu))
        expected.append(d.sf(k - 1) if upper else d.cdf(k))
    got = ask(driver, cases)
    for c, g, e in zip(cases, got, expected):
        if abs(g - e) > 1e-9 * max(abs(e), 1e-300) + 1e-15:
            failures += 1
            print("countTail %s: got %r, scipy %r" % (c["args"], g, e))
    print("single-match tails: %d cases against scipy nbinom/poisson" % len(cases))

    # 2. estimators by simulation
    def rate_season(rho, p, lam, seed):
        g = np.random.default_rng(seed)
        series = []
        for _ in range(30):
            n = g.poisson(lam, 200)
            if rho > 0:
                ab = 1 / rho - 1
                x = stats.betabinom.rvs(n, p * ab, (1 - p) * ab, random_state=g)
            else:
                x = g.binomial(n, p)
            series.append([[int(a), int(b)] for a, b in zip(x, n)])
        return series

    def count_season(phi, mu, seed):
        g = np.random.default_rng(seed)
        series = []
        for _ in range(30):
            if phi > 0:
                r = 1 / phi
                c = stats.nbinom.rvs(r, r / (r + mu), size=200, random_state=g)
            else:
                c = g.poisson(mu, 200)
            series.append([[int(v), 1] for v in c])
        return series

    reqs, truth = [], []
    for rho, p, lam in [(0.02, 0.45, 15), (0.05, 0.3, 8), (0.1, 0.6, 30), (0.0, 0.45, 15)]:
        reqs.append({"fn": "rateDispersion", "args": [rate_season(rho, p, lam, 7), 200]})
        truth.append(("rho", rho))
    for phi, mu in [(0.1, 2.0), (0.3, 5.0), (0.8, 1.0), (0.0, 3.0)]:
        reqs.append({"fn": "countDispersion", "args": [count_season(phi, mu, 8), 200]})
        truth.append(("phi", phi))
    for (name, t), est in zip(truth, ask(driver, reqs)):
        ok = abs(est) < 0.015 if t == 0 else abs(est - t) <= max(0.15 * t, 0.04)
        print("%s true %.3f estimated %.4f %s" % (name, t, est, "ok" if ok else "FAIL"))
        failures += not ok

    if failures:
        print("%d failures" % failures)
        return 1
    print("all variation checks agree with scipy")
    return 0


if __name__ == "__main__":
    sys.exit(main())
