#!/usr/bin/python3
"""Outside check of mapped import (docs/import.md): demo matches written out as tables of our
own layouts, read back with a mapping profile, give the same tallies as the native files.

Usage:
    /usr/bin/python3 tests/python/import_check.py --cli PATH_TO_pitchloop \
        --club-dir sample-club --workdir DIR

For each of three demo matches (one in each of the match format's frames) it writes:
  * analyst-sheet: ';'-delimited UTF-8 with a decimal comma, the clock from kick-off (mm:ss.s),
    team names, positions 0-100 from the top-left corner with y down, a skipped
    "Substitution" row, tags joined by '|', match details in the file name;
  * tagging-log: JSON Lines, seconds in the period, H/A for the side, metres from the centre
    spot with y up, in our attacking direction ("us" frame), outcomes inside the type word;
  * video-notes: tab-separated Windows-1252 without a header, frames at 10 a second, 1050 x 680
    "pixels" from the bottom-right corner, French words for types and results.
  * season-export: one quoted CSV holding all three matches, the match details (id, date,
    opponent, venue, period lengths) in columns, metres from the bottom-left corner.
  * zone-tags: a CSV giving each event's zone label ("B2-L5") on the default grid equal:6x5
    instead of its position, read with sample-club/import/zone-tags.json; the labels are
    computed here from the native positions, and the tallies must equal the native ones on
    that same grid (zone-only data is exact at its own grid, docs/import.md).
Python's csv and json modules write the tables (and csv reads the delimited ones back to count
their rows against what `pitchloop profile check` reports); the command line ingests each with
its profile into a fresh club file, and `pitchloop tallies --format csv` must equal the tallies
of the native files ingested into another.
"""
import argparse
import csv
import io
import json
import os
import re
import shutil
import subprocess
import sys

MATCHES = ["KB-2026-01", "KB-2026-05", "KB-2026-07"]  # acting, us, ground


def compare(layout, got, native):
    if got != native:
        diff = [l for l in set(got.splitlines()) ^ set(native.splitlines())][:10]
        print("%s: tallies differ from the native files', e.g. %s" % (layout, diff))
        return 1
    print("%s: %d tally rows equal the native files'" % (layout, len(native.splitlines()) - 1))
    return 0


def run(cli, *args, check=True):
    r = subprocess.run([cli, *args], capture_output=True, text=True)
    if check and r.returncode != 0:
        raise SystemExit("%s failed (%d):\n%s%s" % (" ".join(args), r.returncode, r.stdout, r.stderr))
    return r


def mirror(e, length, width):
    for kx, ky in (("x", "y"), ("to_x", "to_y")):
        if kx in e:
            e[kx] = round(length - e[kx], 6)
            e[ky] = round(width - e[ky], 6)


def acting_events(match):
    """The events with positions in the acting frame (each in its own side's direction)."""
    m = match["match"]
    length, width = m["pitch"]["length_m"], m["pitch"]["width_m"]
    out = our_frame(match, clamp=False)
    for e in out:
        if e["side"] == "opp":
            mirror(e, length, width)
    return out


ANALYST_TYPES = {"pass": "Pass", "carry": "Run with ball", "take_on": "Dribble attempt",
                 "shot": "Shot", "recovery": "Ball won", "interception": "Intercept",
                 "tackle": "Tackle", "keeper": "GK", "clearance": "Clear", "block": "Block",
                 "foul": "Foul", "out": "Out of play"}
ANALYST_RESULTS = {"ok": "Complete", "fail": "Incomplete", "goal": "Goal", "saved": "Saved",
                   "blocked": "Blocked", "off": "Wide", "post": "Woodwork"}
TAG_TYPES = {"pass": "pass", "carry": "carry", "take_on": "beat", "interception": "int",
             "tackle": "tkl", "keeper": "gk", "clearance": "clr", "block": "blk"}
VIDEO_TYPES = {"pass": "passe", "carry": "conduite", "take_on": "dribble tenté", "shot": "tir",
               "recovery": "récupération", "interception": "interception", "tackle": "tacle",
               "keeper": "gardien", "clearance": "dégagement", "block": "contre", "foul": "faute",
               "out": "sortie"}
VIDEO_RESULTS = {"ok": "réussi", "fail": "raté", "goal": "but", "saved": "arrêté",
                 "blocked": "contré", "off": "à côté", "post": "poteau"}


def comma(v):
    return ("%.6f" % v).rstrip("0").rstrip(".").replace(".", ",")


def clock(seconds):
    minutes = int(seconds // 60)
    return "%02d:%04.1f" % (minutes, seconds - 60 * minutes)


def write_analyst(match, path):
    m = match["match"]
    length, width = m["pitch"]["length_m"], m["pitch"]["width_m"]
    with open(path, "w", newline="", encoding="utf-8") as f:
        w = csv.writer(f, delimiter=";", quoting=csv.QUOTE_MINIMAL)
        w.writerow(["Half", "Clock", "Team", "Shirt", "Action", "Outcome", "PosX", "PosY",
                    "EndX", "EndY", "Labels"])
        rows = 0
        for i, e in enumerate(acting_events(match)):
            if i == 40:  # a row the profile skips
                w.writerow(["1st half", clock(e["t"]), m["us"], "14", "Substitution", "", "", "",
                            "", "", ""])
                rows += 1
            start = 0 if e["period"] == 1 else 2700
            half = "1st half" if e["period"] == 1 else "2nd half"
            team = m["us"] if e["side"] == "us" else m["opponent"]
            to = [comma(100 * e["to_x"] / length), comma(100 * (1 - e["to_y"] / width))] if "to_x" in e else ["", ""]
            w.writerow([half, clock(e["t"] + start), team, e.get("player", ""),
                        ANALYST_TYPES[e["type"]], ANALYST_RESULTS.get(e.get("result"), ""),
                        comma(100 * e["x"] / length), comma(100 * (1 - e["y"] / width)), *to,
                        "|".join(e.get("tags", []))])
            rows += 1
    return rows


def write_tagging(match, path):
    m = match["match"]
    length, width = m["pitch"]["length_m"], m["pitch"]["width_m"]
    home = m["venue"] == "home"
    with open(path, "w", encoding="utf-8") as f:
        for e in acting_events(match):
            e = dict(e)
            if e["side"] == "opp":  # the "us" frame: every event in our direction
                mirror(e, length, width)
            t = e["type"]
            if t == "shot":
                word = "shot:" + e["result"]
            elif t in ("recovery",):
                word = "won"
            elif t in ("foul", "out"):
                word = t
            else:
                word = TAG_TYPES[t] + ("+" if e["result"] == "ok" else "-")
            row = {"half": e["period"], "secs": e["t"],
                   "team": ("H" if home else "A") if e["side"] == "us" else ("A" if home else "H"),
                   "who": e.get("player"), "what": word,
                   "x_m": round(e["x"] - length / 2, 6), "y_m": round(e["y"] - width / 2, 6)}
            if "to_x" in e:
                row["x2_m"] = round(e["to_x"] - length / 2, 6)
                row["y2_m"] = round(e["to_y"] - width / 2, 6)
            if e.get("tags"):
                row["labels"] = ",".join(e["tags"])
            f.write(json.dumps(row, ensure_ascii=False) + "\n")


def write_video(match, path):
    m = match["match"]
    length, width = m["pitch"]["length_m"], m["pitch"]["width_m"]
    buf = io.StringIO()
    w = csv.writer(buf, delimiter="\t", quoting=csv.QUOTE_NONE, lineterminator="\r\n")
    for e in acting_events(match):
        px = lambda x: "%.4f" % (1050 * (1 - x / length))
        py = lambda y: "%.4f" % (680 * y / width)
        to = [px(e["to_x"]), py(e["to_y"])] if "to_x" in e else ["", ""]
        w.writerow([e["period"], round(e["t"] * 10), "nous" if e["side"] == "us" else "eux",
                    e.get("player", ""), VIDEO_TYPES[e["type"]], VIDEO_RESULTS.get(e.get("result"), ""),
                    px(e["x"]), py(e["y"]), *to])
    with open(path, "wb") as f:
        f.write(buf.getvalue().encode("cp1252"))


SEASON_TYPES = {"take_on": "take-on"}
SEASON_RESULTS = {"fail": "lost", "off": "wide"}


def write_season(matches, path):
    """All matches in one quoted CSV, match details in columns, metres from the bottom-left."""
    with open(path, "w", newline="", encoding="utf-8") as f:
        w = csv.writer(f, quoting=csv.QUOTE_NONNUMERIC)
        w.writerow(["match", "date", "opponent", "venue", "period_lengths", "period", "seconds",
                    "team", "player", "event", "outcome", "x", "y", "end_x", "end_y", "labels"])
        for match in matches:
            m = match["match"]
            lengths = ",".join(str(p["length_s"]) for p in m["periods"])
            for e in acting_events(match):
                w.writerow([m["id"], m["date"], m["opponent"], m["venue"], lengths, e["period"],
                            e["t"], "us" if e["side"] == "us" else "them", e.get("player", ""),
                            SEASON_TYPES.get(e["type"], e["type"]),
                            SEASON_RESULTS.get(e.get("result"), e.get("result", "")),
                            e["x"], e["y"], e.get("to_x", ""), e.get("to_y", ""),
                            ";".join(e.get("tags", []))])


ZONE_BANDS, ZONE_LANES = 6, 5  # the default grid equal:6x5 (docs/import.md, "Zone-only data")
EDGE_TOLERANCE_M = 1e-6  # a position within this of a zone line is on it (docs/storage.md)
V2_RESULTS = {"fail": "lost", "goal": "scored", "saved": "stopped", "blocked": "charged_down",
              "off": "wide", "post": "woodwork"}


def our_frame(match, clamp=True):
    """The events with positions in our frame (x from our goal line, y from our right
    touchline), clamped onto the pitch as the match format says (at most 3 m outside)."""
    m = match["match"]
    length, width = m["pitch"]["length_m"], m["pitch"]["width_m"]
    out = []
    for e in match["events"]:
        e = dict(e)
        if m["frame"] == "acting" and e["side"] == "opp":
            mirror(e, length, width)
        elif m["frame"] == "ground" and m["us_attack"][str(e["period"])] == "-x":
            mirror(e, length, width)
        for k, limit in (("x", length), ("y", width), ("to_x", length), ("to_y", width)):
            if clamp and k in e:
                e[k] = min(max(e[k], 0.0), limit)
        out.append(e)
    return out


def bin_index(v, extent, n):
    """1-based bin of v among n equal bins of [0, extent]: the number of inner lines
    i * (extent / n) at or below v, so a point on a line goes to the higher bin and the far
    edge to the last."""
    return 1 + sum(1 for i in range(1, n) if v >= i * (extent / n) - EDGE_TOLERANCE_M)


def zone_label(e, xk, yk, length, width, acting_opp):
    band = bin_index(e[xk], length, ZONE_BANDS)
    lane = bin_index(e[yk], width, ZONE_LANES)
    if acting_opp:  # the acting frame numbers their zones from their own goal line
        band, lane = ZONE_BANDS + 1 - band, ZONE_LANES + 1 - lane
    return "B%d-L%d" % (band, lane)


def write_zone_tags(match, path):
    """Zone labels instead of positions, each side's zones in its own direction (acting)."""
    m = match["match"]
    length, width = m["pitch"]["length_m"], m["pitch"]["width_m"]
    with open(path, "w", newline="", encoding="utf-8") as f:
        w = csv.writer(f)
        w.writerow(["Half", "Secs", "Side", "No", "Event", "Outcome", "Zone", "ToZone", "Notes"])
        for e in our_frame(match):
            opp = e["side"] == "opp"
            to = zone_label(e, "to_x", "to_y", length, width, opp) if "to_x" in e else ""
            w.writerow([e["period"], e["t"], "theirs" if opp else "ours", e.get("player", ""),
                        e["type"], V2_RESULTS.get(e.get("result"), e.get("result", "")),
                        zone_label(e, "x", "y", length, width, opp), to,
                        " ".join(e.get("tags", []))])


def self_test():
    """Hand-worked labels on a 105 x 68 m pitch: bands 17.5 m, lanes 13.6 m."""
    checks = [(bin_index(0.0, 105, 6), 1), (bin_index(17.5, 105, 6), 2),  # a line goes up
              (bin_index(105.0, 105, 6), 6), (bin_index(40.8, 68, 5), 4),  # 3 x 13.6
              (bin_index(40.79, 68, 5), 3)]
    e = {"x": 10.0, "y": 60.0}
    checks.append((zone_label(e, "x", "y", 105, 68, False), "B1-L5"))
    checks.append((zone_label(e, "x", "y", 105, 68, True), "B6-L1"))
    bad = [(got, want) for got, want in checks if got != want]
    if bad:
        raise SystemExit("zone label self-test failed: %s" % bad)


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--cli", required=True)
    ap.add_argument("--club-dir", required=True)
    ap.add_argument("--workdir", required=True)
    a = ap.parse_args()
    shutil.rmtree(a.workdir, ignore_errors=True)
    os.makedirs(a.workdir)
    profiles = os.path.join(a.club_dir, "import")
    native_db = os.path.join(a.workdir, "native.sqlite")
    frames = set()
    for mid in MATCHES:
        run(a.cli, "--db", native_db, "ingest", os.path.join(a.club_dir, "matches", mid + ".json"))
    native = run(a.cli, "--db", native_db, "tallies", "--format", "csv").stdout
    failures = 0
    for layout in ("analyst-sheet", "tagging-log", "video-notes"):
        db = os.path.join(a.workdir, layout + ".sqlite")
        for mid in MATCHES:
            match = json.load(open(os.path.join(a.club_dir, "matches", mid + ".json"), encoding="utf-8"))
            m = match["match"]
            frames.add(m["frame"])
            lengths = ",".join(str(p["length_s"]) for p in m["periods"])
            profile = os.path.join(profiles, layout + ".json")
            details = ["--period-lengths", lengths]
            if layout == "analyst-sheet":
                path = os.path.join(a.workdir, "%s_%s_%s_%s.csv" % (mid, m["date"], m["venue"], m["opponent"]))
                rows = write_analyst(match, path)
                # Python's csv reads the file back: its rows are what the profile must see.
                with open(path, newline="", encoding="utf-8") as f:
                    read_back = list(csv.reader(f, delimiter=";"))
                if len(read_back) - 1 != rows:
                    failures += 1
                    print("csv read %d rows of %s, %d written" % (len(read_back) - 1, path, rows))
                check = run(a.cli, "profile", "check", profile, path, *details)
                found = re.search(r"^(\d+) events, (\d+) rows skipped", check.stdout, re.M)
                if not found or int(found.group(1)) + int(found.group(2)) != rows or int(found.group(2)) != 1:
                    failures += 1
                    print("profile check of %s: %s" % (path, check.stdout[:300]))
            else:
                ext = ".jsonl" if layout == "tagging-log" else ".tsv"
                path = os.path.join(a.workdir, mid + ext)
                (write_tagging if layout == "tagging-log" else write_video)(match, path)
                details += ["--match-id", mid, "--date", m["date"], "--venue", m["venue"],
                            "--opponent", m["opponent"]]
            run(a.cli, "--db", db, "ingest", "--profile", profile, path, *details)
        got = run(a.cli, "--db", db, "tallies", "--format", "csv").stdout
        failures += compare(layout, got, native)
    # One file for all three matches, the match details in columns.
    path = os.path.join(a.workdir, "season.csv")
    matches = [json.load(open(os.path.join(a.club_dir, "matches", mid + ".json"), encoding="utf-8"))
               for mid in MATCHES]
    write_season(matches, path)
    with open(path, newline="", encoding="utf-8") as f:
        rows = sum(1 for _ in csv.reader(f)) - 1
    check = run(a.cli, "profile", "check", os.path.join(profiles, "season-export.json"), path)
    counted = sum(int(n) for n in re.findall(r"^(\d+) events, 0 rows skipped", check.stdout, re.M))
    if counted != rows or check.stdout.count("\nmatch ") != len(MATCHES):
        failures += 1
        print("profile check of season.csv: %d events for %d rows:\n%s" % (counted, rows, check.stdout[:400]))
    db = os.path.join(a.workdir, "season.sqlite")
    run(a.cli, "--db", db, "ingest", "--profile", os.path.join(profiles, "season-export.json"), path)
    failures += compare("season-export", run(a.cli, "--db", db, "tallies", "--format", "csv").stdout, native)
    # Zone-only: labels on equal:6x5, the club file's default grid, so tallies are exact.
    self_test()
    db = os.path.join(a.workdir, "zone-tags.sqlite")
    for match in matches:
        m = match["match"]
        path = os.path.join(a.workdir, m["id"] + "-zones.csv")
        write_zone_tags(match, path)
        run(a.cli, "--db", db, "ingest", "--profile", os.path.join(profiles, "zone-tags.json"), path,
            "--match-id", m["id"], "--date", m["date"], "--venue", m["venue"],
            "--opponent", m["opponent"],
            "--period-lengths", ",".join(str(p["length_s"]) for p in m["periods"]))
    listed = run(a.cli, "--db", db, "matches").stdout
    if listed.count("zone-only: positions known only to grid equal:6x5") != len(MATCHES):
        failures += 1
        print("the zone-tags matches should be listed as zone-only:\n%s" % listed)
    failures += compare("zone-tags", run(a.cli, "--db", db, "tallies", "--format", "csv").stdout, native)
    # On a finer grid the zone-only matches give no zone rows, and say so.
    finer = run(a.cli, "--db", db, "tallies", "--format", "csv", "--grid", "equal:12x5")
    notes = finer.stderr.count("positions known only to grid equal:6x5; zone values not computed on grid equal:12x5")
    if finer.stdout.strip() != "match_id,metric,band,lane,num,den" or notes != len(MATCHES):
        failures += 1
        print("zone-tags on equal:12x5: expected no rows and %d notes, got %d rows, %d notes"
              % (len(MATCHES), len(finer.stdout.splitlines()) - 1, notes))
    if frames != {"acting", "us", "ground"}:
        failures += 1
        print("the matches should cover the three frames, they cover %s" % sorted(frames))
    if failures:
        print("%d failures" % failures)
        return 1
    print("mapped import reproduces the native tallies for every layout")
    return 0


if __name__ == "__main__":
    sys.exit(main())
