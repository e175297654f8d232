"""Reads FITS files with astropy and reports what it found, as JSON on standard output.

Used by FitsAstropyCheckTest. Every warning is turned into an error (a UnitsWarning for a TUNITn
astropy does not understand, a VerifyWarning for a card that breaks the standard), so a file that
astropy reads only with complaints is reported as failed.

usage: read_fits_with_astropy.py REQUEST.json

REQUEST: {"files": [{"path": "...", "hdus": [{"name": "profile", "units": {"rho": "g/cm3"}}]}]}
  units maps a column to our unit string; the report says whether astropy's unit for that column
  is the same physical unit (conversion factor 1 within 1e-12), "" meaning no unit at all.
"""
import json
import sys
import warnings

warnings.simplefilter("error")

import numpy as np  # noqa: E402
from astropy import units as u  # noqa: E402  (imported after the warnings filter on purpose)
from astropy.io import fits  # noqa: E402
from astropy.table import Table  # noqa: E402


def our_unit_in_astropy(unit):
    # Our "erg/g/K" means erg/(g K); astropy's generic parser refuses a second slash.
    parts = unit.split("/")
    if len(parts) > 2:
        return u.Unit(parts[0] + " / (" + " ".join(parts[1:]) + ")")
    return u.Unit(unit)


def plain(value):
    """A header value as JSON: bool, int, float or str."""
    if isinstance(value, (bool, int, float, str)):
        return value
    return str(value)


def read_hdu(path, spec):
    table = Table.read(path, hdu=spec["name"])
    columns = []
    for name in table.colnames:
        col = table[name]
        entry = {"name": name, "dtype": col.dtype.str}
        if col.dtype.kind in ("S", "U"):
            # iterating a bytes column may already yield str (astropy decodes on access); astropy
            # masks empty strings when it reads FITS tables: reported as null
            entry["values"] = [None if v is np.ma.masked else v.decode("ascii") if isinstance(v, bytes)
                               else str(v) for v in col]
        else:
            entry["values"] = [float(v) for v in col]
        entry["unit"] = None if col.unit is None else col.unit.to_string("fits")
        ours = spec.get("units", {}).get(name)
        if ours is not None:
            if ours == "":
                entry["same_unit"] = col.unit is None
            else:
                factor = col.unit.to(our_unit_in_astropy(ours)) if col.unit is not None else None
                entry["same_unit"] = factor is not None and abs(factor - 1.0) < 1e-12
        columns.append(entry)
    # astropy keeps COMMENT cards as meta["comments"]
    meta = {k: plain(v) for k, v in table.meta.items() if k not in ("comments", "history")}
    comments = [str(c).strip() for c in table.meta.get("comments", [])]
    return {"name": spec["name"], "columns": columns, "meta": meta, "comments": comments}


def read_file(item):
    path = item["path"]
    with fits.open(path) as hdul:
        hdul.verify("exception")
        names = [h.name for h in hdul]
        primary = {k: plain(v) for k, v in hdul[0].header.items() if k not in ("COMMENT", "HISTORY")}
    return {"path": path, "hdu_names": names, "primary": primary,
            "hdus": [read_hdu(path, spec) for spec in item.get("hdus", [])]}


def main():
    with open(sys.argv[1], encoding="utf-8") as f:
        request = json.load(f)
    report = []
    for item in request["files"]:
        try:
            report.append(read_file(item))
        except Exception as e:  # reported per file so one run can check a failing control file
            report.append({"path": item["path"], "error": type(e).__name__ + ": " + str(e)})
    json.dump({"files": report}, sys.stdout)
    sys.stdout.write("\n")


if __name__ == "__main__":
    main()
