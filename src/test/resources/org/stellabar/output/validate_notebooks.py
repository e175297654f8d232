"""Validates notebooks with nbformat, every warning an error, and reports per file as JSON.

Used by NotebookPythonCheckTest. nbformat 5.5 repairs some faults (a missing or duplicate cell
id) with only a warning; with warnings turned into errors those fail here, as does anything the
reader would change while normalising the file.

usage: validate_notebooks.py NOTEBOOK...
"""
import json
import re
import sys
import warnings

warnings.simplefilter("error")

import nbformat  # noqa: E402  (imported after the warnings filter on purpose)

CELL_ID = re.compile(r"^[a-zA-Z0-9_-]{1,64}$")  # nbformat 4.5 schema


def check(path):
    with open(path, encoding="utf-8") as f:
        raw = f.read()
    as_json = json.loads(raw)
    notebook = nbformat.reads(raw, as_version=nbformat.NO_CONVERT)
    nbformat.validate(notebook)
    # The reader joins each cell's list of lines into one string; anything else it changed
    # (an id added or repaired, metadata dropped) means the file was not valid as written.
    for cell in as_json["cells"]:
        if isinstance(cell["source"], list):
            cell["source"] = "".join(cell["source"])
    if json.loads(json.dumps(notebook)) != as_json:
        raise ValueError("nbformat changed the notebook while reading it")
    ids = [cell["id"] for cell in notebook.cells]
    if len(set(ids)) != len(ids) or not all(CELL_ID.match(i) for i in ids):
        raise ValueError("cell ids are not unique valid ids: " + ", ".join(ids))
    return {"nbformat": notebook.nbformat, "nbformat_minor": notebook.nbformat_minor,
            "cells": len(notebook.cells), "nbformat_version": nbformat.__version__}


def main():
    report = []
    for path in sys.argv[1:]:
        try:
            report.append(dict(path=path, **check(path)))
        except Exception as e:  # reported per file so one run can include failing controls
            report.append({"path": path, "error": type(e).__name__ + ": " + (str(e).splitlines() or [""])[0]})
    json.dump({"files": report}, sys.stdout)
    sys.stdout.write("\n")


if __name__ == "__main__":
    main()
