#!/usr/bin/python3
"""How often can ANY common alarm rule catch a ten-point drop within six matches while an
on-target zone is flagged in at most 5 % of its seasons?  (docs/statistics.md, "Calibration
with variation"; run on demand, about a minute: /usr/bin/python3 tests/bench/detection_bound.py)

This deliberately favours the detector over Pitchloop's own rule:
  * the match-to-match variation and the rate are KNOWN (no estimate, no prior);
  * each rule's threshold is CALIBRATED by simulation so that exactly 5 % of on-target
    zone-seasons raise an alarm (Pitchloop spends its budget by the union bound, which
    is conservative);
  * the "gaussian" case replaces the beta-binomial match values by normal ones of the same
    mean and variance, which removes the skew of small counts.
Rules tried: the sum of the last W matches (a scan statistic, W = 3..8), Page's CUSUM with
reference values k (in SD units a match), and the Shiryaev-Roberts statistic, each tuned only
by its threshold. A season is 34 matches; the drop of 0.10 (0.45 -> 0.35) starts at match 12
(index 11), "caught within 6" means an alarm at matches 12..17 and none before.

Numbers only: numpy's generator (python3-numpy), seeded.
"""
import sys

import numpy as np

SEASON = 34
CHANGE = 11          # 0-based index of the first match after the drop
WITHIN = 6
TARGET = 0.45
DROP = 0.10
SD_BETWEEN = 0.08
FALSE_ALARM = 0.05


def beta_binomial_matches(rng, n_seasons, chances, change):
    """Chances won back a match: true rate drawn per match (beta, SD 0.08), then binomial."""
    mean = np.full((n_seasons, SEASON), TARGET)
    if change is not None:
        mean[:, change:] -= DROP
    common = mean * (1 - mean) / SD_BETWEEN**2 - 1
    rate = rng.beta(mean * common, (1 - mean) * common)
    return rng.binomial(chances, rate) / chances


def gaussian_matches(rng, n_seasons, chances, change):
    sd = np.sqrt(TARGET * (1 - TARGET) / chances + SD_BETWEEN**2)
    mean = np.full((n_seasons, SEASON), TARGET)
    if change is not None:
        mean[:, change:] -= DROP
    return mean + sd * rng.standard_normal((n_seasons, SEASON))


def shortfall(values, chances):
    """Each match's shortfall below the target in SD units of one match (known variance)."""
    sd = np.sqrt(TARGET * (1 - TARGET) / chances + SD_BETWEEN**2)
    return (TARGET - values) / sd


def scan(z, window):
    """Standardised sum of the last `window` matches (fewer at the season's start)."""
    c = np.cumsum(z, axis=1)
    out = np.empty_like(z)
    for t in range(SEASON):
        lo = max(0, t - window + 1)
        s = c[:, t] - (c[:, lo - 1] if lo > 0 else 0.0)
        out[:, t] = s / np.sqrt(t - lo + 1)
    return out


def cusum(z, k):
    out = np.empty_like(z)
    s = np.zeros(z.shape[0])
    for t in range(SEASON):
        s = np.maximum(0.0, s + z[:, t] - k)
        out[:, t] = s
    return out


def shiryaev_roberts(z, delta):
    out = np.empty_like(z)
    r = np.zeros(z.shape[0])
    for t in range(SEASON):
        r = (1.0 + r) * np.exp(delta * z[:, t] - delta**2 / 2)
        out[:, t] = np.log1p(r)
    return out


def caught(stat_null, stat_drop):
    threshold = np.quantile(stat_null.max(axis=1), 1 - FALSE_ALARM)
    before = (stat_drop[:, :CHANGE] > threshold).any(axis=1)
    within = (stat_drop[:, CHANGE:CHANGE + WITHIN] > threshold).any(axis=1)
    return threshold, float(np.mean(within & ~before))


def main():
    n_seasons = int(sys.argv[1]) if len(sys.argv) > 1 else 100_000
    rng = np.random.default_rng(20261205)
    print(f"{n_seasons} seasons a cell; alarm thresholds calibrated to {FALSE_ALARM:.0%} "
          f"false alarms a zone-season of {SEASON} matches; drop of {DROP} from {TARGET} at "
          f"match {CHANGE + 1}; SD between matches {SD_BETWEEN}")
    print(f"{'chances':>7} {'model':>13} {'rule':>18} {'caught within 6':>16}")
    best = {}
    for chances in (15, 40, 80):
        delta = DROP / np.sqrt(TARGET * (1 - TARGET) / chances + SD_BETWEEN**2)
        for model, draw in (("beta-binomial", beta_binomial_matches), ("gaussian", gaussian_matches)):
            z0 = shortfall(draw(rng, n_seasons, chances, None), chances)
            z1 = shortfall(draw(rng, n_seasons, chances, CHANGE), chances)
            rules = [(f"last {w}", lambda z, w=w: scan(z, w)) for w in range(3, 9)]
            rules += [(f"CUSUM k={k:g}", lambda z, k=k: cusum(z, k)) for k in (0.2, 0.33, 0.5, 0.66, 1.0)]
            rules += [("Shiryaev-Roberts", lambda z: shiryaev_roberts(z, delta))]
            for name, rule in rules:
                _, rate = caught(rule(z0), rule(z1))
                key = (chances, model)
                best[key] = max(best.get(key, 0.0), rate)
                print(f"{chances:>7} {model:>13} {name:>18} {rate:>15.1%}")
    print("best rule in each cell:")
    for (chances, model), rate in best.items():
        print(f"  {chances:>3} chances a match, {model:>13}: {rate:.1%}")


if __name__ == "__main__":
    main()
