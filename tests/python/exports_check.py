#!/usr/bin/python3
"""Outside check of Pitchloop's CSV (RFC 4180) and iCalendar (RFC 5545) exports.

Usage:
    /usr/bin/python3 tests/python/exports_check.py --cli PATH_TO_pitchloop \\
        --club-dir sample-club --workdir TMPDIR

Builds a fresh club file in TMPDIR from the demo club's files (matches 1-10, targets, drills,
fixtures), plus one extra match whose id is a spreadsheet formula ("=SUM(1+1)"), opens a focus,
plans and saves two sessions, then:
  * `export statuses` of the formula match is read back with Python's csv module (the
    standard library's RFC 4180 reader): one record per zone status of `status --format
    json`, the same numbers, every record ending in CRLF, and the formula id neutralised
    (stored as text with a leading apostrophe: "'=SUM(1+1)");
  * `export tallies` is read back with csv and compared with the club file's tally table
    read with Python's sqlite3 module (a path that shares no code with Pitchloop's writer);
  * `export calendar` is parsed with Debian's python3-icalendar: one VEVENT per saved session
    with DTSTART at the session's date and start time and DTEND its minutes later, one
    all-day VEVENT per open focus review, and every UID unique.
Exit status 0 when every check holds, 1 when one fails, 2 when the check cannot run.
"""
import argparse
import csv
import datetime
import io
import json
import pathlib
import shutil
import sqlite3
import subprocess
import sys

try:
    import icalendar
except ImportError:  # pragma: no cover
    print("python3-icalendar is missing (apt install python3-icalendar)", file=sys.stderr)
    sys.exit(2)

from outside import FAILURES, check, run


def main():
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

    # A match whose id a spreadsheet would run as a formula.
    source = json.loads((club_dir / "matches" / "KB-2026-11.json").read_text())
    source["match"]["id"] = "=SUM(1+1)"
    formula_file = work / "formula.json"
    formula_file.write_text(json.dumps(source))
    matches = sorted((club_dir / "matches").glob("KB-2026-*.json"))[:10]
    run(a.cli, db, "ingest", *map(str, matches), str(formula_file))
    run(a.cli, db, "targets", "import", str(club_dir / "targets.json"))
    run(a.cli, db, "drills", "import", str(club_dir / "drills.json"))
    run(a.cli, db, "fixtures", "import", str(club_dir / "fixtures.csv"))
    run(a.cli, db, "focus", "open", "--match", "KB-2026-08", "--metric",
        "pre_shot_passes_against", "--zone", "2,5", "--drill", "6", "--drill", "7",
        "--by", "check")
    for date, minutes in (("2026-09-29", 90), ("2026-09-30", 75)):
        run(a.cli, db, "plan", date, "--minutes", str(minutes), "--players", "18", "--save",
            "--by", "check")

    # Statuses: CSV read back equals the JSON the status verb prints.
    statuses_csv = work / "statuses.csv"
    run(a.cli, db, "export", "statuses", "=SUM(1+1)", "--out", str(statuses_csv))
    raw = statuses_csv.read_bytes()
    check(raw.count(b"\r\n") == raw.count(b"\n") and raw.endswith(b"\r\n"),
          "statuses.csv: every record ends in CRLF")
    rows = list(csv.DictReader(io.StringIO(raw.decode("utf-8"), newline="")))
    zones = json.loads(run(a.cli, db, "status", "=SUM(1+1)", "--format", "json"))["zones"]
    check(len(rows) == len(zones) > 0, f"statuses.csv: {len(rows)} records for {len(zones)} statuses")
    check(all(r["match_id"] == "'=SUM(1+1)" for r in rows),
          "statuses.csv: the formula id is neutralised to '=SUM(1+1) in every record")
    check(b'"\'=SUM(1+1)"' in raw, "statuses.csv: the neutralised id is quoted")
    agree = 0
    for r, z in zip(rows, zones):
        same = (int(r["band"]) == z["band"] and int(r["lane"]) == z["lane"]
                and r["metric"] == z["metric"] and r["state"] == z["state"]
                and abs(float(r["value"] or "nan") - z["value"]) <= 1e-5 * max(1, abs(z["value"]))
                if z["value"] is not None and r["value"] != "" else
                (int(r["band"]) == z["band"] and int(r["lane"]) == z["lane"]))
        agree += bool(same)
    check(agree == len(zones), f"statuses.csv: {agree}/{len(zones)} records agree with status --format json")

    # Tallies: CSV read back equals the club file's tally table.
    tallies_csv = work / "tallies.csv"
    run(a.cli, db, "export", "tallies", "--out", str(tallies_csv))
    with open(tallies_csv, newline="", encoding="utf-8") as f:
        reader = csv.reader(f)
        header = next(reader)
        got = sorted(tuple(r) for r in reader)
    check(header == ["match_id", "metric", "band", "lane", "num", "den"], "tallies.csv: header")
    con = sqlite3.connect(db)
    want = sorted(
        (("'" + code) if code[:1] in "=+-@" else code, metric, str(b), str(l), str(n), str(d))
        for code, metric, b, l, n, d in con.execute(
            "SELECT m.code, t.metric_id, t.band, t.lane, t.num, t.den "
            "FROM tally t JOIN match m ON m.id = t.match_id WHERE t.den <> 0"))
    check(len(got) == len(want) > 0 and got == want,
          f"tallies.csv: {len(got)} records equal the tally table's {len(want)} rows")

    # Calendar: sessions and review dates parse with python3-icalendar.
    ics = work / "week.ics"
    run(a.cli, db, "export", "calendar", "--start", "10:30", "--out", str(ics))
    cal = icalendar.Calendar.from_ical(ics.read_bytes())
    events = [c for c in cal.walk() if c.name == "VEVENT"]
    sessions = json.loads(run(a.cli, db, "sessions", "--format", "json"))
    focuses = [f for f in json.loads(run(a.cli, db, "focus", "list", "--format", "json"))]
    uids = [str(e["UID"]) for e in events]
    check(len(set(uids)) == len(uids), f"week.ics: {len(uids)} UIDs, all unique")
    check(len(events) == len(sessions) + len(focuses),
          f"week.ics: {len(events)} events for {len(sessions)} sessions and {len(focuses)} focus reviews")
    by_start = {}
    for e in events:
        start = e.decoded("DTSTART")
        by_start.setdefault(start.isoformat()[:10], []).append(e)
    for s in sessions:
        day = datetime.date.fromisoformat(s["date"])
        timed = [e for e in by_start.get(s["date"], [])
                 if isinstance(e.decoded("DTSTART"), datetime.datetime)]
        ok = len(timed) == 1
        if ok:
            start, end = timed[0].decoded("DTSTART"), timed[0].decoded("DTEND")
            ok = (start == datetime.datetime.combine(day, datetime.time(10, 30))
                  and end - start == datetime.timedelta(minutes=s["minutes"]))
        check(ok, f"week.ics: session {s['date']} runs 10:30 for {s['minutes']} min")
    all_day = [e for e in events if not isinstance(e.decoded("DTSTART"), datetime.datetime)]
    check(len(all_day) == len(focuses) and all(
        e.decoded("DTEND") - e.decoded("DTSTART") == datetime.timedelta(days=1) for e in all_day),
        "week.ics: each review date is one all-day event")
    check(all("qualified staff" in str(e.get("DESCRIPTION", "")) for e in events
              if isinstance(e.decoded("DTSTART"), datetime.datetime)),
          "week.ics: every session carries the caution")

    print(f"{'FAILED' if FAILURES else 'passed'}: {len(FAILURES)} failed checks")
    return 1 if FAILURES else 0


if __name__ == "__main__":
    sys.exit(main())
