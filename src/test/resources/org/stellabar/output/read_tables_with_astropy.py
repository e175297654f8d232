"""Reads stellabar's ECSV and VOTable files with astropy (any warning is an error) and compares
each with the FITS file of the same table: column names, units (astropy Unit equality), values
(exactly equal), integer columns read as integers, a description on every column, the run's
title in the metadata, and for VOTable every UCD in the IVOA controlled vocabulary and the inputs
as PARAMs.

Usage: python3 read_tables_with_astropy.py TABLE FITS [TABLE FITS ...]   (TABLE: .ecsv or .vot)
Prints one JSON object: {"files": [{"path", "columns", "problems"}]}.
"""
import json
import sys
import warnings

import numpy as np
from astropy import units as u
from astropy.io import fits
from astropy.io.votable import parse as parse_votable
from astropy.io.votable import ucd as ucds
from astropy.table import Table

warnings.simplefilter("error")


def fits_table(path, names):
    """The binary table of the FITS file with these columns (a summary file has several HDUs)."""
    with fits.open(path) as hdus:
        for i, hdu in enumerate(hdus):
            if isinstance(hdu, fits.BinTableHDU) and [c.name for c in hdu.columns] == names:
                return Table.read(path, hdu=i)
    return Table.read(path, hdu=1)


results = []
args = sys.argv[1:]
for path, fits_path in zip(args[0::2], args[1::2]):
    entry = {"path": path}
    problems = []
    try:
        if path.endswith(".vot"):
            t = Table.read(path, format="votable")
            title = t.meta.get("description") or ""
            votable = parse_votable(path)
            table = votable.get_first_table()
            for field in table.fields:
                if field.ucd and not ucds.check_ucd(field.ucd, check_controlled_vocabulary=True):
                    problems.append(f"{field.name}: UCD {field.ucd} not in the vocabulary")
            entry["params"] = {p.name: (str(p.value), p.unit.to_string("fits") if p.unit else "") for p in table.params}
            entry["infos"] = [i.name for i in table.infos]
            entry["ucds"] = {f.name: f.ucd for f in table.fields if f.ucd}
        else:
            t = Table.read(path, format="ascii.ecsv")
            title = t.meta.get("title") or ""
        f = fits_table(fits_path, t.colnames)
        entry["columns"] = t.colnames
        entry["rows"] = len(t)
        if not title:
            problems.append("no title in the metadata")
        if t.colnames != f.colnames:
            problems.append(f"columns {t.colnames} != FITS {f.colnames}")
        for name in t.colnames:
            if name not in f.colnames:
                continue
            tu = t[name].unit or u.dimensionless_unscaled
            fu = f[name].unit or u.dimensionless_unscaled
            if u.Unit(tu) != u.Unit(fu):
                problems.append(f"{name}: unit {tu} != FITS {fu}")
            if not t[name].description:
                problems.append(f"{name}: no description")
            kind, fits_kind = t[name].dtype.kind, f[name].dtype.kind
            if fits_kind in "iu" and kind not in "iu":
                problems.append(f"{name}: FITS integer read as {t[name].dtype}")
            if kind in "fiu":
                if not np.array_equal(np.asarray(t[name]), np.asarray(f[name])):
                    problems.append(f"{name}: values differ from FITS")
            else:
                # FITS text is ASCII only: the caller compares the text with what it wrote
                entry.setdefault("text", {})[name] = [str(v) for v in t[name]]
    except Exception as ex:  # the reader's own complaint is the result
        problems.append(f"{type(ex).__name__}: {ex}")
    entry["problems"] = problems
    results.append(entry)
print(json.dumps({"files": results}))
