# Reads the CSV files that sit next to this notebook. Lines starting with '#' describe
# the run and the columns; the first other line is the header, "name [unit]" per cell.
import csv
import io
import re

import matplotlib.pyplot as plt
import numpy as np

try:
    import pandas as pd
except ImportError:
    pd = None

NAME_AND_UNIT = re.compile(r"^(.*?) \[(.*)\]$")


def read_table(path):
    """Returns ({column: array}, {column: unit}); text columns stay strings."""
    with open(path, encoding="utf-8", newline="") as f:
        text = f.read()
    lines = text.split("\n")
    skip = 0
    while skip < len(lines) and lines[skip].startswith("#"):
        skip += 1
    body = "\n".join(lines[skip:])
    rows = list(csv.reader(io.StringIO(body)))
    names, units = [], {}
    for cell in rows[0]:
        match = NAME_AND_UNIT.match(cell)
        name, unit = (match.group(1), match.group(2)) if match else (cell, "")
        names.append(name)
        units[name] = unit
    if pd is not None:
        # round_trip: pandas' default float parser can be off by one unit in the last place
        frame = pd.read_csv(io.StringIO(body), header=0, names=names, keep_default_na=False,
                            float_precision="round_trip")
        columns = {name: frame[name].to_numpy() for name in names}
    else:
        columns = {}
        for i, name in enumerate(names):
            cells = [row[i] for row in rows[1:] if row]
            try:
                columns[name] = np.array([float(c) for c in cells])
            except ValueError:
                columns[name] = np.array(cells, dtype=str)
    return columns, units


def column(file, name):
    """One column of a loaded file, with a clear message when it is missing."""
    if name not in tables[file]:
        raise KeyError(f"{file} has no column {name!r}; it has: {', '.join(tables[file])}")
    return tables[file][name]


# Okabe & Ito (2008) colour-blind-safe colours, each series with its own dash pattern
COLOURS = __SERIES_COLOURS__
DASHES = ["-", "--", "-.", ":", (0, (6, 2, 1, 2, 1, 2)), (0, (1, 1))]


def new_figure(title):
    fig, ax = plt.subplots(figsize=(6.4, 4.2), constrained_layout=True)
    ax.set_title(title, loc="left", fontsize=11)
    ax.grid(True, color="0.9", linewidth=0.6)
    ax.tick_params(direction="in", which="both", top=True, right=True)
    return fig, ax


# reference lines: greys with their own dash patterns, under the data
MARKS = [("0.35", (0, (1, 2))), ("0.55", (0, (5, 2, 1, 2))), ("0.2", (0, (3, 3)))]


def mark(ax, direction, value, label, k):
    colour, dash = MARKS[k % len(MARKS)]
    line = ax.axhline if direction == "horizontal" else ax.axvline
    line(value, color=colour, linestyle=dash, linewidth=1.0, zorder=1, label=label)


def draw(ax, file, x_name, y_names):
    x = column(file, x_name)
    for i, name in enumerate(y_names):
        ax.plot(x, column(file, name), color=COLOURS[i % len(COLOURS)],
                linestyle=DASHES[i % len(DASHES)], linewidth=1.6, label=name)


tables, units = {}, {}
for file in FILES:
    tables[file], units[file] = read_table(file)
    columns = tables[file]
    print(f"{file}: {len(next(iter(columns.values())))} rows")
    for name, values in columns.items():
        label = f"{name} [{units[file][name]}]" if units[file][name] else name
        if values.dtype.kind in "fiu" and len(values) > 0:
            print(f"  {label}: min {float(values.min())!r}, max {float(values.max())!r}")
        else:
            print(f"  {label}: text")
