"""Makes 4 parts of a 1000 x 1000 survey (10^6 points) for the merge benchmark in survey.sh.

One real part is computed by stellabar (a 1000 x 1000 survey's first 2 points would take as long
as any; instead a tiny survey's part gives the layout and one real row), and its row is repeated
for every point with the point number set, the survey text replaced by the big survey's and the
content hash recomputed, exactly as stellabar computes it (SHA-256 of the UTF-8 text). The merge
reads, checks and writes these parts as it would real ones; only the numbers repeat.
Usage: python3 merge_parts.py STELLABAR_LAUNCHER WORK_FOLDER [TABLE_FORMATS]
(TABLE_FORMATS: a TOML array such as '["fits"]'; default: the survey default, csv, ecsv, fits, json)
"""
import hashlib
import json
import os
import subprocess
import sys

launcher, work = sys.argv[1], sys.argv[2]
formats = sys.argv[3] if len(sys.argv) > 3 else None
os.makedirs(work, exist_ok=True)
big = """[survey]
name = "big"
kind = "standard"
points = 3
chart_formats = []
[survey.axes.mass]
from = "1 Msun"
to = "1e5 Msun"
count = 1000
[survey.axes.radius]
from = "10 Rsun"
to = "1e4 Rsun"
count = 1000
"""
if formats:
    big = big.replace("chart_formats = []", "chart_formats = []\ntable_formats = " + formats)
tiny = big.replace("count = 1000", "count = 2")
with open(os.path.join(work, "tiny.toml"), "w") as f:
    f.write(tiny)
subprocess.run([launcher, "survey", os.path.join(work, "tiny.toml"), "--shard", "1/1", "-o", work, "-q"],
               check=True, stdout=subprocess.DEVNULL)
with open(os.path.join(work, "big-1-of-1.part.json")) as f:
    template = json.load(f)
row = template["outcomes"][0]
total, parts = 1000 * 1000, 4
digest = hashlib.sha256(big.encode("utf-8")).hexdigest()
os.makedirs(os.path.join(work, "parts"), exist_ok=True)
texts = json.dumps(row["texts"])
numbers = json.dumps(row["numbers"])
for k in range(1, parts + 1):
    first, end = total * (k - 1) // parts, total * k // parts
    with open(os.path.join(work, "parts", f"big-{k}-of-{parts}.part.json"), "w") as f:
        head = dict(template)
        head.update({"survey": "big", "content_hash": digest, "part": k, "parts": parts, "first_point": first,
                     "point_count": end - first, "total_points": total, "survey_file": "big.toml",
                     "survey_text": big})
        del head["outcomes"]
        text = json.dumps(head)
        f.write(text[:-1] + ', "outcomes": [\n')
        f.write(",\n".join('{"point": %d, "failure": "", "texts": %s, "numbers": %s}' % (p, texts, numbers)
                           for p in range(first, end)))
        f.write("]}\n")
print(os.path.join(work, "parts"))
