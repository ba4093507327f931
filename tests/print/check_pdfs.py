#!/usr/bin/python3
"""Outside check of the printed sheets (app/print): prepares a club file from the demo club
(sample-club/) with the pitchloop command line, plans and saves a session, writes the session
sheet and a match debrief with print_driver, then checks them with poppler (Debian's
poppler-utils), which shares no code with Qt's PDF writer:

  - pdfinfo: the sheet is one A4 portrait page, the debrief A4 landscape;
  - pdftoppm -r 50 -png: every page renders to a PNG of the page's shape;
  - pdftotext: the sheet holds each block's drill title and minutes (in the plan's order) and
    the plan's caution; the debrief holds every metric the command line's debrief lists as off
    target, with its zone.

What the PDFs must say comes from the command line's own output (plan --format json, debrief),
not from the printing code.

Usage: check_pdfs.py --cli PITCHLOOP --driver PRINT_DRIVER --source REPO --workdir DIR
"""

import argparse
import csv
import glob
import json
import os
import re
import shutil
import struct
import subprocess
import sys

SQUAD = "First team"
SESSION_DATE = "2026-09-29"  # Tuesday after match 8 (2026-09-26); match 9 on 2026-10-03: MD-4
MATCH = "KB-2026-08"
COACH = "D. Arkwright (head coach)"

failures = []


def check(ok, what):
    print(("ok    " if ok else "FAIL  ") + what)
    if not ok:
        failures.append(what)


def run(cmd, expect=0, env=None):
    r = subprocess.run(cmd, capture_output=True, text=True, env=env)
    if expect is not None and r.returncode != expect:
        sys.exit(f"{' '.join(cmd)} exited {r.returncode}, expected {expect}:\n{r.stdout}\n{r.stderr}")
    return r


def flat(text):
    """Whitespace (line breaks of the layout included) collapsed to single spaces."""
    return re.sub(r"\s+", " ", text).strip()


def png_size(path):
    with open(path, "rb") as f:
        head = f.read(24)
    if head[:8] != b"\x89PNG\r\n\x1a\n":
        return None
    return struct.unpack(">II", head[16:24])


def prepare(cli, source, work):
    club = os.path.join(work, "club.sqlite")
    matches = sorted(glob.glob(os.path.join(source, "sample-club", "matches", "*.json")))
    # The first nine matches are enough: the session and the debrief fall in match week 9.
    run([cli, "--db", club, "ingest", *matches[:9]])
    run([cli, "--db", club, "targets", "import", os.path.join(source, "sample-club", "targets.json")])
    run([cli, "--db", club, "drills", "import", os.path.join(source, "sample-club", "drills.json")])
    run([cli, "--db", club, "focus", "open", "--match", MATCH, "--metric",
         "pre_shot_passes_against", "--zone", "2,5", "--drill", "6", "--drill", "7", "--drill",
         "9", "--by", COACH, "--note", "their right side keeps overloading our left back"])
    # The season's schedule, written from the match files' own headers.
    fixtures = os.path.join(work, "fixtures.csv")
    with open(fixtures, "w", newline="") as f:
        w = csv.writer(f)
        w.writerow(["date", "kickoff", "opponent", "venue", "competition"])
        for path in matches:
            with open(path) as m:
                info = json.load(m)["match"]
            w.writerow([info["date"], "15:00", info["opponent"], info["venue"],
                        info.get("competition", "")])
    run([cli, "--db", club, "fixtures", "import", fixtures])
    plan = run([cli, "--db", club, "plan", SESSION_DATE, "--minutes", "90", "--players", "18",
                "--save", "--by", COACH, "--format", "json"])
    return club, json.loads(plan.stdout)


def render(pdf, work, stem, portrait):
    info = run(["pdfinfo", pdf]).stdout
    pages = int(re.search(r"^Pages:\s+(\d+)", info, re.M).group(1))
    w, h = map(float, re.search(r"^Page size:\s+([\d.]+) x ([\d.]+)", info, re.M).groups())
    # A4 is 595 × 842 points (210 × 297 mm).
    a4 = sorted((round(w), round(h))) == [595, 842]
    check(a4 and (h > w) == portrait,
          f"{os.path.basename(pdf)}: A4 {'portrait' if portrait else 'landscape'} "
          f"(pdfinfo: {w:.0f} x {h:.0f} pt)")
    prefix = os.path.join(work, stem)
    r = subprocess.run(["pdftoppm", "-r", "50", "-png", pdf, prefix], capture_output=True, text=True)
    check(r.returncode == 0, f"pdftoppm -r 50 -png {os.path.basename(pdf)} succeeds {r.stderr.strip()}")
    pngs = sorted(glob.glob(prefix + "-*.png"))
    check(len(pngs) == pages and pages >= 1, f"{stem}: {len(pngs)} PNG page(s) for {pages} PDF page(s)")
    for png in pngs:
        size = png_size(png)
        check(size is not None and size[0] > 100 and (size[1] > size[0]) == portrait,
              f"{os.path.basename(png)}: a PNG of {size[0] if size else '?'} x "
              f"{size[1] if size else '?'} px")
    return pages, flat(run(["pdftotext", pdf, "-"]).stdout)


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--cli", required=True)
    ap.add_argument("--driver", required=True)
    ap.add_argument("--source", required=True)
    ap.add_argument("--workdir", required=True)
    a = ap.parse_args()
    for tool in ("pdftoppm", "pdftotext", "pdfinfo"):
        if not shutil.which(tool):
            sys.exit(f"{tool} is missing: install Debian's poppler-utils")
    shutil.rmtree(a.workdir, ignore_errors=True)
    os.makedirs(a.workdir)
    club, plan = prepare(a.cli, a.source, a.workdir)

    # The session sheet.
    sheet = os.path.join(a.workdir, "sheet.pdf")
    run([a.driver, club, "sheet", SQUAD, SESSION_DATE, sheet])
    pages, text = render(sheet, a.workdir, "sheet", portrait=True)
    check(1 <= pages <= 2, f"the session sheet is one page, or two when the drill texts need it ({pages})")
    joined = " ".join(text.split())
    for b in plan["blocks"]:
        check(flat(b["title"]) in text, f"sheet names drill {b['drill_id']} '{b['title']}'")
        # Every coaching point in full, as the drill book holds it (nothing cut to fit).
        drill = json.loads(run([a.cli, "--db", club, "drills", "show", str(b["drill_id"]), "--format", "json"]).stdout)
        whole = all(" ".join(point.split()) in joined for point in drill["coaching_points"])
        check(whole, f"sheet gives every coaching point of drill {b['drill_id']} in full")
    check("…" not in text and "more coaching point" not in text, "sheet cuts no drill text")
    minutes = [int(m) for m in re.findall(r"\b(\d+) min\b", text)]
    wanted = [b["minutes"] for b in plan["blocks"]]
    it = iter(minutes)
    check(all(m in it for m in wanted),
          f"sheet gives the blocks' minutes {wanted} in order (found {minutes})")
    check(flat(plan["caution"]) in text, "sheet carries the plan's caution in full")
    check(plan["day"] in text and f"{plan['players']}" in text,
          f"sheet gives the microcycle day {plan['day']} and the players")

    # The debrief, drawn with an application of the driver's own.
    debrief = os.path.join(a.workdir, "debrief.pdf")
    runtime = os.path.join(a.workdir, "xdg-runtime")
    os.makedirs(runtime, mode=0o700)
    run([a.driver, "--own-app", club, "debrief", MATCH, debrief],
        env=dict(os.environ, XDG_RUNTIME_DIR=runtime))
    pages, text = render(debrief, a.workdir, "debrief", portrait=False)
    said = run([a.cli, "--db", club, "debrief", MATCH]).stdout
    # Each zone the command line lists as off target ("  <metric name> · <zone name>", then its
    # sentence and numbers indented by four) must appear on the sheet with the same words and
    # the same P(miss): one vocabulary (model/wording.h) for both.
    slipped = []
    section = None
    for line in said.splitlines():
        if line.startswith("Off target"):
            section = line
            continue
        if not line.strip() or not line.startswith("  "):
            section = None
            continue
        if not section or line.strip() == "none":
            continue
        if not line.startswith("    "):
            name, zone = line.strip().split(" · ", 1)
            slipped.append({"name": name, "zone": zone.split("  (")[0]})
        elif "P(miss)" in line:
            slipped[-1]["p_miss"] = re.search(r"P\(miss\) ([<>] )?[0-9.]+", line).group(0)
        else:
            slipped[-1]["sentence"] = line.strip()
    check(len(slipped) >= 1, f"the command line's debrief of {MATCH} lists slipped targets: {slipped}")
    joined = " ".join(text.split())
    for z in slipped:
        check(z["name"] in joined and z["zone"] in joined,
              f"debrief shows {z['name']} in {z['zone']} as the command line names them")
        check(z.get("p_miss", "?").replace("P(miss) ", "") in joined,
              f"debrief gives the same {z.get('p_miss')} as the command line")
        # Compared without white space and hyphens: the sheet wraps the sentence, and pdftotext
        # joins a word broken at its hyphen ("left-" / "back" reads "leftback").
        check(re.sub(r"[\s-]+", "", z.get("sentence", "?")) in re.sub(r"[\s-]+", "", text),
              f"debrief says it in the same plain words: {z.get('sentence')}")
    check(MATCH in text and "P(miss)" in text, "debrief names the match and gives P(miss)")

    # Bad input: no session that day gives exit code 2 and no file.
    missing = os.path.join(a.workdir, "none.pdf")
    r = run([a.driver, club, "sheet", SQUAD, "2026-09-30", missing], expect=2)
    check(not os.path.exists(missing) and "2026-09-30" in r.stderr,
          "no session on 2026-09-30: exit code 2, the date named, no file")

    if failures:
        print(f"{len(failures)} check(s) failed")
        return 1
    print("all checks passed")
    return 0


if __name__ == "__main__":
    sys.exit(main())
