"""Checks every unit string in every table file under a folder with astropy.

Usage: python3 check_units_with_astropy.py UNIT_TABLE.json FOLDER

UNIT_TABLE.json is stellabar's unit table as {"spelling": [factor, "base"]}: each written spelling
with its factor to the CGS unit of its dimension, written as "base". Every unit found in a file must
be one of these spellings (one spelling per unit), must parse without a warning with astropy's
generic parser (ECSV), its FITS parser (TUNITn) and its CDS parser (VOTable 1.3), and each parse
must convert to its base with the stated factor (relative 1e-12: the factors are products of a few
double constants; astropy's solar units are the same IAU 2015 B3 nominal values). Within one
folder and file stem, a column must carry the same unit in every format.

Files read: .csv (the header row "name [unit]" and the "# column name [unit]:" lines), .ecsv
(Table.read), .fits (Table.read of every table HDU, and "[unit]" at the start of a header card's
comment), .vot (Table.read), .json (every "unit" value and every "units"/"input_units" mapping).
Prints one JSON object: {"units": [...], "files": N, "problems": [...]}.
"""
import json
import os
import re
import sys
import warnings

from astropy import units as u
from astropy.io import fits
from astropy.table import Table

warnings.simplefilter("error")

with open(sys.argv[1], encoding="utf-8") as f:
    table = json.load(f)
folder = sys.argv[2]
problems = []
seen = {}          # unit string -> first place
by_column = {}     # (folder, stem, column) -> {unit: [files]}


def note(path, column, unit):
    unit = unit.strip()
    seen.setdefault(unit, f"{path}: {column}")
    stem = os.path.splitext(path)[0]
    by_column.setdefault((stem, column), {}).setdefault(unit, []).append(os.path.basename(path))


def csv_units(path):
    header = None
    with open(path, encoding="utf-8") as f:
        for line in f:
            if line.startswith("#"):
                m = re.match(r"# column (\S+) \[([^\]]*)\]:", line)
                if m:
                    note(path, m.group(1), m.group(2))
                continue
            header = line.rstrip("\n")
            break
    for cell in (header or "").split(","):
        m = re.fullmatch(r'"?(\S+?)(?: \[([^\]]*)\])?"?', cell.strip())
        if m:
            note(path, m.group(1), m.group(2) or "")


def fits_units(path):
    with fits.open(path) as hdus:
        for hdu in hdus:
            for card in hdu.header.cards:
                m = re.match(r"\[([^\]]*)\]", card.comment or "")
                if m:
                    note(path, "card " + card.keyword, m.group(1))
            if isinstance(hdu, fits.BinTableHDU):
                for i in range(1, hdu.header["TFIELDS"] + 1):
                    note(path, hdu.header[f"TTYPE{i}"], hdu.header.get(f"TUNIT{i}", ""))
                Table.read(hdu)  # astropy's own parse of every TUNITn, warnings are errors


def ecsv_units(path):
    # the YAML header's "unit" values as written, then a full astropy read (warnings are errors)
    with open(path, encoding="utf-8") as f:
        for line in f:
            if not line.startswith("#"):
                break
            m = re.match(r"# - (\{.*\})$", line.rstrip("\n"))
            if m:
                col = json.loads(m.group(1))
                note(path, col["name"], col.get("unit", ""))
    Table.read(path, format="ascii.ecsv")


def votable_units(path):
    with open(path, encoding="utf-8") as f:
        text = f.read()
    for m in re.finditer(r"<FIELD\b([^>]*)>", text):
        attrs = dict(re.findall(r'(\w+)="([^"]*)"', m.group(1)))
        note(path, attrs.get("name", "?"), attrs.get("unit", ""))
    for m in re.finditer(r"<PARAM\b([^>]*)/?>", text):
        attrs = dict(re.findall(r'(\w+)="([^"]*)"', m.group(1)))
        if "unit" in attrs:
            note(path, "param " + attrs.get("name", "?"), attrs["unit"])
    Table.read(path, format="votable")


def json_units(path):
    def walk(node, where):
        if isinstance(node, dict):
            if isinstance(node.get("unit"), str):
                note(path, where + "." + str(node.get("name", "?")), node["unit"])
            for key in ("units", "input_units"):
                if isinstance(node.get(key), dict):
                    for name, unit in node[key].items():
                        note(path, f"{key}.{name}", unit)
            for k, v in node.items():
                walk(v, where + "." + k)
        elif isinstance(node, list):
            for v in node:
                walk(v, where)
    with open(path, encoding="utf-8") as f:
        walk(json.load(f), "")


readers = {".csv": csv_units, ".fits": fits_units, ".ecsv": ecsv_units, ".vot": votable_units,
           ".json": json_units}
count = 0
for root, _, names in sorted(os.walk(folder)):
    for name in sorted(names):
        ext = os.path.splitext(name)[1]
        if ext in readers:
            path = os.path.join(root, name)
            count += 1
            try:
                readers[ext](path)
            except Exception as ex:  # the reader's own complaint is the result
                problems.append(f"{path}: {type(ex).__name__}: {ex}")

for unit, where in sorted(seen.items()):
    if unit == "":
        continue
    if unit not in table:
        problems.append(f"unit '{unit}' ({where}) is not one of the written spellings {sorted(table)}")
        continue
    factor, base = table[unit]
    for fmt in (None, "fits", "cds"):
        try:
            parsed = u.Unit(unit, format=fmt) if fmt else u.Unit(unit)
            base_unit = u.Unit(base, format=fmt) if fmt else u.Unit(base)
            got = parsed.to(base_unit)
            if abs(got / factor - 1) > 1e-12:
                problems.append(f"'{unit}' ({fmt or 'generic'}) is {got} {base}, our table says {factor}")
        except Exception as ex:
            problems.append(f"'{unit}' ({where}) does not parse as {fmt or 'generic'}: {type(ex).__name__}: {ex}")

for (stem, column), units in sorted(by_column.items()):
    if len(units) > 1:
        problems.append(f"{stem} {column}: different units across formats {units}")

print(json.dumps({"units": sorted(u for u in seen if u), "files": count, "problems": problems}))
