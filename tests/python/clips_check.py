#!/usr/bin/python3
"""Outside check of the moments behind a zone and their clip lists (docs/moments.md).

Usage:
    /usr/bin/python3 tests/python/clips_check.py --cli PATH_TO_pitchloop \\
        --club-dir sample-club --workdir TMPDIR

Builds a club file in TMPDIR from six demo matches, then:
  * for every metric of one match, `moments --format csv` over the whole pitch is read with
    Python's csv module (RFC 4180) and added up per zone the way docs/moments.md says
    (num: counts = success; den: success + no_success for shares, exposure rows for
    per-exposure metrics, 1 a match for per-match counts); the sums must equal `tallies
    --format csv` zone by zone, and the last-5 window must equal the five matches' tallies;
  * `export clips --format vtt` is parsed by a reader written here from the W3C WebVTT
    rules (https://www.w3.org/TR/webvtt1/, "file structure" and "cue timings"): the file
    starts with "WEBVTT", blocks are separated by blank lines, a NOTE block holds no "-->",
    each cue has an optional identifier line, then `hh:mm:ss.ttt --> hh:mm:ss.ttt` with
    minutes and seconds below 60 and an end after the start, then text lines holding no
    "-->"; chapter cues must not overlap, so starts are increasing and each starts at or after
    the previous end;
  * `export clips --format csv` is read with csv: one row per moment, each inside its clip's
    start and end, the clip times equal to the WebVTT cue times, and lead-in and lead-out
    moved by the options as asked (including a second half that starts at 47:30 in the video).
Exit status 0 when every check holds, 1 when one fails, 2 when the check cannot run.
"""
import argparse
import collections
import csv
import io
import json
import pathlib
import re
import shutil
import subprocess
import sys

from outside import check, finish
from outside import run as run_bytes

TIMING = re.compile(r"^(\d{2,}):([0-5]\d):([0-5]\d)\.(\d{3}) --> (\d{2,}):([0-5]\d):([0-5]\d)\.(\d{3})(?: .*)?$")


def run(cli, db, *args):
    return run_bytes(cli, db, *args).decode()


def parse_webvtt(text):
    """Cues as (start, end, lines) after the W3C WebVTT file structure; raises ValueError."""
    if text.startswith("\ufeff"):
        text = text[1:]
    lines = text.replace("\r\n", "\n").replace("\r", "\n").split("\n")
    first = lines[0]
    if not (first == "WEBVTT" or first.startswith("WEBVTT ") or first.startswith("WEBVTT\t")):
        raise ValueError("the first line is not WEBVTT")
    blocks, block = [], []
    for line in lines[1:]:
        if line == "":
            if block:
                blocks.append(block)
            block = []
        else:
            block.append(line)
    if block:
        blocks.append(block)
    cues = []
    for b in blocks:
        if b[0] == "NOTE" or b[0].startswith("NOTE ") or b[0].startswith("NOTE\t"):
            if any("-->" in line for line in b):
                raise ValueError("a NOTE block holds -->")
            continue
        timing_at = 0 if "-->" in b[0] else 1
        if timing_at == 1 and len(b) < 2:
            raise ValueError(f"cue without a timing line: {b}")
        m = TIMING.match(b[timing_at])
        if not m:
            raise ValueError(f"bad cue timing line: {b[timing_at]!r}")
        g = [int(x) for x in m.groups()]
        start = g[0] * 3600 + g[1] * 60 + g[2] + g[3] / 1000
        end = g[4] * 3600 + g[5] * 60 + g[6] + g[7] / 1000
        if end <= start:
            raise ValueError(f"cue ends before it starts: {b[timing_at]}")
        text_lines = b[timing_at + 1:]
        if any("-->" in line for line in text_lines):
            raise ValueError("cue text holds -->")
        cues.append((start, end, text_lines))
    return cues


def reader_refuses_bad_files():
    """The reader must be able to fail: each of these breaks one rule."""
    bad = ["WEBVT\n\n00:00:01.000 --> 00:00:02.000\nx\n",
           "WEBVTT\n\n00:00:01.000 -> 00:00:02.000\nx\n",
           "WEBVTT\n\n00:00:01.000 --> 00:00:01.000\nx\n",
           "WEBVTT\n\n00:61:01.000 --> 00:62:02.000\nx\n",
           "WEBVTT\n\n00:00:01.000 --> 00:00:02.000\na --> b\n",
           "WEBVTT\n\nNOTE a --> b\n"]
    refused = 0
    for text in bad:
        try:
            parse_webvtt(text)
        except ValueError:
            refused += 1
    check(refused == len(bad), f"the WebVTT reader refuses {refused} of {len(bad)} broken files")
    check(len(parse_webvtt("WEBVTT\n\n1\n00:00:01.000 --> 00:00:02.500\nhello\n")) == 1,
          "the WebVTT reader reads a minimal good file")


def main():
    reader_refuses_bad_files()
    ap = argparse.ArgumentParser()
    ap.add_argument("--cli", required=True)
    ap.add_argument("--club-dir", required=True)
    ap.add_argument("--workdir", required=True)
    a = ap.parse_args()
    club_dir = pathlib.Path(a.club_dir)
    work = pathlib.Path(a.workdir)
    shutil.rmtree(work, ignore_errors=True)
    work.mkdir(parents=True)
    db = work / "club.sqlite"
    matches = sorted((club_dir / "matches").glob("KB-2026-*.json"))[:6]
    run(a.cli, db, "ingest", *map(str, matches))
    match = "KB-2026-06"
    metric_ids = [line.split()[0] for line in run(a.cli, db, "metrics", "list").splitlines() if line.strip()]
    check(len(metric_ids) >= 7, f"{len(metric_ids)} metrics to check")

    def tallies(match_id, metric):
        rows = csv.DictReader(io.StringIO(run(a.cli, db, "tallies", "--format", "csv",
                                               "--match", match_id, "--metric", metric)))
        return {(int(r["band"]), int(r["lane"])): (int(r["num"]), int(r["den"])) for r in rows}

    specs = {m: json.loads(run(a.cli, db, "metrics", "show", m)) for m in metric_ids}
    for metric in metric_ids:
        for window, ids in (("match", [match]), ("last5", [f"KB-2026-0{i}" for i in range(2, 7)])):
            text = run(a.cli, db, "moments", match, "--metric", metric, "--window", window, "--format", "csv")
            check(text.count("\r\n") == text.count("\n"), f"{metric} {window}: every record ends in CRLF")
            rows = list(csv.DictReader(io.StringIO(text, newline="")))
            per = specs[metric].get("per", "items")
            per = per if isinstance(per, str) else "events"
            sums = collections.defaultdict(lambda: [0, 0])
            for r in rows:
                z = (int(r["band"]), int(r["lane"]))
                if r["counts"] == "success":
                    sums[z][0] += 1
                if per == "items" and r["counts"] in ("success", "no_success"):
                    sums[z][1] += 1
                if r["counts"] == "exposure":
                    sums[z][1] += 1
            expected = collections.defaultdict(lambda: [0, 0])
            for mid in ids:
                for z, (num, den) in tallies(mid, metric).items():
                    expected[z][0] += num
                    expected[z][1] += den
            if per == "match":  # the den of a per-match count is the matches
                for z in expected:
                    sums[z][1] = expected[z][1]
            zones = set(sums) | set(expected)
            bad = [z for z in zones if list(sums[z]) != list(expected[z])]
            check(not bad, f"{metric} {window}: moments add up to the tallies in all {len(zones)} zones"
                  + (f" (first difference {bad[0]}: {sums[bad[0]]} vs {expected[bad[0]]})" if bad else ""))

    # Clip lists: the regain moments of the busiest zone with moments in both halves.
    everywhere = list(csv.DictReader(io.StringIO(run(a.cli, db, "moments", match, "--metric", "regain_5s",
                                                     "--format", "csv"), newline="")))
    halves = collections.defaultdict(set)
    count = collections.Counter()
    for r in everywhere:
        halves[(r["band"], r["lane"])].add(r["period"])
        count[(r["band"], r["lane"])] += 1
    busiest = max((z for z in count if halves[z] >= {"1", "2"}), key=lambda z: count[z])
    zone = ",".join(busiest)
    vtt = run(a.cli, db, "export", "clips", match, "--metric", "regain_5s", "--zone", zone, "-o", "-")
    try:
        cues = parse_webvtt(vtt)
        check(True, f"WebVTT parses: {len(cues)} cues")
    except ValueError as e:
        check(False, f"WebVTT parses: {e}")
        cues = []
    check(all(b[0] >= a[1] for a, b in zip(cues, cues[1:])), "chapter cues never overlap, starts increase")
    clips_csv = run(a.cli, db, "export", "clips", match, "--metric", "regain_5s", "--zone", zone,
                    "--format", "csv", "-o", "-")
    rows = list(csv.DictReader(io.StringIO(clips_csv, newline="")))
    moments = list(csv.DictReader(io.StringIO(run(a.cli, db, "moments", match, "--metric", "regain_5s",
                                                  "--zone", zone, "--format", "csv"), newline="")))
    check(len(rows) == len(moments) and len(rows) > 0, f"one clip row per moment ({len(rows)})")
    by_clip = {}
    for r in rows:
        by_clip.setdefault(int(r["clip"]), (float(r["start_s"]), float(r["end_s"])))
    check([(round(s, 3), round(e, 3)) for s, e, _ in cues] == [by_clip[k] for k in sorted(by_clip)],
          "CSV clip times equal the WebVTT cue times")
    check(sum(len(t) for _, _, t in cues) == len(rows), "every moment is a line of its cue")

    # Lead-in/out and a second half that starts at 47:30 in the video.
    def first_half_and_second(args):
        out = run(a.cli, db, "export", "clips", match, "--metric", "regain_5s", "--zone", zone,
                  "--format", "csv", "-o", "-", *args)
        return list(csv.DictReader(io.StringIO(out, newline="")))
    shifted = first_half_and_second(["--period-start", "2=47:30", "--lead-in", "3", "--lead-out", "1"])
    second = [r for r in shifted if r["period"] == "2"]
    moments2 = [m for m in moments if m["period"] == "2"]
    if second and moments2:
        # the cue of the first 2nd-half moment starts 3 s before the moment's first touch, which
        # is at most the moment's time: so it starts before 2850 + t and no later than 2850 + t - 3
        t = float(moments2[0]["period_clock"].split(":")[0]) * 60 + float(moments2[0]["period_clock"].split(":")[1])
        start = float(second[0]["start_s"])
        check(start <= 2850 + t - 3 + 1e-6 and start >= 2850 - 3, f"2nd half placed at 47:30 in the video (start {start})")
    else:
        check(False, "the zone has moments in the 2nd half to place")
    # Bad input changes nothing and says what is wrong.
    r = subprocess.run([a.cli, "--db", str(db), "export", "clips", match, "--metric", "regain_5s",
                        "--window", "last5", "-o", str(work / "x.vtt")], capture_output=True)
    check(r.returncode == 2 and b"one match's video" in r.stderr and not (work / "x.vtt").exists(),
          "a window of several matches is refused for a clip list, nothing written")

    return finish()


if __name__ == "__main__":
    sys.exit(main())
