#!/usr/bin/python3
"""Validate Pitchloop match files against docs/match.schema.json.

Usage:
    /usr/bin/python3 tests/python/validate_matches.py [--expect-invalid] SCHEMA FILE_OR_DIR...

Each FILE_OR_DIR is a match file or a directory; for a directory every
*.json file directly inside it is checked (not sub-directories, so that
tests/data/bad-schema/ is never picked up by accident from tests/data/).

Normal mode: every file must be valid. With --expect-invalid every file
must be REJECTED by the schema (used on tests/data/bad-schema/, a folder
of deliberately broken files). A file that is not JSON at all counts as
failed in both modes: it tests nothing about the schema.

Prints one line per file, then a closing line "N passed, M failed".
Exit status: 0 if nothing failed, 1 if a file failed (or no file was
found), 2 for a usage error or an unusable schema.

Needs only Debian 12's python3-jsonschema (4.10.3), which has
Draft202012Validator. Calendar dates are checked with the validator's
own "date" format checker (standard library only, no extra packages).
"""

import argparse
import json
import sys
from pathlib import Path

try:
    import jsonschema
    from jsonschema import Draft202012Validator
except ImportError as exc:  # pragma: no cover - environment problem
    sys.stderr.write(
        "validate_matches.py: needs python3-jsonschema >= 4.0 "
        f"(Draft 2020-12 support): {exc}\n")
    sys.exit(2)


def collect_files(paths):
    """Expand the command-line paths into a sorted, de-duplicated list."""
    found = []
    for raw in paths:
        path = Path(raw)
        if path.is_dir():
            found.extend(sorted(p for p in path.glob("*.json") if p.is_file()))
        elif path.is_file():
            found.append(path)
        else:
            raise FileNotFoundError(f"{raw}: no such file or directory")
    seen = set()
    unique = []
    for p in found:
        key = p.resolve()
        if key not in seen:
            seen.add(key)
            unique.append(p)
    return unique


def error_location(error):
    """Render an error's instance path the way our reader names fields."""
    text = ""
    for part in error.absolute_path:
        if isinstance(part, int):
            text += f"[{part}]"
        else:
            text += ("." if text else "") + str(part)
    return text or "(top level)"


def best_errors(validator, document, limit=3):
    """Return up to `limit` readable messages, most relevant first."""
    errors = sorted(validator.iter_errors(document),
                    key=lambda e: (list(map(str, e.absolute_path)), e.message))
    if not errors:
        return []
    best = jsonschema.exceptions.best_match(errors)
    ordered = [best] + [e for e in errors if e is not best]
    return [f"{error_location(e)}: {e.message}" for e in ordered[:limit]]


def main(argv=None):
    parser = argparse.ArgumentParser(
        description="Validate Pitchloop match files (*.json) against the "
                    "match schema (JSON Schema draft 2020-12).")
    parser.add_argument("--expect-invalid", action="store_true",
                        help="every given file must fail validation")
    parser.add_argument("schema", help="path to docs/match.schema.json")
    parser.add_argument("paths", nargs="+", metavar="FILE_OR_DIR",
                        help="match files, or directories of *.json files")
    args = parser.parse_args(argv)

    try:
        with open(args.schema, encoding="utf-8") as fh:
            schema = json.load(fh)
        Draft202012Validator.check_schema(schema)
    except (OSError, ValueError) as exc:
        print(f"{args.schema}: cannot read schema: {exc}", file=sys.stderr)
        return 2
    except jsonschema.exceptions.SchemaError as exc:
        print(f"{args.schema}: not a valid draft 2020-12 schema: {exc.message}",
              file=sys.stderr)
        return 2

    validator = Draft202012Validator(
        schema, format_checker=Draft202012Validator.FORMAT_CHECKER)

    try:
        files = collect_files(args.paths)
    except FileNotFoundError as exc:
        print(str(exc), file=sys.stderr)
        return 2

    passed = failed = 0
    for path in files:
        try:
            with open(path, encoding="utf-8") as fh:
                document = json.load(fh)
        except (OSError, ValueError) as exc:
            print(f"FAIL {path}: not readable as JSON: {exc}")
            failed += 1
            continue

        messages = best_errors(validator, document)
        if args.expect_invalid:
            if messages:
                print(f"PASS {path}: rejected as expected: {messages[0]}")
                passed += 1
            else:
                print(f"FAIL {path}: accepted, but this file should be invalid")
                failed += 1
        else:
            if messages:
                print(f"FAIL {path}: " + "; ".join(messages))
                failed += 1
            else:
                print(f"PASS {path}")
                passed += 1

    if not files:
        print("no *.json files found", file=sys.stderr)
    print(f"{passed} passed, {failed} failed")
    return 0 if failed == 0 and files else 1


if __name__ == "__main__":
    sys.exit(main())
