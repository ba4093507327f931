#!/usr/bin/env python3
"""The app never sends a coach to the command line: no text the app shows (qsTr/tr strings in
qml/, app/desktop/, app/print/ and model/, which the app prints and whose messages it shows)
may contain a Pitchloop command or option. Comments are not shown and are skipped; main.cpp
parses the app's own command line (--db, --self-test) and is left out."""
import pathlib
import re
import sys
import tempfile

# A command ("pitchloop targets set", "pitchloop … fixtures import"), an option ("--zone"),
# or a mention of the command line or a terminal.
COMMAND = re.compile(r"\bpitchloop\s+[a-z…]|(^|[\s(])--[a-z]")  # the program's name is lower-case
MENTION = re.compile(r"command line|command-line|terminal", re.IGNORECASE)
# A shown string: qsTr("…") in QML; tr("…"), QStringLiteral("…") and plain "…" literals in C++.
QML_TEXT = re.compile(r'qsTr\(\s*"((?:[^"\\]|\\.)*)"')
CPP_TEXT = re.compile(r'"((?:[^"\\]|\\.)*)"')


def strip_comments(text, cpp):
    text = re.sub(r"/\*.*?\*/", lambda m: "\n" * m.group(0).count("\n"), text, flags=re.S)
    return re.sub(r"//[^\n]*", "", text) if cpp else re.sub(r"(?m)^\s*//[^\n]*", "", text)


def scan(root):
    files = sorted((root / "qml").rglob("*.qml"))
    files += [p for p in sorted((root / "app" / "desktop").glob("*.cpp")) if p.name != "main.cpp"]
    # The printed sheets are made from the app too, and the model's messages (bad input, refused
    # files) are shown by the app as they are: both reach the same people.
    files += sorted((root / "app" / "print").glob("*.cpp"))
    files += sorted((root / "model").glob("*.cpp"))
    problems = []
    for path in files:
        cpp = path.suffix == ".cpp"
        text = strip_comments(path.read_text(encoding="utf-8"), cpp)
        for lineno, line in enumerate(text.splitlines(), 1):
            for m in (CPP_TEXT if cpp else QML_TEXT).finditer(line):
                if COMMAND.search(m.group(1)) or MENTION.search(m.group(1)):
                    problems.append(f"{path.relative_to(root)}:{lineno}: \"{m.group(1)}\"")
    return files, problems


def self_check():
    """The check can fail: planted strings are found, comments and the product's name are not."""
    with tempfile.TemporaryDirectory() as d:
        root = pathlib.Path(d)
        (root / "qml").mkdir()
        (root / "app" / "desktop").mkdir(parents=True)
        (root / "app" / "print").mkdir(parents=True)
        (root / "qml" / "Page.qml").write_text(
            '// pitchloop targets set in a comment is fine\n'
            'Label { text: qsTr("Import the schedule with pitchloop fixtures import") }\n'
            'Label { text: qsTr("Pitchloop match files") }\n', encoding="utf-8")
        (root / "app" / "desktop" / "view.cpp").write_text(
            'm_note = tr("Use the command line to set targets");\n'
            'm_hint = tr("see --help");\n', encoding="utf-8")
        _, problems = scan(root)
        found = sorted(p.split(":")[0] + ":" + p.split(":")[1] for p in problems)
        expected = ["app/desktop/view.cpp:1", "app/desktop/view.cpp:2", "qml/Page.qml:2"]
        print("\n".join(problems))
        print("self-check:", "ok" if found == expected else f"expected {expected}, found {found}")
        return 0 if found == expected else 1


def main():
    if len(sys.argv) > 1 and sys.argv[1] == "--self-check":
        return self_check()
    root = pathlib.Path(sys.argv[1] if len(sys.argv) > 1 else ".")
    files, problems = scan(root)
    for p in problems:
        print(p)
    print(f"{len(files)} files read, {len(problems)} shown strings name a command or the command line")
    return 1 if problems else 0


if __name__ == "__main__":
    sys.exit(main())
