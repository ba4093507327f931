#!/usr/bin/python3
"""Independent sanity check of the Kestrel Bay demo season.

Reads every sample-club/matches/KB-*.json (or the directory given as the first
argument), validates the file format, converts all coordinates to our frame
(x = 0 at our goal line, y = 0 at our right touchline) and prints:

  * volumes per match (events, passes, shots per side, event mix) and W/D/L;
  * pass completion by third and lane, in the passer's own direction;
  * losses and "regained within 5 s" by third of the loss place, for both sides;
  * shots conceded within 15 s of a loss, by third of the loss place;
  * the planted story: opposition completed passes in the 15 s before their
    shots, per zone of the 6 x 5 grid in our frame, for matches 1-8, 9-11 and
    12-34 -- band 2 / lane 5 (our left, outside our box) must stand out early
    in the season and fade afterwards.

Uses the standard library only. Exits non-zero if a format rule is broken or a
headline expectation is not met.
"""

import glob
import json
import os
import sys
from collections import Counter, defaultdict

CONTROL_ALWAYS = {"pass", "carry", "take_on", "shot", "recovery"}
CONTROL_IF_OK = {"interception", "tackle", "keeper"}
RESULTS = {
    "pass": {"ok", "fail"}, "carry": {"ok", "fail"}, "take_on": {"ok", "fail"},
    "shot": {"goal", "saved", "blocked", "off", "post"}, "recovery": {"ok"},
    "interception": {"ok", "fail"}, "tackle": {"ok", "fail"}, "keeper": {"ok", "fail"},
    "clearance": {"ok", "fail"}, "block": {"ok", "fail"}, "foul": None, "out": None,
}
STORY_ZONE = (2, 5)


def fail(msg):
    print("FORMAT ERROR:", msg)
    sys.exit(1)


def control_giving(ev):
    return ev["type"] in CONTROL_ALWAYS or (ev["type"] in CONTROL_IF_OK and ev.get("result") == "ok")


def to_us(match, ev, x, y):
    """Point of `ev` in our attacking direction."""
    L, W = match["pitch"]["length_m"], match["pitch"]["width_m"]
    frame = match["frame"]
    if frame == "acting":
        return (L - x, W - y) if ev["side"] == "opp" else (x, y)
    if frame == "us":
        return x, y
    if frame == "ground":
        direction = match["us_attack"][str(ev["period"])]
        return (x, y) if direction == "+x" else (L - x, W - y)
    fail("unknown frame " + frame)


def acting(match, ev, xu, yu):
    """Point in the acting side's own direction, from our-frame coordinates."""
    L, W = match["pitch"]["length_m"], match["pitch"]["width_m"]
    return (L - xu, W - yu) if ev["side"] == "opp" else (xu, yu)


def zone(match, xu, yu):
    L, W = match["pitch"]["length_m"], match["pitch"]["width_m"]
    band = min(6, int(xu // (L / 6)) + 1)
    lane = min(5, int(yu // (W / 5)) + 1)
    return band, lane


def third(match, xa):
    L = match["pitch"]["length_m"]
    return 0 if xa < L / 3 else (1 if xa < 2 * L / 3 else 2)


def load(path):
    with open(path, encoding="utf-8") as fh:
        doc = json.load(fh)
    if doc.get("format") != "pitchloop-match" or doc.get("version") != 1:
        fail(path + ": bad format/version")
    m = doc["match"]
    L, W = m["pitch"]["length_m"], m["pitch"]["width_m"]
    if not (100 <= L <= 110 and 64 <= W <= 75):
        fail(path + ": pitch size out of range")
    lengths = {p["n"]: p["length_s"] for p in m["periods"]}
    last = (0, -1.0)
    for ev in doc["events"]:
        key = (ev["period"], ev["t"])
        if key < last:
            fail(f"{path}: events out of order at {key}")
        last = key
        if ev["t"] > lengths[ev["period"]]:
            fail(f"{path}: event after the end of period {ev['period']}")
        allowed = RESULTS.get(ev["type"], "missing")
        if allowed == "missing":
            fail(f"{path}: unknown type {ev['type']}")
        if allowed is None and "result" in ev:
            fail(f"{path}: {ev['type']} must not have a result")
        if allowed is not None and ev.get("result") not in allowed:
            fail(f"{path}: bad result {ev.get('result')} for {ev['type']}")
        if ev["side"] not in ("us", "opp"):
            fail(f"{path}: bad side")
        for kx, ky in (("x", "y"), ("to_x", "to_y")):
            if kx in ev and not (0 <= ev[kx] <= L and 0 <= ev[ky] <= W):
                fail(f"{path}: coordinate off the pitch {ev}")
        if ev["type"] in ("pass", "carry") and "to_x" not in ev:
            fail(f"{path}: {ev['type']} without to_x/to_y")
        xu, yu = to_us(m, ev, ev["x"], ev["y"])
        ev["_us"] = (xu, yu)
        ev["_act"] = acting(m, ev, xu, yu)
    goals = Counter(ev["side"] for ev in doc["events"] if ev["type"] == "shot" and ev["result"] == "goal")
    if goals["us"] != m["score"]["us"] or goals["opp"] != m["score"]["opponent"]:
        fail(path + ": score does not match goals")
    return doc, os.path.getsize(path)


def losses(doc):
    """Yield (loser, loss_event_index, loss_place_actor_frame, regain_time or None)."""
    m, evs = doc["match"], doc["events"]
    out = []
    for period in (1, 2):
        pe = [e for e in evs if e["period"] == period]
        control = None
        last_by = {}
        for i, ev in enumerate(pe):
            side = ev["side"]
            if control_giving(ev):
                if control is not None and control != side and control in last_by:
                    loser = control
                    t_loss = ev["t"]
                    regain = None
                    for later in pe[i + 1:]:
                        if (later["side"] == loser and control_giving(later)) or (
                                later["side"] != loser and later["type"] in ("foul", "out")):
                            regain = later["t"]
                            break
                    shot_after = any(
                        e["side"] == side and e["type"] == "shot" and t_loss <= e["t"] <= t_loss + 15
                        for e in pe[i:i + 40])
                    out.append((loser, last_by[loser], t_loss, regain, shot_after))
                control = side
            last_by[side] = ev["_act"]
    return out


def pct(a, b):
    return f"{100.0 * a / b:5.1f}%" if b else "   - "


def main():
    root = sys.argv[1] if len(sys.argv) > 1 else os.path.join(
        os.path.dirname(os.path.abspath(__file__)), "..", "matches")
    paths = sorted(glob.glob(os.path.join(root, "KB-*.json")))
    if not paths:
        fail("no match files in " + root)
    docs = []
    sizes = []
    for p in paths:
        d, size = load(p)
        docs.append(d)
        sizes.append(size)

    # --- volumes -----------------------------------------------------------
    print(f"== Volumes ({len(docs)} matches, largest file {max(sizes) // 1024} KB)")
    n_events, passes, shots = [], [], []
    mix = Counter()
    wdl = Counter()
    frames = Counter()
    for d in docs:
        evs = d["events"]
        n_events.append(len(evs))
        for side in ("us", "opp"):
            passes.append(sum(1 for e in evs if e["side"] == side and e["type"] == "pass"))
            shots.append(sum(1 for e in evs if e["side"] == side and e["type"] == "shot"))
        mix.update(e["type"] for e in evs)
        s = d["match"]["score"]
        wdl["W" if s["us"] > s["opponent"] else "D" if s["us"] == s["opponent"] else "L"] += 1
        frames[d["match"]["frame"]] += 1
    print(f"events/match {min(n_events)}..{max(n_events)} (mean {sum(n_events) / len(n_events):.0f})")
    print(f"passes/team  {min(passes)}..{max(passes)} (mean {sum(passes) / len(passes):.0f})")
    print(f"shots/team   {min(shots)}..{max(shots)} (mean {sum(shots) / len(shots):.1f})")
    goals = sum(d["match"]["score"]["us"] + d["match"]["score"]["opponent"] for d in docs)
    print(f"goals/match  {goals / len(docs):.2f}   Kestrel Bay W{wdl['W']} D{wdl['D']} L{wdl['L']}")
    print("frames       " + ", ".join(f"{k} {v}" for k, v in sorted(frames.items())))
    print("per team per match: " + ", ".join(
        f"{t} {mix[t] / len(docs) / 2:.1f}" for t in RESULTS))

    # --- pass completion by zone ------------------------------------------------
    print("\n== Pass completion by origin (passer's own direction)")
    comp = defaultdict(lambda: [0, 0])
    for d in docs:
        m = d["match"]
        W = m["pitch"]["width_m"]
        L = m["pitch"]["length_m"]
        for e in d["events"]:
            if e["type"] != "pass":
                continue
            xa, ya = e["_act"]
            th = third(m, xa)
            wide = ya < W / 5 or ya > 4 * W / 5
            ok = e["result"] == "ok"
            for key in ((e["side"], "third", th), (e["side"], "lane", th, wide)):
                comp[key][0] += ok
                comp[key][1] += 1
            tx, ty = to_us(m, e, e["to_x"], e["to_y"])
            txa, tya = acting(m, e, tx, ty)
            if txa >= L - 16.5 and abs(tya - W / 2) <= 20.16:
                comp[(e["side"], "intobox")][0] += ok
                comp[(e["side"], "intobox")][1] += 1
            comp[(e["side"], "half", xa < L / 2)][0] += ok
            comp[(e["side"], "half", xa < L / 2)][1] += 1
    names = ["defensive third", "middle third", "final third"]
    for side in ("us", "opp"):
        row = [f"own half {pct(*comp[(side, 'half', True)])}"]
        row += [f"{names[t]} {pct(*comp[(side, 'third', t)])}" for t in range(3)]
        row.append(f"into box {pct(*comp[(side, 'intobox')])}")
        print(f"{side:4s} " + " | ".join(row))
        print("     wide/central lanes: " + " | ".join(
            f"{names[t]} {pct(*comp[(side, 'lane', t, True)])} / {pct(*comp[(side, 'lane', t, False)])}"
            for t in range(3)))

    # --- losses, counter-press, shots after loss -------------------------------
    print("\n== Losses by third of the loss place (loser's direction)")
    stats = defaultdict(lambda: [0, 0, 0])
    for d in docs:
        m = d["match"]
        for loser, place, t_loss, regain, shot_after in losses(d):
            th = third(m, place[0])
            st = stats[(loser, th)]
            st[0] += 1
            st[1] += regain is not None and regain - t_loss <= 5.0
            st[2] += shot_after
    for side in ("us", "opp"):
        total = sum(stats[(side, t)][0] for t in range(3))
        print(f"{side:4s} losses/match {total / len(docs):5.1f}: " + " | ".join(
            f"{names[t]} {stats[(side, t)][0] / len(docs):4.1f}/m, regained<=5s "
            f"{pct(stats[(side, t)][1], stats[(side, t)][0])}, shot conceded<=15s "
            f"{pct(stats[(side, t)][2], stats[(side, t)][0])}" for t in range(3)))

    # --- the planted story --------------------------------------------------------
    print("\n== Opposition pre-shot passes (completed, <=15 s before their shot), our frame")
    per_match = []
    zone_counts = {"1-8": Counter(), "9-11": Counter(), "12-34": Counter()}
    all_opp_passes = {"1-8": Counter(), "12-34": Counter()}
    for idx, d in enumerate(docs, start=1):
        m = d["match"]
        evs = d["events"]
        chosen = set()
        for i, e in enumerate(evs):
            if e["side"] == "opp" and e["type"] == "shot":
                for j in range(i - 1, -1, -1):
                    p = evs[j]
                    if p["period"] != e["period"] or e["t"] - p["t"] > 15.0:
                        break
                    if p["side"] == "opp" and p["type"] == "pass" and p["result"] == "ok":
                        chosen.add(j)
        group = "1-8" if idx <= 8 else ("9-11" if idx <= 11 else "12-34")
        in_zone = 0
        for j in chosen:
            z = zone(m, *evs[j]["_us"])
            zone_counts[group][z] += 1
            in_zone += z == STORY_ZONE
        per_match.append(in_zone)
        if group in all_opp_passes:
            for e in evs:
                if e["side"] == "opp" and e["type"] == "pass":
                    all_opp_passes[group][zone(m, *e["_us"])] += 1
    print("band 2 / lane 5 per match: " + " ".join(f"{i}:{c}" for i, c in enumerate(per_match, 1)))
    spans = {"1-8": range(0, 8), "9-11": range(8, 11), "12-34": range(11, len(docs))}
    for group, span in spans.items():
        n = len(span)
        if not n:
            continue
        total = sum(zone_counts[group].values())
        top = ", ".join(f"b{b}/l{l} {c / n:.1f}" for (b, l), c in zone_counts[group].most_common(4))
        print(f"matches {group:5s}: {sum(per_match[i] for i in span) / n:4.1f}/match in b2/l5 "
              f"({pct(zone_counts[group][STORY_ZONE], total)} of {total / n:.1f} pre-shot passes); "
              f"top zones per match: {top}")
    for group, counter in all_opp_passes.items():
        n = len(spans[group])
        print(f"all opp passes from b2/l5, matches {group:5s}: {counter[STORY_ZONE] / n:5.1f}/match")

    early = sum(per_match[:8]) / 8
    late = sum(per_match[11:]) / max(1, len(per_match[11:]))
    if len(docs) == 34 and not (early >= 4.0 and late <= 2.5 and early >= 2.5 * late):
        print("STORY CHECK FAILED")
        sys.exit(1)
    print("story check passed" if len(docs) == 34 else "story check skipped (partial season)")


if __name__ == "__main__":
    main()
