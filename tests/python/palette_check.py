#!/usr/bin/python3
"""Outside check of the zone maps' value-suppressing palette (model/palette.h) with Debian's
python3-colorspacious, which carries the colour-vision matrices of Machado, Oliveira &
Fernandes (2009) and the CAM02-UCS colour space (Luo, Cui & Li 2006):

  * our CIE L*a*b* of the nine scale stops equals colorspacious' "CIELab" (D65) to 0.05;
  * our simulated deuteranope and protanope colours of every palette cell equal colorspacious'
    "sRGB1+CVD" at severity 100 to 0.005 a channel (so the matrices in palette.cpp are the
    published ones);
  * neighbouring steps of every row stay at least 5 CAM02-UCS units apart for normal vision and
    both dichromacies (a CAM02-UCS unit is roughly one just-noticeable difference, from memory;
    5 is our choice, no published source).

Usage: /usr/bin/python3 tests/python/palette_check.py PATH_TO_palette_driver
"""
import json
import subprocess
import sys

try:
    from colorspacious import cspace_convert, deltaE
except ImportError:  # pragma: no cover
    print("python3-colorspacious is missing (apt install python3-colorspacious)", file=sys.stderr)
    sys.exit(2)

from outside import check, finish


def main():
    data = json.loads(subprocess.run([sys.argv[1]], capture_output=True, check=True).stdout)
    worst = 0.0
    for stop in data["stops"]:
        rgb = [int(stop["hex"][1 + 2 * k:3 + 2 * k], 16) / 255 for k in range(3)]
        theirs = cspace_convert(rgb, "sRGB1", "CIELab")
        worst = max(worst, max(abs(a - b) for a, b in zip(stop["lab"], theirs)))
    check(worst < 0.05, f"L*a*b* of the scale's stops agree with colorspacious (largest difference {worst:.4f})")

    worst = 0.0
    for row in data["rows"] + data["diverging_rows"]:
        for cell in row:
            for vision, name in (("deuteranopia", "deuteranomaly"), ("protanopia", "protanomaly")):
                theirs = cspace_convert(cell["rgb"], {"name": "sRGB1+CVD", "cvd_type": name, "severity": 100}, "sRGB1")
                theirs = [min(1.0, max(0.0, x)) for x in theirs]
                worst = max(worst, max(abs(a - b) for a, b in zip(cell[vision], theirs)))
    check(worst < 0.005, f"simulated dichromat colours agree with colorspacious' Machado 2009 (largest {worst:.5f})")

    for level, row in enumerate(data["rows"] + data["diverging_rows"]):
        kind = "sequential" if level < len(data["rows"]) else "diverging"
        level = level % len(data["rows"])
        if len(row) < 2:
            continue
        for vision in ("rgb", "deuteranopia", "protanopia"):
            least = min(deltaE(a[vision], b[vision], input_space="sRGB1") for a, b in zip(row, row[1:]))
            check(least >= 5, f"{kind} row {level} ({len(row)} steps), {vision if vision != 'rgb' else 'normal vision'}: "
                              f"neighbouring steps at least {least:.1f} CAM02-UCS apart")
    return finish()


if __name__ == "__main__":
    sys.exit(main())
