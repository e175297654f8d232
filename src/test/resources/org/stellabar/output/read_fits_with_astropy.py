"""Reads FITS files with astropy and reports what it found, as JSON on standard output.

Used by FitsAstropyCheckTest. Every warning is turned into an error (a UnitsWarning for a TUNITn
astropy does not understand, a VerifyWarning for a card that breaks the standard), so a file that
astropy reads only with complaints is reported as failed.

usage: read_fits_with_astropy.py REQUEST.json

REQUEST: {"files": [{"path": "...", "hdus": [{"name": "profile", "units": {"rho": "g/cm3"}}]}],
          "write_foreign": "path"}
  units maps a column to our unit string; the report says whether astropy's unit for that column
  is the same physical unit (conversion factor 1 within 1e-12), "" meaning no unit at all.
  write_foreign (optional): first write a profile the way another program might (units spelled
  differently, float32, unsigned and null-flagged integers, logical and vector columns), for the
  Java reader to read; the values are listed in FitsAstropyCheckTest.
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
    # A card's unit, where its comment opens with one in brackets (FITS Standard 4.0, 4.3.2),
    # parsed by astropy's FITS unit format and written back in that format.
    card_units = {}
    with fits.open(path) as hdul:
        for card in hdul[spec["name"]].header.cards:
            comment = card.comment or ""
            if comment.startswith("[") and "]" in comment:
                card_units[card.keyword] = u.Unit(comment[1:comment.index("]")], format="fits").to_string("fits")
    return {"name": spec["name"], "columns": columns, "meta": meta, "comments": comments, "card_units": card_units}


def read_file(item):
    path = item["path"]
    with fits.open(path) as hdul:
        hdul.verify("exception")
        names = [h.name for h in hdul]
        primary = {k: plain(v) for k, v in hdul[0].header.items() if k not in ("COMMENT", "HISTORY")}
    return {"path": path, "hdu_names": names, "primary": primary,
            "hdus": [read_hdu(path, spec) for spec in item.get("hdus", [])]}


def write_foreign(path):
    columns = [
        fits.Column(name="radius", format="E", unit="solRad", array=np.array([0.1, 0.5, 1.0], dtype=np.float32)),
        fits.Column(name="density", format="D", unit="g cm**-3", array=np.array([150.0, 1.5, 1e-7])),
        fits.Column(name="pressure", format="D", unit="dyn cm-2", array=np.array([2e17, 3e15, 1e3])),
        fits.Column(name="temperature", format="D", unit="K", array=np.array([3e7, 1e7, 6e3])),
        # unsigned 16-bit integers are stored as signed ones with TZERO = 32768 (FITS 4.0 7.3.2)
        fits.Column(name="counts", format="I", bzero=32768, array=np.array([0, 40000, 65535], dtype=np.uint16)),
        fits.Column(name="shell", format="J", null=-999, array=np.array([5, -999, 7], dtype=np.int32)),
        fits.Column(name="si_density", format="D", unit="kg m-3", array=np.array([1.5e5, 1.5e3, 1e-4])),
        fits.Column(name="converged", format="L", array=np.array([True, False, True])),
        fits.Column(name="abundances", format="3D", array=np.array([[0.7, 0.28, 0.02]] * 3)),
        fits.Column(name="zone", format="8A", array=np.array([b"core", b"envelope", b""])),
    ]
    table = fits.BinTableHDU.from_columns(columns, name="STRUCTURE")
    table.header["MASS"] = (20.0, "[solMass] total mass")
    image = fits.ImageHDU(np.zeros((2, 2)), name="PICTURE")
    fits.HDUList([fits.PrimaryHDU(), image, table]).writeto(path, overwrite=True)


def main():
    with open(sys.argv[1], encoding="utf-8") as f:
        request = json.load(f)
    if "write_foreign" in request:
        write_foreign(request["write_foreign"])
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
