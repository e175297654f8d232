"""Shared writer for the reference tables: fixed number format, fixed line endings, fixed order.

Row format (one check per row):
    quantity,parameters,value,unit,tolerance,tolerance_kind,provenance,source
parameters are name=value pairs joined by ';'; tolerance_kind is abs (same unit as value) or rel.
"""

import mpmath

COLUMNS = "quantity,parameters,value,unit,tolerance,tolerance_kind,provenance,source"


def number(x, digits=17):
    """17 significant digits by default: enough to pin a double exactly; deterministic."""
    return mpmath.nstr(mpmath.mpf(x), digits, min_fixed=-4, max_fixed=6, strip_zeros=False)


def row(quantity, parameters, value, unit, tolerance, kind, provenance, source):
    for text in (quantity, parameters, unit, tolerance, kind, provenance, source):
        if "," in text or "\n" in text:
            raise ValueError("no commas or line breaks inside a cell: %r" % text)
    return ",".join((quantity, parameters, value, unit, tolerance, kind, provenance, source))


def write(path, header, rows):
    """header: the '#' block without the column line; rows: formatted lines."""
    lines = [line if line.startswith("#") else "# " + line for line in header.strip("\n").split("\n")]
    with open(path, "w", encoding="utf-8", newline="\n") as f:
        f.write("\n".join(lines) + "\n")
        f.write(COLUMNS + "\n")
        f.write("\n".join(rows) + "\n")
