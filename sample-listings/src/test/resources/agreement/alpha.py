# Krippendorff's alpha per attribute of a judgments.csv (item,annotator,attribute,value), with NLTK.
# Nominal (binary distance) for labels, interval distance when every value is a grade 1-5.
# Prints "attribute<TAB>alpha" lines; exit code 3 when NLTK is missing.
import csv
import sys
from collections import defaultdict

try:
    from nltk.metrics.agreement import AnnotationTask
    from nltk.metrics.distance import binary_distance, interval_distance
except ImportError as e:
    print(e, file=sys.stderr)
    sys.exit(3)

rows = defaultdict(list)
with open(sys.argv[1], encoding="utf-8", newline="") as f:
    for r in csv.DictReader(f):
        rows[r["attribute"]].append((r["annotator"], r["item"], r["value"]))
for attribute, data in sorted(rows.items()):
    graded = all(v.isdigit() for _, _, v in data)
    if graded:
        data = [(c, i, int(v)) for c, i, v in data]
    task = AnnotationTask(data=data, distance=interval_distance if graded else binary_distance)
    print(f"{attribute}\t{task.alpha():.6f}")
