"""Opens Sheaf's label and coverage exports with Python's own csv and json modules and reports what it saw.

Usage: check_label_exports.py LABEL_DIR COVERAGE_DIR OUT.json
Only the standard library is used: these files must open cleanly for any data scientist.
"""
import csv
import json
import sys


def rows(path):
    with open(path, newline="", encoding="utf-8") as f:
        return list(csv.reader(f))


def main(label_dir, coverage_dir, out):
    report = {"csv": {}, "json": {}, "problems": []}
    for name in ["labels.csv", "facet-values.csv", "label-summary.csv", "category-errors.csv", "problems.csv",
                 "gap-terms.csv", "split.csv", "split-summary.csv"]:
        r = rows(f"{label_dir}/{name}")
        widths = sorted({len(x) for x in r})
        report["csv"][name] = {"rows": len(r), "widths": widths, "header": r[0]}
    for name in ["coverage.csv", "coverage-by-category.csv", "coverage-by-source.csv", "facet-fill.csv",
                 "facet-distribution.csv", "overlap.csv", "concentration.csv", "coverage-curve.csv", "coverage-gaps.csv"]:
        r = rows(f"{coverage_dir}/{name}")
        report["csv"][name] = {"rows": len(r), "widths": sorted({len(x) for x in r}), "header": r[0]}

    matrix = rows(f"{label_dir}/labels.csv")
    values = sorted({cell for row in matrix[1:] for cell in row[3:]})
    report["matrixValues"] = values

    lines = 0
    ids = []
    spans = 0
    with open(f"{label_dir}/assignments.jsonl", encoding="utf-8") as f:
        for line in f:
            o = json.loads(line)
            lines += 1
            ids.append(o["id"])
            for c in o["concepts"]:
                if c["polarity"] not in ("stated", "negated"):
                    report["problems"].append("polarity " + c["polarity"])
                for e in c["evidence"]:
                    spans += 1
                    # offsets are UTF-16 code units, end exclusive
                    if len(e["text"].encode("utf-16-le")) // 2 != e["end"] - e["start"]:
                        report["problems"].append(f"{o['id']}: span {e['start']}..{e['end']} vs text {e['text']!r}")
    report["jsonl"] = {"lines": lines, "ids": ids, "spans": spans}

    for name, path in [("label-summary.json", f"{label_dir}/label-summary.json"),
                       ("coverage.json", f"{coverage_dir}/coverage.json")]:
        with open(path, encoding="utf-8") as f:
            o = json.load(f)
        report["json"][name] = {"format": o.get("format"), "keys": sorted(o.keys())}
    with open(out, "w", encoding="utf-8") as f:
        json.dump(report, f)


if __name__ == "__main__":
    main(*sys.argv[1:4])
