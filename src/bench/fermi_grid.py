#!/usr/bin/env python3
"""The fermi grid against the classical one, as users run it: `stellabar grid` 1000x1000 rho-T to CSV
(the options of side_by_side.py's grid job) with --electrons fermi and with the classical default, whole
processes through the launcher, wall time, alternating in every round; prints medians, the ratio
and the load average before and after. Issue 10's goal: fermi <= 3x classical.

    /usr/bin/python3 src/bench/fermi_grid.py [--rounds 5] [--points 1000] [--stellabar PATH ...]

Several --stellabar launchers (e.g. an older checkout's, for before/after) are timed side by side in
the same rounds, each with both equations of state."""
import argparse
import os
import statistics
import subprocess
import sys
import tempfile
import time
from pathlib import Path

HERE = Path(__file__).resolve().parent
LAUNCHER = HERE.parents[1] / "stellabar"


def grid(launcher, points, electrons, out):
    return [str(launcher), "grid", "--rho-range", "1e-10:1e8", "--temp-range", "1e3:1e10", "--points", str(points),
            "--chart-formats", "png", "--electrons", electrons, "--out", out]


def timed(argv):
    start = time.perf_counter()
    status = subprocess.run(argv, stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL).returncode
    elapsed = time.perf_counter() - start
    if status != 0:
        sys.exit(f"fermi_grid: {' '.join(argv)} exited with {status}")
    return elapsed


def main():
    parser = argparse.ArgumentParser()
    parser.add_argument("--rounds", type=int, default=5)
    parser.add_argument("--points", type=int, default=1000)
    parser.add_argument("--stellabar", action="append", help="a launcher to time (default: this checkout's)")
    args = parser.parse_args()
    launchers = [Path(p).resolve() for p in (args.stellabar or [str(LAUNCHER)])]
    load_before = os.getloadavg()
    with tempfile.TemporaryDirectory(prefix="stellabar-fermi-grid") as work:
        for launcher in launchers:  # builds the jar and the start-up archive if needed
            subprocess.run([str(launcher), "--version"], stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL)
        runs = [(launcher, electrons) for launcher in launchers for electrons in ("classical", "fermi")]
        times = {run: [] for run in runs}
        for r in range(args.rounds):
            for launcher, electrons in (runs if r % 2 == 0 else runs[::-1]):
                times[(launcher, electrons)].append(
                    timed(grid(launcher, args.points, electrons, f"{work}/{electrons}")))
    load_after = os.getloadavg()
    print(f"{os.cpu_count()} cores; {args.rounds} rounds, alternating; `grid` {args.points}x{args.points} rho-T to CSV"
          f" and ECSV (charts: png), wall time of whole processes, median (min-max); load average"
          f" {load_before[0]:.1f} before, {load_after[0]:.1f} after\n")
    print("| launcher | classical | fermi | fermi / classical | goal |")
    print("| --- | --- | --- | --- | --- |")
    for launcher in launchers:
        c, f = times[(launcher, "classical")], times[(launcher, "fermi")]
        cell = lambda t: f"{statistics.median(t):.2f} s ({min(t):.2f}-{max(t):.2f})"
        print(f"| {launcher} | {cell(c)} | {cell(f)} | {statistics.median(f) / statistics.median(c):.2f} | <= 3 |")


if __name__ == "__main__":
    main()
