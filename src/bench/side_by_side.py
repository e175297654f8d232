#!/usr/bin/env python3
"""Side-by-side speed of stellabar and numpy/scipy scripts doing the same jobs (scripts/), as whole
processes, alternating A and B in every round, wall time; prints medians and ratios as a Markdown
table. Run from anywhere with Debian's python3 (numpy, scipy):

    /usr/bin/python3 src/bench/side_by_side.py [--rounds 5] [--jmh]

--jmh also builds the JMH benchmarks (mvn -P bench package) and compares the in-memory EOS kernel
(EosBenchmark.millionGridPoints) with scripts/eos_kernel.py. The launcher is warmed first (jar
and start-up archive built), so start-up is measured as users see it on every later call."""
import argparse
import json
import os
import platform
import statistics
import subprocess
import sys
import tempfile
import time
from pathlib import Path

HERE = Path(__file__).resolve().parent
PROJECT = HERE.parents[1]
LAUNCHER = PROJECT / "stellabar"
PYTHON = "/usr/bin/python3"
SCRIPTS = HERE / "scripts"


def timed(argv, stdout_path):
    with open(stdout_path, "wb") as out:
        start = time.perf_counter()
        status = subprocess.run(argv, stdout=out, stderr=subprocess.DEVNULL, cwd=SCRIPTS).returncode
        elapsed = time.perf_counter() - start
    if status != 0:
        sys.exit(f"side_by_side: {' '.join(map(str, argv))} exited with {status}")
    return elapsed


def jobs(work):
    grid = ["grid", "--rho-range", "1e-10:1e8", "--temp-range", "1e3:1e10", "--points", "1000",
            "--chart-formats", "png"]
    return [
        ("`grid` 1000x1000 rho-T to CSV (charts: png)",
         # one table in one format, as the script writes: since ECSV joined the default formats
         # a bare --out writes CSV and ECSV, twice the work
         [LAUNCHER, *grid, "--format", "csv", "--out", f"{work}/grid-csv"],
         [PYTHON, "grid_csv.py", f"{work}/numpy-grid.csv"], 0.33),
        ("`grid` same to FITS", [LAUNCHER, *grid, "--format", "fits", "--out", f"{work}/grid-fits"], None, 1.2),
        ("`polytrope --index 3 --format json`", [LAUNCHER, "polytrope", "--index", "3", "--format", "json"],
         [PYTHON, "polytrope_json.py", "3"], 1.0),
        ("`sequence` 10^4 masses to CSV", [LAUNCHER, "sequence", "--steps", "10000", "--format", "csv"],
         [PYTHON, "sequence_csv.py", "10000"], 0.5),
        # the goal of 3 s was set for the demo of 8 stars and 232 files; the built-in demo has
        # since gained two stars on the fermi equation of state and the observed catalogue
        ("`model`: the demo as the goal was set (8 stars, 233 files; scripts/demo_eight_stars.toml)",
         [LAUNCHER, "model", "--quiet", "--out", f"{work}/demo-eight", str(SCRIPTS / "demo_eight_stars.toml")],
         None, 3.0),
        ("`model`: today's built-in demo (10 stars and the catalogue, 301 files)",
         [LAUNCHER, "model", "--quiet", "--out", f"{work}/demo"], None, None),
    ]


def jmh_kernel():
    subprocess.run(["mvn", "-q", "-B", "-P", "bench", "package", "-DskipTests"], cwd=PROJECT, check=True)
    with tempfile.NamedTemporaryFile(suffix=".json") as result:
        subprocess.run(["java", "-jar", str(PROJECT / "target/benchmarks.jar"), "EosBenchmark.millionGridPoints",
                        "-f", "1", "-wi", "3", "-i", "5", "-rf", "json", "-rff", result.name],
                       cwd=PROJECT, check=True, stdout=subprocess.DEVNULL)
        data = json.load(open(result.name))
    java_ms = data[0]["primaryMetric"]["score"]
    numpy_ms = float(subprocess.run([PYTHON, "eos_kernel.py"], cwd=SCRIPTS, check=True,
                                    capture_output=True, text=True).stdout)
    return java_ms, numpy_ms


def main():
    global LAUNCHER
    parser = argparse.ArgumentParser()
    parser.add_argument("--rounds", type=int, default=5)
    parser.add_argument("--jmh", action="store_true")
    parser.add_argument("--stellabar", default=str(LAUNCHER),
                        help="the launcher to time (default: this checkout's); e.g. an older checkout's, for before/after")
    args = parser.parse_args()
    LAUNCHER = Path(args.stellabar).resolve()
    with tempfile.TemporaryDirectory(prefix="stellabar-bench") as work:
        sink = f"{work}/stdout"
        timed([LAUNCHER, "--version"], sink)  # builds the jar and the start-up archive if needed
        results = {name: ([], []) for name, *_ in jobs(work)}
        for r in range(args.rounds):
            for name, ours, theirs, _ in jobs(work):
                pair = [(0, ours), (1, theirs)] if r % 2 == 0 else [(1, theirs), (0, ours)]
                for side, argv in pair:
                    if argv is not None:
                        results[name][side].append(timed(argv, sink))
        print(f"machine: {platform.machine()}, {os.cpu_count()} cores, {platform.platform()}; "
              f"{args.rounds} rounds, alternating; wall time of whole processes, median (min-max)\n")
        print("| job | stellabar | numpy/scipy script | ratio | goal |")
        print("| --- | --- | --- | --- | --- |")
        for name, ours, theirs, goal in jobs(work):
            a, b = results[name]
            cell = lambda t: f"{statistics.median(t):.2f} s ({min(t):.2f}-{max(t):.2f})"
            if b:
                ratio = statistics.median(a) / statistics.median(b)
                print(f"| {name} | {cell(a)} | {cell(b)} | {ratio:.2f} | <= {goal} |")
            else:
                print(f"| {name} | {cell(a)} | - | - | {'-' if goal is None else f'<= {goal} s'} |")
        if args.jmh:
            java_ms, numpy_ms = jmh_kernel()
            print(f"| EOS kernel, 10^6 states in memory (JMH / numpy median of 7) | {java_ms:.1f} ms | "
                  f"{numpy_ms:.1f} ms | {java_ms / numpy_ms:.2f} | <= 0.5 |")


if __name__ == "__main__":
    main()
