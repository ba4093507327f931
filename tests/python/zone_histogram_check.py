#!/usr/bin/python3
"""Outside check of Pitchloop's zone binning for our pass origins.

Usage:
    /usr/bin/python3 tests/python/zone_histogram_check.py \\
        --cli PATH_TO_pitchloop --matches DIR --workdir TMPDIR
    /usr/bin/python3 tests/python/zone_histogram_check.py --self-test

What it does:
  (a) runs  PATH_TO_pitchloop --db TMPDIR/check.sqlite ingest DIR/*.json
      (a fresh database: an old TMPDIR/check.sqlite is removed first) and
      PATH_TO_pitchloop --db TMPDIR/check.sqlite tallies --format csv
      whose stdout is CSV with the header  match_id,metric,band,lane,num,den
      (default grid: 6 bands along the length x 5 lanes across, both 1-based,
      band 1 at our goal line, lane 1 at our right touchline; for metric
      pass_completion, den = number of OUR passes, any result, starting in
      that zone);
  (b) reads every DIR/*.json itself with the json module, puts our pass
      origins into our frame (conversion and clamping written here from the
      format rules in docs/match-format.md, not shared with the C++ code),
      and bins them per match with numpy.histogram2d (from Debian's
      python3-numpy) using edges numpy.linspace(0, L, 7) and
      numpy.linspace(0, W, 6) for that match's pitch;
  (c) compares, for every match and each of the 30 zones, numpy's count with
      the CLI's pass_completion den (a missing row counts as 0). A CLI row
      for an unknown match or a zone outside the grid is also a failed
      comparison.

Prints each mismatch, a line per match, and a closing line "N passed,
M failed" where N and M count zone-by-match comparisons. Exit status 0
only if every comparison agrees and at least one of our passes was
compared; 1 if not; 2 if the check could not be run (CLI missing or
failing, unreadable CSV or match file, duplicate match ids).

Boundary rule. numpy.histogram2d puts a value v in bin i when
edges[i] <= v < edges[i+1], except that the last bin also takes its right
edge: a point on an inner edge goes to the higher index, a point on the
far line to the last band/lane. Pitchloop uses the same rule. Both sides
must also compute the same floating-point edges for this to hold on an
edge: numpy 1.24's linspace(0, L, n + 1) gives edge k = k * (L / n)
(last edge set to exactly L), so the C++ side should compute edges the
same way and pick the zone with an upper-bound search, rather than
floor(x * n / L). A mismatch caused by a point lying exactly on an inner
edge is marked "on an edge" in the report.

Self-test: --self-test (or /usr/bin/python3 -m doctest on this file) runs
the examples below, which were worked out by hand.
"""

import argparse
import csv
import io
import json
import math
import os
import subprocess
import sys
from pathlib import Path

# numpy.histogram2d and numpy.linspace from Debian 12's python3-numpy (1.24).
import numpy

BANDS = 6           # along the length, band 1 at our goal line
LANES = 5           # across the width, lane 1 at our right touchline
CLAMP_M = 3.0       # up to this far outside the lines is clamped onto them
CSV_HEADER = "match_id,metric,band,lane,num,den"
METRIC = "pass_completion"

DATA_DIR = Path(__file__).resolve().parent.parent / "data"


class MatchError(Exception):
    """A match file this check cannot use (the CLI should reject it too)."""


class SetupError(Exception):
    """The check could not be run."""


def fmt(value):
    """Short number format used in messages: 105 -> '105', 127.4 -> '127.4'."""
    return f"{value:g}"


def is_number(value):
    return isinstance(value, (int, float)) and not isinstance(value, bool)


def clamp_checked(value, limit, name, where, what):
    """Clamp value into [0, limit] if it is at most CLAMP_M outside.

    >>> clamp_checked(-1.2, 68, "y", "m.json: events[3]", "width")
    0.0
    >>> clamp_checked(106.5, 105, "x", "m.json: events[3]", "length")
    105.0
    >>> clamp_checked(108.0, 105, "x", "m.json: events[3]", "length")
    105.0
    >>> try:
    ...     clamp_checked(127.4, 105, "x", "match.json: events[12]", "length")
    ... except MatchError as exc:
    ...     print(exc)
    match.json: events[12].x: 127.4 m is more than 3 m outside the pitch (length 105 m)
    """
    if not is_number(value) or not math.isfinite(value):
        raise MatchError(f"{where}.{name}: expected a number, found {value!r}")
    if value < -CLAMP_M or value > limit + CLAMP_M:
        raise MatchError(
            f"{where}.{name}: {fmt(value)} m is more than {fmt(CLAMP_M)} m "
            f"outside the pitch ({what} {fmt(limit)} m)")
    return float(min(max(value, 0.0), float(limit)))


def to_our_frame(x, y, length, width, mirrored):
    """Mirror a point through the pitch centre when `mirrored` is true.

    Used for opponent events in the "acting" frame and for every event of a
    "-x" period in the "ground" frame: x' = L - x, y' = W - y.

    >>> to_our_frame(88.0, 30.0, 105, 68, True)    # their shot, 17 m from our goal
    (17.0, 38.0)
    >>> to_our_frame(30.0, 20.0, 105, 68, False)
    (30.0, 20.0)
    """
    if mirrored:
        return (float(length) - x, float(width) - y)
    return (x, y)


def match_geometry(doc, name):
    """Return (L, W, frame, us_attack, period numbers) from a match document."""
    if not isinstance(doc, dict) or doc.get("format") != "pitchloop-match":
        raise MatchError(f"{name}: format: not a pitchloop-match file")
    if doc.get("version") != 1:
        raise MatchError(f"{name}: version: only version 1 is understood")
    match = doc.get("match")
    if not isinstance(match, dict):
        raise MatchError(f"{name}: match: required object missing")
    pitch = match.get("pitch") or {}
    length, width = pitch.get("length_m"), pitch.get("width_m")
    if not (is_number(length) and 90 <= length <= 120):
        raise MatchError(f"{name}: match.pitch.length_m: expected 90-120 m, found {length!r}")
    if not (is_number(width) and 45 <= width <= 90):
        raise MatchError(f"{name}: match.pitch.width_m: expected 45-90 m, found {width!r}")
    if not length > width:
        raise MatchError(f"{name}: match.pitch: length {fmt(length)} m must be "
                         f"greater than width {fmt(width)} m")
    periods = {p.get("n") for p in match.get("periods") or [] if isinstance(p, dict)}
    frame = match.get("frame")
    if frame not in ("acting", "us", "ground"):
        raise MatchError(f"{name}: match.frame: {frame!r} is not acting, us or ground")
    us_attack = None
    if frame == "ground":
        us_attack = match.get("us_attack")
        if not isinstance(us_attack, dict):
            raise MatchError(f'{name}: match.us_attack: required when frame is "ground"')
        for n in sorted(p for p in periods if isinstance(p, int)):
            if us_attack.get(str(n)) not in ("+x", "-x"):
                raise MatchError(f"{name}: match.us_attack: no direction (+x or -x) "
                                 f"for period {n}")
    return float(length), float(width), frame, us_attack, periods


def our_pass_origins(doc, name="match.json"):
    """Our pass origins in our frame, after clamping: [(event index, x, y)].

    Every event's position is checked (more than 3 m outside is an error),
    but only events with side "us" and type "pass" (any result) are returned.

    Ground frame, 100 x 64 pitch, we attack +x in period 1 and -x in period 2.
    A period-2 point (20, 10) is 20 m from the +x team's goal line, so it is
    80 m from ours and 54 m from our right touchline. The opponent's pass is
    checked for range but not returned.

    >>> doc = {"format": "pitchloop-match", "version": 1, "match": {
    ...     "pitch": {"length_m": 100, "width_m": 64},
    ...     "periods": [{"n": 1, "length_s": 2700}, {"n": 2, "length_s": 2700}],
    ...     "frame": "ground", "us_attack": {"1": "+x", "2": "-x"}},
    ...   "events": [
    ...     {"period": 1, "t": 1, "side": "us", "type": "pass", "result": "ok", "x": 20.0, "y": 10.0},
    ...     {"period": 2, "t": 1, "side": "us", "type": "pass", "result": "fail", "x": 20.0, "y": 10.0},
    ...     {"period": 2, "t": 2, "side": "us", "type": "carry", "result": "ok", "x": 50.0, "y": 50.0},
    ...     {"period": 2, "t": 3, "side": "opp", "type": "pass", "result": "ok", "x": 102.0, "y": 60.0},
    ...     {"period": 2, "t": 4, "side": "us", "type": "pass", "result": "ok", "x": 101.5, "y": -2.0}]}
    >>> our_pass_origins(doc)
    [(0, 20.0, 10.0), (1, 80.0, 54.0), (4, 0.0, 64.0)]

    The last one: x 101.5 is 1.5 m beyond the +x goal line, clamped to 100,
    mirrored to 0; y -2 clamped to 0, mirrored to 64.

    Acting frame, same pitch: our events keep their numbers, the opponent's
    are mirrored; a point 4 m outside is refused.

    >>> doc["match"]["frame"] = "acting"; del doc["match"]["us_attack"]
    >>> our_pass_origins(doc)
    [(0, 20.0, 10.0), (1, 20.0, 10.0), (4, 100.0, 0.0)]
    >>> doc["events"][3]["x"] = 104.0
    >>> try:
    ...     our_pass_origins(doc, "m.json")
    ... except MatchError as exc:
    ...     print(exc)
    m.json: events[3].x: 104 m is more than 3 m outside the pitch (length 100 m)
    """
    length, width, frame, us_attack, periods = match_geometry(doc, name)
    events = doc.get("events")
    if not isinstance(events, list) or not events:
        raise MatchError(f"{name}: events: at least one event is required")
    origins = []
    for i, ev in enumerate(events):
        where = f"{name}: events[{i}]"
        if not isinstance(ev, dict):
            raise MatchError(f"{where}: expected an object")
        period, side = ev.get("period"), ev.get("side")
        if period not in periods:
            raise MatchError(f"{where}.period: {period!r} is not listed in match.periods")
        if side not in ("us", "opp"):
            raise MatchError(f"{where}.side: {side!r} is not us or opp")
        x = clamp_checked(ev.get("x"), length, "x", where, "length")
        y = clamp_checked(ev.get("y"), width, "y", where, "width")
        if frame == "acting":
            mirrored = side == "opp"
        elif frame == "us":
            mirrored = False
        else:
            mirrored = us_attack[str(period)] == "-x"
        x, y = to_our_frame(x, y, length, width, mirrored)
        if side == "us" and ev.get("type") == "pass":
            origins.append((i, x, y))
    return origins


# Pitchloop treats a point within a micrometre of a zone line as on the line, so a position
# logged as 38.4 m goes to the higher zone even where k * (L / n) comes out as
# 38.400000000000006 in binary. The same rule here: inner edges lowered by that tolerance.
EDGE_TOLERANCE_M = 1e-6


def zone_edges(length, width):
    """Bin edges: numpy.linspace over each axis, inner edges lowered by EDGE_TOLERANCE_M.

    >>> [round(float(e), 5) for e in zone_edges(105, 68)[0]]
    [0.0, 17.5, 35.0, 52.5, 70.0, 87.5, 105.0]
    >>> [round(float(e), 5) for e in zone_edges(105, 68)[1]]
    [0.0, 13.6, 27.2, 40.8, 54.4, 68.0]
    """
    def edges(extent, n):
        e = numpy.linspace(0.0, float(extent), n + 1)
        e[1:-1] -= EDGE_TOLERANCE_M
        return e
    return edges(length, BANDS), edges(width, LANES)


def pass_origin_counts(doc, name="match.json"):
    """Count our pass origins per zone with numpy.histogram2d.

    Returns an int array of shape (6, 5); [band - 1, lane - 1].

    Hand calculation for tests/data/minimal-match.json: L = 105, W = 68,
    frame "acting", so our own events keep their coordinates. A band is
    105 / 6 = 17.5 m long, a lane 68 / 5 = 13.6 m wide.

        event  x      y      band                      lane
        [0]    35.0   34.0   3 (35/17.5 = 2.0: edge,   3 (34/13.6 = 2.5)
                                 goes up)
        [2]    62.0   15.5   4 (3.54)                  2 (1.14)
        [6]    65.0    8.0   4 (3.71)                  1 (0.59)
        [7]    78.0    4.0   5 (4.46)                  1 (0.29)
        [11]  105.0    0.0   6 (far line: last band)   1 (0.0)
        [13]   30.0   68.9   2 (1.71)                  5 (y clamped to 68,
                                                          far line: last lane)
        [14]   40.0   60.0   3 (2.29)                  5 (4.41)

    Event [4] is the opponent's pass and is not counted. Seven passes, in
    seven different zones:

    >>> doc = json.loads((DATA_DIR / "minimal-match.json").read_text())
    >>> counts = pass_origin_counts(doc, "minimal-match.json")
    >>> nonzero_zones(counts)
    [(2, 5, 1), (3, 3, 1), (3, 5, 1), (4, 1, 1), (4, 2, 1), (5, 1, 1), (6, 1, 1)]
    >>> int(counts.sum())
    7
    """
    length, width = zone_edges_input(doc, name)
    origins = our_pass_origins(doc, name)
    xs = numpy.array([o[1] for o in origins], dtype=float)
    ys = numpy.array([o[2] for o in origins], dtype=float)
    edges_x, edges_y = zone_edges(length, width)
    hist, _, _ = numpy.histogram2d(xs, ys, bins=[edges_x, edges_y])
    return hist.astype(int)


def zone_edges_input(doc, name):
    length, width, _, _, _ = match_geometry(doc, name)
    return length, width


def nonzero_zones(counts):
    """[(band, lane, count)] for zones with a non-zero count, 1-based."""
    return [(b + 1, l + 1, int(counts[b, l]))
            for b in range(counts.shape[0]) for l in range(counts.shape[1])
            if counts[b, l]]


def on_inner_edge(value, edges):
    inner = edges[1:-1]
    return any(abs(value - float(e)) <= 2 * EDGE_TOLERANCE_M for e in inner)


def run(cmd, what):
    try:
        proc = subprocess.run(cmd, capture_output=True, text=True, timeout=1800)
    except OSError as exc:
        raise SetupError(f"{what}: cannot run {cmd[0]}: {exc}") from exc
    except subprocess.TimeoutExpired as exc:
        raise SetupError(f"{what}: timed out") from exc
    if proc.returncode != 0:
        raise SetupError(f"{what}: exit status {proc.returncode}\n"
                         f"command: {' '.join(cmd)}\nstderr:\n{proc.stderr.rstrip()}")
    return proc.stdout


def parse_int(text, field, line_no):
    try:
        value = float(text)
    except ValueError:
        value = math.nan
    if not math.isfinite(value) or value != int(value):
        raise SetupError(f"tallies CSV line {line_no}: {field}: expected a whole "
                         f"number, found {text!r}")
    return int(value)


def parse_tallies(text):
    """pass_completion den per (match_id, band, lane) from the tallies CSV.

    >>> parse_tallies("match_id,metric,band,lane,num,den\\r\\n"
    ...               "A,pass_completion,3,5,1,2\\r\\nA,shots,3,5,0,4\\r\\n")
    {('A', 3, 5): 2}
    """
    lines = text.splitlines()
    if not lines or lines[0] != CSV_HEADER:
        first = lines[0] if lines else "(empty output)"
        raise SetupError(f"tallies CSV: header must be exactly {CSV_HEADER!r}, "
                         f"found {first!r}")
    dens = {}
    reader = csv.reader(io.StringIO("\n".join(lines[1:])))
    for line_no, row in enumerate(reader, start=2):
        if not row:
            continue
        if len(row) != 6:
            raise SetupError(f"tallies CSV line {line_no}: expected 6 fields, "
                             f"found {len(row)}: {row!r}")
        match_id, metric = row[0], row[1]
        if metric != METRIC:
            continue
        band = parse_int(row[2], "band", line_no)
        lane = parse_int(row[3], "lane", line_no)
        den = parse_int(row[5], "den", line_no)
        key = (match_id, band, lane)
        if key in dens:
            raise SetupError(f"tallies CSV line {line_no}: second {METRIC} row "
                             f"for match {match_id} band {band} lane {lane}")
        dens[key] = den
    return dens


def self_test():
    import doctest
    result = doctest.testmod(sys.modules[__name__], verbose=False)
    print(f"{result.attempted - result.failed} passed, {result.failed} failed")
    return 0 if result.failed == 0 and result.attempted > 0 else 1


def main(argv=None):
    parser = argparse.ArgumentParser(
        description="Compare pitchloop's pass_completion zone denominators "
                    "with numpy.histogram2d of our pass origins.")
    parser.add_argument("--cli", help="path to the pitchloop executable")
    parser.add_argument("--matches", help="directory of *.json match files")
    parser.add_argument("--workdir", help="scratch directory for check.sqlite")
    parser.add_argument("--self-test", action="store_true",
                        help="run the worked examples in this file and exit")
    args = parser.parse_args(argv)
    if args.self_test:
        return self_test()
    if not (args.cli and args.matches and args.workdir):
        parser.error("--cli, --matches and --workdir are required")

    try:
        files = sorted(Path(args.matches).glob("*.json"))
        if not files:
            raise SetupError(f"{args.matches}: no *.json match files")

        # (b) our own reading of the files.
        expected = {}          # match_id -> (counts, origins, edges, file)
        for path in files:
            try:
                doc = json.loads(path.read_text(encoding="utf-8"))
            except (OSError, ValueError) as exc:
                raise SetupError(f"{path}: not readable as JSON: {exc}") from exc
            try:
                counts = pass_origin_counts(doc, path.name)
                origins = our_pass_origins(doc, path.name)
                edges = zone_edges(*zone_edges_input(doc, path.name))
            except MatchError as exc:
                raise SetupError(str(exc)) from exc
            match_id = doc["match"].get("id")
            if not isinstance(match_id, str) or not match_id:
                raise SetupError(f"{path.name}: match.id: non-empty string required")
            if match_id in expected:
                raise SetupError(f"{path.name}: match.id {match_id!r} also used by "
                                 f"{expected[match_id][3]}")
            expected[match_id] = (counts, origins, edges, path.name)

        # (a) the CLI, on a fresh database.
        workdir = Path(args.workdir)
        workdir.mkdir(parents=True, exist_ok=True)
        db = workdir / "check.sqlite"
        for stale in (db, Path(f"{db}-wal"), Path(f"{db}-shm"), Path(f"{db}-journal")):
            if stale.exists():
                stale.unlink()
        cli = os.fspath(args.cli)
        run([cli, "--db", os.fspath(db), "ingest"] + [os.fspath(p) for p in files],
            "pitchloop ingest")
        dens = parse_tallies(run([cli, "--db", os.fspath(db), "tallies", "--format", "csv"],
                                 "pitchloop tallies"))
    except SetupError as exc:
        print(f"zone_histogram_check: {exc}", file=sys.stderr)
        return 2

    # (c) compare zone by zone.
    passed = failed = 0
    total_passes = 0
    for match_id in sorted(expected):
        counts, origins, (edges_x, edges_y), fname = expected[match_id]
        total_passes += int(counts.sum())
        bad_here = 0
        for b in range(BANDS):
            for l in range(LANES):
                want = int(counts[b, l])
                got = dens.get((match_id, b + 1, l + 1), 0)
                if want == got:
                    passed += 1
                    continue
                failed += 1
                bad_here += 1
                print(f"MISMATCH {match_id} band {b + 1} lane {l + 1}: "
                      f"numpy {want}, pitchloop {got}")
                for i, x, y in origins:
                    bx = min(int(numpy.searchsorted(edges_x, x, side="right")) - 1, BANDS - 1)
                    ly = min(int(numpy.searchsorted(edges_y, y, side="right")) - 1, LANES - 1)
                    if (bx, ly) == (b, l):
                        edge = (" (on an edge)" if on_inner_edge(x, edges_x)
                                or on_inner_edge(y, edges_y) else "")
                        print(f"    {fname}: events[{i}] our-frame x={x!r} y={y!r}{edge}")
        print(f"{match_id} ({fname}): {int(counts.sum())} of our passes, "
              f"{BANDS * LANES - bad_here} of {BANDS * LANES} zones agree")
    for (match_id, band, lane), den in sorted(dens.items()):
        if match_id not in expected:
            failed += 1
            print(f"MISMATCH {match_id} band {band} lane {lane}: "
                  f"pitchloop {den}, but no such match in {args.matches}")
        elif not (1 <= band <= BANDS and 1 <= lane <= LANES):
            failed += 1
            print(f"MISMATCH {match_id} band {band} lane {lane}: "
                  f"pitchloop {den}, zone outside the {BANDS} x {LANES} grid")

    print(f"{passed} passed, {failed} failed")
    if total_passes == 0:
        print("no pass of ours was found in the match files: nothing was really compared",
              file=sys.stderr)
    return 0 if failed == 0 and passed > 0 and total_passes > 0 else 1


if __name__ == "__main__":
    sys.exit(main())
