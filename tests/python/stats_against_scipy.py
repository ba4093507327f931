#!/usr/bin/python3
"""Outside check of Pitchloop's statistics module against Debian's scipy and statsmodels.

Usage:
    /usr/bin/python3 tests/python/stats_against_scipy.py --driver PATH_TO_stats_driver

What it does: generates a few hundred random inputs with a fixed seed, sends them to the
driver (tests/stats_driver.cpp: one JSON request per line on stdin, one JSON reply per line
on stdout), and compares every reply with the same quantity from Debian's python3-scipy
(1.10) or python3-statsmodels (0.13):

    wilson, wilsonCC, clopperPearson   scipy binomtest(x, n).proportion_ci('wilson' |
                                       'wilsoncc' | 'exact')
    jeffreys                           statsmodels proportion_confint(method='jeffreys')
    garwood                            scipy chi2.ppf (Garwood's chi-square limits)
    probRateBelow / Above              scipy beta.cdf / beta.sf of Beta(x + 1/2, n - x + 1/2)
    probPoissonRateBelow / Above       scipy gamma.cdf / gamma.sf of Gamma(c + 1/2, scale 1/e)
    betaSummary                        scipy beta.mean, beta.std, beta.interval
    newcombeDifference                 statsmodels confint_proportions_2indep(method='newcomb')
    fisherExact                        scipy fisher_exact, alternatives less/greater/two-sided
    poissonConditionalTest             scipy binomtest(c1, c1 + c2, e1 / (e1 + e2))
    benjaminiHochberg, bhReject        statsmodels multipletests(method='fdr_bh')
    probRateImproved                   scipy.integrate.quad of beta.pdf(p; a2, b2) *
                                       beta.cdf(p; a1, b1) (or beta.sf for "lower is better"),
                                       p in [0, 1/2] and u = 1 - p in [0, 1/2]
    probPoissonRateImproved            scipy.integrate.quad of gamma.pdf * gamma.cdf / sf
    ewmaSeries                         pandas Series([start] + x).ewm(alpha=lambda,
                                       adjust=False).mean() (the recursion seeded with start)
    argument validation                bad arguments must give an error reply

Tolerances. Relative 1e-9 (plus 1e-14 absolute for values that should be 0) where both sides
are exact computations of the same definition. Looser or different, and why:
  * jeffreys: Pitchloop sets the lower limit to 0 when x = 0 and the upper to 1 when x = n
    (Brown, Cai & DasGupta 2001); statsmodels does not, so at those boundaries only the
    other limit is compared and the boundary limit must be exactly 0 or 1.
  * fisherExact two-sided: both sum the tables no more probable than the observed one, with a
    relative tie tolerance of 1e-7 in Pitchloop (R's fisher.test) and 1e-14 in scipy. They
    differ only when some table's probability lies within 1e-7 but not 1e-14 of the observed
    one; such cases are detected (with scipy's hypergeom.pmf) and compared with the sum
    scipy's pmf gives under the 1e-7 rule, and reported as "tie rule".
  * probRateImproved, probPoissonRateImproved: absolute 1e-9, the accuracy Pitchloop claims
    for its quadrature (quad is run with epsabs 1e-13 and break points, well below that).

Output: one line per function ("name: N passed, M failed", with the largest difference seen
as a fraction of its tolerance), each failure with its input, and
a closing line "N passed, M failed" counting compared cases. Exit status 0 when everything
agrees, 1 on any failure, 2 when the driver cannot be run.
"""

import argparse
import json
import math
import subprocess
import sys

import numpy as np
import pandas as pd
from scipy import integrate, stats
from statsmodels.stats.multitest import multipletests
from statsmodels.stats.proportion import confint_proportions_2indep, proportion_confint

SEED = 20240611
RTOL = 1e-9
ATOL = 1e-14
QUAD_ATOL = 1e-9
FISHER_TIE_OURS = 1e-7
FISHER_TIE_SCIPY = 1e-14


def decode(v):
    """The driver writes non-finite numbers as strings."""
    if isinstance(v, str):
        return {"inf": math.inf, "-inf": -math.inf, "nan": math.nan}[v]
    return float(v)


# Largest |difference| / tolerance seen by close() since the last reset, per case.
MARGINS = []


def close(ours, ref, rtol=RTOL, atol=ATOL):
    ours, ref = decode(ours), float(ref)
    if math.isnan(ours) or math.isnan(ref):
        return math.isnan(ours) and math.isnan(ref)
    if math.isinf(ours) or math.isinf(ref):
        return ours == ref
    tolerance = atol + rtol * max(abs(ours), abs(ref))
    MARGINS.append(abs(ours - ref) / tolerance)
    return abs(ours - ref) <= tolerance


class Cases:
    """Requests to send, each with a function that checks the reply."""

    def __init__(self):
        # (fn, label, args, checker): label names the report line; checker(result) -> problems
        self.items = []

    def add(self, fn, args, checker, label=None):
        self.items.append((fn, label or fn, args, checker))


def pick_n(rng):
    kind = rng.integers(3)
    if kind == 0:
        return int(rng.integers(1, 31))
    if kind == 1:
        return int(rng.integers(31, 501))
    return int(rng.integers(501, 5001))


def pick_x(rng, n):
    u = rng.random()
    if u < 0.12:
        return 0
    if u < 0.24:
        return n
    return int(rng.integers(0, n + 1))


def pick_level(rng):
    if rng.random() < 0.6:
        return float(rng.choice([0.8, 0.9, 0.95, 0.99, 0.999]))
    return float(rng.uniform(0.5, 0.995))


def interval_checker(ref_low, ref_high, what, exact_low=None, exact_high=None):
    def check(result):
        problems = []
        for name, ours, ref, exact in (("low", result["low"], ref_low, exact_low),
                                       ("high", result["high"], ref_high, exact_high)):
            if exact is not None:
                if decode(ours) != exact:
                    problems.append(f"{name} {ours} should be exactly {exact} ({what})")
            elif not close(ours, ref):
                problems.append(f"{name} {ours} vs {what} {ref!r}")
        return problems
    return check


def value_checker(ref, what, atol=ATOL, rtol=RTOL):
    def check(result):
        return [] if close(result, ref, rtol, atol) else [f"{result} vs {what} {ref!r}"]
    return check


def fields_checker(refs, what):
    def check(result):
        return [f"{k} {result[k]} vs {what} {v!r}" for k, v in refs.items()
                if not close(result[k], v)]
    return check


def single_proportion(cases, rng):
    for _ in range(60):
        n = pick_n(rng)
        x, level = pick_x(rng, n), pick_level(rng)
        for fn, method in (("wilson", "wilson"), ("wilsonCC", "wilsoncc"),
                           ("clopperPearson", "exact")):
            ci = stats.binomtest(x, n).proportion_ci(confidence_level=level, method=method)
            cases.add(fn, [x, n, level],
                      interval_checker(ci.low, ci.high, f"scipy proportion_ci('{method}')"))
        low, high = proportion_confint(x, n, alpha=1 - level, method="jeffreys")
        cases.add("jeffreys", [x, n, level],
                  interval_checker(low, high, "statsmodels jeffreys",
                                   exact_low=0.0 if x == 0 else None,
                                   exact_high=1.0 if x == n else None))


def garwood(cases, rng):
    for i in range(50):
        count = 0 if i % 8 == 0 else int(rng.integers(1, 300))
        exposure = float(rng.uniform(0.2, 60.0))
        level = pick_level(rng)
        tail = (1 - level) / 2
        low = 0.0 if count == 0 else stats.chi2.ppf(tail, 2 * count) / 2 / exposure
        high = stats.chi2.isf(tail, 2 * count + 2) / 2 / exposure
        cases.add("garwood", [count, exposure, level],
                  interval_checker(low, high, "scipy chi2.ppf/isf",
                                   exact_low=0.0 if count == 0 else None))


def posteriors(cases, rng):
    for _ in range(50):
        n = pick_n(rng)
        x = pick_x(rng, n)
        a, b = x + 0.5, n - x + 0.5
        # Targets near the posterior and anywhere in (0, 1), so both tails are exercised.
        target = float(stats.beta.ppf(rng.uniform(0.001, 0.999), a, b)) if rng.random() < 0.6 \
            else float(rng.uniform(0.001, 0.999))
        cases.add("probRateBelow", [x, n, target],
                  value_checker(stats.beta.cdf(target, a, b), "scipy beta.cdf"))
        cases.add("probRateAbove", [x, n, target],
                  value_checker(stats.beta.sf(target, a, b), "scipy beta.sf"))
    for i in range(50):
        count = 0 if i % 8 == 0 else int(rng.integers(1, 300))
        exposure = float(rng.uniform(0.2, 60.0))
        shape, scale = count + 0.5, 1 / exposure
        target = float(stats.gamma.ppf(rng.uniform(0.001, 0.999), shape, scale=scale)) \
            if rng.random() < 0.6 else float(rng.uniform(0.0, 3.0 * (count + 1) / exposure))
        cases.add("probPoissonRateBelow", [count, exposure, target],
                  value_checker(stats.gamma.cdf(target, shape, scale=scale), "scipy gamma.cdf"))
        cases.add("probPoissonRateAbove", [count, exposure, target],
                  value_checker(stats.gamma.sf(target, shape, scale=scale), "scipy gamma.sf"))
    for _ in range(30):
        a, b = float(rng.uniform(0.3, 500)), float(rng.uniform(0.3, 500))
        level = pick_level(rng)
        low, high = stats.beta.interval(level, a, b)
        refs = {"mean": stats.beta.mean(a, b), "sd": stats.beta.std(a, b)}

        def check(result, refs=refs, low=low, high=high):
            return (fields_checker(refs, "scipy beta")(result)
                    + interval_checker(low, high, "scipy beta.interval")(result["interval"]))
        cases.add("betaSummary", [a, b, level], check)


def newcombe(cases, rng):
    for _ in range(50):
        n1, n2 = pick_n(rng), pick_n(rng)
        x1, x2 = pick_x(rng, n1), pick_x(rng, n2)
        level = pick_level(rng)
        low, high = confint_proportions_2indep(x1, n1, x2, n2, method="newcomb", compare="diff",
                                               alpha=1 - level)
        cases.add("newcombeDifference", [x1, n1, x2, n2, level],
                  interval_checker(low, high, "statsmodels newcomb"))


def fisher_two_sided_reference(a, b, c, d):
    """scipy's two-sided p-value, or, when the 1e-7 and 1e-14 tie rules select different
    tables, the sum of scipy's hypergeom.pmf under the 1e-7 rule. Returns (p, rule)."""
    p_scipy = stats.fisher_exact([[a, b], [c, d]], alternative="two-sided")[1]
    row1, col1, total = a + b, a + c, a + b + c + d
    if row1 == 0 or c + d == 0 or col1 == 0 or b + d == 0:
        return p_scipy, "scipy"
    support = np.arange(max(0, row1 + col1 - total), min(row1, col1) + 1)
    pmf = stats.hypergeom.pmf(support, total, row1, col1)
    observed = stats.hypergeom.pmf(a, total, row1, col1)
    ratio = pmf / observed - 1
    ambiguous = (ratio > FISHER_TIE_SCIPY) & (ratio <= FISHER_TIE_OURS)
    if not ambiguous.any():
        return p_scipy, "scipy"
    chosen = pmf <= observed * (1 + FISHER_TIE_OURS)
    return (1.0 if chosen.all() else min(1.0, float(pmf[chosen].sum()))), "tie rule"


def fisher(cases, rng, notes):
    tables = []
    for _ in range(70):
        size = rng.choice([10, 60, 400])
        tables.append([int(v) for v in rng.integers(0, size, 4)])
    # Symmetric tables (real ties between tables), zero cells and zero margins.
    tables += [[3, 1, 1, 3], [5, 5, 5, 5], [10, 2, 2, 10], [7, 13, 13, 7], [0, 6, 6, 0],
               [0, 0, 4, 5], [3, 0, 0, 0], [0, 4, 0, 7], [12, 0, 3, 9], [8, 2, 1, 5]]
    for a, b, c, d in tables:
        table = [[a, b], [c, d]]
        odds, p_less = stats.fisher_exact(table, alternative="less")
        p_greater = stats.fisher_exact(table, alternative="greater")[1]
        p_two, rule = fisher_two_sided_reference(a, b, c, d)
        if rule != "scipy":
            notes.append(f"fisherExact {table}: compared with the 1e-7 tie rule on scipy's pmf")
        refs = {"pLess": p_less, "pGreater": p_greater, "pTwoSided": p_two, "oddsRatio": odds}
        cases.add("fisherExact", [a, b, c, d],
                  fields_checker(refs, "scipy fisher_exact" if rule == "scipy" else "tie rule"))


def poisson_conditional(cases, rng):
    for i in range(50):
        c1, c2 = int(rng.integers(0, 120)), int(rng.integers(0, 120))
        if c1 + c2 == 0:
            c2 = 1
        e1, e2 = float(rng.uniform(1, 20)), float(rng.uniform(1, 20))
        if i % 10 == 0:
            e2 = e1  # p = 1/2: a symmetric binomial, real ties
        total, p = c1 + c2, e1 / (e1 + e2)
        refs = {"pLess": stats.binomtest(c1, total, p, alternative="less").pvalue,
                "pGreater": stats.binomtest(c1, total, p, alternative="greater").pvalue,
                "pTwoSided": stats.binomtest(c1, total, p, alternative="two-sided").pvalue}
        cases.add("poissonConditionalTest", [c1, e1, c2, e2],
                  fields_checker(refs, "scipy binomtest"))


def benjamini_hochberg(cases, rng):
    for i in range(30):
        m = int(rng.integers(1, 41))
        # A mix of signals and nulls; rounding makes ties.
        p = np.concatenate([rng.uniform(0, 1, m), rng.uniform(0, 0.01, m // 3)])
        if i % 3 == 0:
            p = np.round(p, 2)
        p = [float(v) for v in p]
        q = float(rng.choice([0.05, 0.1, 0.2]))
        if i % 5 == 4:
            # The j-th smallest p exactly on its step-up threshold (j/m)·q (computed as
            # statsmodels does), smaller ones well below theirs, larger ones far above: the
            # rule is p <= threshold, so exactly j hypotheses are rejected.
            m = len(p)
            j = int(rng.integers(1, m + 1))
            p = ([float(v) for v in rng.uniform(0, 0.5 * q / m, j - 1)] + [j / m * q]
                 + [float(v) for v in rng.uniform(0.5, 1, m - j)])
            p = [p[k] for k in rng.permutation(m)]
        reject, adjusted, _, _ = multipletests(p, alpha=q, method="fdr_bh")
        adjusted = [float(v) for v in adjusted]
        reject = [bool(v) for v in reject]

        def check_adjusted(result, adjusted=adjusted):
            if len(result) != len(adjusted):
                return ["length differs"]
            return [f"[{k}] {o} vs statsmodels {r!r}"
                    for k, (o, r) in enumerate(zip(result, adjusted)) if not close(o, r)]

        def check_reject(result, reject=reject):
            return [] if result == reject else [f"{result} vs statsmodels {reject}"]
        cases.add("benjaminiHochberg", [p], check_adjusted)
        cases.add("bhReject", [p, q], check_reject)


def beta_break_points(a, b):
    levels = [1e-9, 1e-6, 1e-3, 0.01, 0.1, 0.25, 0.5, 0.75, 0.9, 0.99, 0.999, 1 - 1e-6]
    return [float(v) for v in stats.beta.ppf(levels, a, b)]


def improved(cases, rng):
    for i in range(40):
        n1, n2 = pick_n(rng), pick_n(rng)
        if i % 5 == 0:
            n1, n2 = int(rng.integers(0, 6)), int(rng.integers(0, 6))  # near-prior posteriors
        x1, x2 = pick_x(rng, n1) if n1 else 0, pick_x(rng, n2) if n2 else 0
        higher = bool(i % 2)
        a1, b1, a2, b2 = x1 + 0.5, n1 - x1 + 0.5, x2 + 0.5, n2 - x2 + 0.5
        cdf_or_sf = stats.beta.cdf if higher else stats.beta.sf
        sf_or_cdf = stats.beta.sf if higher else stats.beta.cdf

        def quad(f, points):
            points = [p for p in points if 0 < p < 0.5]
            # Quadrature nodes can reach subnormal u, where Boost's density reports a division
            # by zero; an infinite or NaN value there would make the comparison fail, not pass.
            with np.errstate(divide="ignore", invalid="ignore"):
                return integrate.quad(f, 0, 0.5, points=sorted(set(points)) or None, limit=500,
                                      epsabs=1e-13, epsrel=1e-12)[0]
        # [0, 1/2] in p; [1/2, 1] in u = 1 - p (Beta(a, b) of 1 - p is Beta(b, a)), because
        # doubles next to 1 are too coarse for a density like (1 - p)^(-1/2).
        ref = quad(lambda p: stats.beta.pdf(p, a2, b2) * cdf_or_sf(p, a1, b1),
                   beta_break_points(a1, b1) + beta_break_points(a2, b2))
        ref += quad(lambda u: stats.beta.pdf(u, b2, a2) * sf_or_cdf(u, b1, a1),
                    beta_break_points(b1, a1) + beta_break_points(b2, a2))
        cases.add("probRateImproved", [x1, n1, x2, n2, higher],
                  value_checker(ref, "quad of beta.pdf * beta.cdf/sf", atol=QUAD_ATOL, rtol=0))
    for i in range(40):
        c1, c2 = int(rng.integers(0, 200)), int(rng.integers(0, 200))
        e1, e2 = float(rng.uniform(0.5, 40)), float(rng.uniform(0.5, 40))
        higher = bool(i % 2)
        s1, s2 = c1 + 0.5, c2 + 0.5
        tail = stats.gamma.cdf if higher else stats.gamma.sf
        levels = [1e-9, 1e-6, 1e-3, 0.01, 0.1, 0.25, 0.5, 0.75, 0.9, 0.99, 0.999, 1 - 1e-6]
        points = sorted(set(float(v) for v in np.concatenate(
            [stats.gamma.ppf(levels, s1, scale=1 / e1),
             stats.gamma.ppf(levels, s2, scale=1 / e2)])))
        upper = max(stats.gamma.isf(1e-18, s1, scale=1 / e1),
                    stats.gamma.isf(1e-18, s2, scale=1 / e2))
        ref, _ = integrate.quad(
            lambda t: stats.gamma.pdf(t, s2, scale=1 / e2) * tail(t, s1, scale=1 / e1), 0, upper,
            points=[p for p in points if 0 < p < upper], limit=500, epsabs=1e-13, epsrel=1e-12)
        cases.add("probPoissonRateImproved", [c1, e1, c2, e2, higher],
                  value_checker(ref, "quad of gamma.pdf * gamma.cdf/sf", atol=QUAD_ATOL, rtol=0))


def ewma(cases, rng):
    for _ in range(10):
        length = int(rng.integers(1, 40))
        x = [float(v) for v in rng.normal(0.4, 0.1, length)]
        lam, start = float(rng.uniform(0.05, 1.0)), float(rng.uniform(0.2, 0.6))
        ref = pd.Series([start] + x).ewm(alpha=lam, adjust=False).mean().to_numpy()[1:]
        ref = [float(v) for v in ref]

        def check(result, ref=ref):
            if len(result) != len(ref):
                return ["length differs"]
            return [f"[{k}] {o} vs pandas {r!r}"
                    for k, (o, r) in enumerate(zip(result, ref)) if not close(o, r)]
        cases.add("ewmaSeries", [x, lam, start], check)


def validation(cases):
    """Bad arguments must be refused: the check passes only on an error reply."""
    def must_fail(result):
        return [f"expected an error, got {result}"]
    for fn, args in (("wilson", [5, 4, 0.95]), ("jeffreys", [-1, 4, 0.95]),
                     ("clopperPearson", [1, 4, 1.0]),
                     ("garwood", [3, 0.0, 0.95]), ("fisherExact", [1, -2, 3, 4]),
                     ("benjaminiHochberg", [[0.2, 1.5]]), ("probRateImproved", [3, 2, 1, 2, True]),
                     ("pChart", [[1, 2], [5, 5], 0, 3])):
        cases.add(fn, args, must_fail, label="argument validation")


def run_driver(driver, cases):
    requests = "".join(json.dumps({"fn": fn, "args": args}) + "\n"
                       for fn, _, args, _ in cases.items)
    try:
        done = subprocess.run([driver], input=requests, capture_output=True, text=True, timeout=600)
    except (OSError, subprocess.TimeoutExpired) as e:
        print(f"cannot run the driver {driver}: {e}")
        sys.exit(2)
    replies = [json.loads(line) for line in done.stdout.splitlines() if line.strip()]
    if done.returncode != 0 or len(replies) != len(cases.items):
        print(f"driver failed (exit {done.returncode}, {len(replies)} replies to "
              f"{len(cases.items)} requests): {done.stderr.strip()}")
        sys.exit(2)
    return replies


def main():
    parser = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    parser.add_argument("--driver", required=True, help="path to the stats_driver executable")
    args = parser.parse_args()

    rng = np.random.default_rng(SEED)
    cases, notes = Cases(), []
    single_proportion(cases, rng)
    garwood(cases, rng)
    posteriors(cases, rng)
    newcombe(cases, rng)
    fisher(cases, rng, notes)
    poisson_conditional(cases, rng)
    benjamini_hochberg(cases, rng)
    improved(cases, rng)
    ewma(cases, rng)
    validation(cases)

    replies = run_driver(args.driver, cases)
    tally = {}  # function -> [passed, failed, largest difference / tolerance]
    for (fn, label, fn_args, checker), reply in zip(cases.items, replies):
        MARGINS.clear()
        if label == "argument validation":
            problems = [] if "error" in reply else checker(reply.get("result"))
        elif "error" in reply:
            problems = [f"error: {reply['error']}"]
        else:
            problems = checker(reply["result"])
        counts = tally.setdefault(label, [0, 0, 0.0])
        counts[0 if not problems else 1] += 1
        counts[2] = max([counts[2]] + MARGINS)
        if problems:
            print(f"FAIL {fn}{json.dumps(fn_args)}: " + "; ".join(problems))
    for note in notes:
        print(note)
    for label, (ok, bad, margin) in tally.items():
        detail = f" (largest difference {margin:.2g} of the tolerance)" if margin else ""
        print(f"{label}: {ok} passed, {bad} failed{detail}")
    total_ok = sum(v[0] for v in tally.values())
    total_bad = sum(v[1] for v in tally.values())
    print(f"{total_ok} passed, {total_bad} failed")
    return 1 if total_bad or total_ok == 0 else 0


if __name__ == "__main__":
    sys.exit(main())
