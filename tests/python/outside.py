"""What the outside checks in this folder share: a check that prints and remembers failures, a
run of the command line that stops the check (exit 2) when a step it needs fails, and the exit
status at the end (0 all held, 1 one failed)."""
import subprocess
import sys

FAILURES = []


def check(ok, what):
    print(("ok    " if ok else "FAIL  ") + what)
    if not ok:
        FAILURES.append(what)


def run(cli, db, *args):
    """`pitchloop --db DB ARGS...`'s standard output as bytes; exit 2 when it fails."""
    r = subprocess.run([cli, "--db", str(db), *args], capture_output=True)
    if r.returncode != 0:
        print("pitchloop " + " ".join(args) + " failed:\n" + r.stderr.decode(), file=sys.stderr)
        sys.exit(2)
    return r.stdout


def finish():
    if FAILURES:
        print(f"{len(FAILURES)} check(s) failed", file=sys.stderr)
        return 1
    return 0
