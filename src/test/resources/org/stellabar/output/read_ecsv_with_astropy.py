"""Reads stellabar's ECSV files with astropy (warnings are errors) and compares each with the FITS
file of the same table: column names, units (astropy Unit equality) and values (exactly equal).
Usage: python3 read_ecsv_with_astropy.py ECSV FITS [ECSV FITS ...]; prints one JSON object."""
import json
import sys
import warnings

import numpy as np
from astropy import units as u
from astropy.table import Table

warnings.simplefilter("error")
results = []
args = sys.argv[1:]
for ecsv_path, fits_path in zip(args[0::2], args[1::2]):
    entry = {"ecsv": ecsv_path}
    try:
        e = Table.read(ecsv_path, format="ascii.ecsv")
        f = Table.read(fits_path, hdu=1)
        entry["columns"] = e.colnames
        problems = []
        for name in e.colnames:
            eu = e[name].unit or u.dimensionless_unscaled
            fu = f[name].unit or u.dimensionless_unscaled
            if u.Unit(eu) != u.Unit(fu):
                problems.append(f"{name}: unit {eu} != FITS {fu}")
            if not e[name].description:
                problems.append(f"{name}: no description")
            if e[name].dtype.kind == "f" and not np.array_equal(np.asarray(e[name]), np.asarray(f[name])):
                problems.append(f"{name}: values differ from FITS")
        if e.colnames != f.colnames:
            problems.append(f"columns {e.colnames} != FITS {f.colnames}")
        if "title" not in e.meta:
            problems.append("no title in meta")
        entry["problems"] = problems
    except Exception as ex:  # the reader's own complaint is the result
        entry["problems"] = [f"{type(ex).__name__}: {ex}"]
    results.append(entry)
print(json.dumps({"files": results}))
