"""Reference figures for AgreementReferenceCheckTest, from Debian's python3-nltk and python3-statsmodels.

Usage: /usr/bin/python3 reference_agreement.py IN.json OUT.json
IN: {"sets": [{"attribute": str, "metric": "nominal|ordinal|interval|ratio",
               "judgments": [[coder, item, value-string], ...]}, ...]}
OUT: {"nltk": version, "statsmodels": version, "sets": [{...figures...}]}; a figure that the
reference cannot compute (it raises, or gives a non-finite number) is null, with the error text.
Exit 3 (and {"missing": ...}) when a library is missing, so the Java test can skip or fail.

Mapping (which reference computes which of our figures):
- alpha: nltk AnnotationTask(data, distance).alpha(), with distance = delta squared of the metric:
  nominal -> nltk binary_distance; interval -> nltk interval_distance ((a-b)**2);
  ratio -> ((a-b)/(a+b))**2 (0 when a+b = 0), passed as a function;
  ordinal -> Krippendorff's (sum_{g=c..k} n_g - (n_c+n_k)/2)**2 with n_g counted over pairable
  values (items with >= 2 judgments), passed as a function. NLTK sums distance over value pairs
  per item exactly as the coincidence matrix does.
- Cohen's kappa of a pair: nltk AnnotationTask with only those two coders on the items both
  judged, kappa_pairwise(a, b); and statsmodels cohens_kappa on their contingency table.
- Fleiss' kappa: statsmodels fleiss_kappa(table, method='fleiss') on the item x category count
  table of the items with the modal number of judgments (ties: the larger number), and on
  complete sets also nltk pi() (Fleiss' kappa equals multi-pi when every coder judges every item).
- Mean pairwise Cohen's kappa and observed agreement: on complete sets only, nltk kappa()
  (naive average of pairwise kappas) and avg_Ao(); NLTK assumes every coder judged every item.
- nltk multi_kappa() (Davies & Fleiss 1982) is not a figure Sheaf reports; it is not compared.
"""
import json
import math
import sys
from collections import Counter, defaultdict

try:
    import nltk
    from nltk.metrics.agreement import AnnotationTask
    from nltk.metrics.distance import binary_distance, interval_distance
    import numpy as np
    import statsmodels
    from statsmodels.stats.inter_rater import cohens_kappa, fleiss_kappa
except ImportError as e:  # pragma: no cover - reported to the Java side
    with open(sys.argv[2], "w", encoding="utf-8") as f:
        json.dump({"missing": str(e)}, f)
    sys.exit(3)


def finite(x):
    try:
        x = float(x)
    except (TypeError, ValueError):
        return None
    return x if math.isfinite(x) else None


def guarded(fn):
    try:
        return finite(fn()), None
    except Exception as e:  # the reference cannot compute it; the Java side checks ours is undefined
        return None, type(e).__name__ + ": " + str(e)


def ordinal_distance(triples):
    by_item = defaultdict(list)
    for c, i, v in triples:
        by_item[i].append(v)
    n = Counter()
    for vs in by_item.values():
        if len(vs) >= 2:
            n.update(vs)
    grades = sorted(n)

    def d(a, b):
        if a == b:
            return 0.0
        lo, hi = min(a, b), max(a, b)
        s = sum(n[g] for g in grades if lo <= g <= hi)
        return (s - (n[a] + n[b]) / 2.0) ** 2
    return d


def ratio_distance(a, b):
    return 0.0 if a + b == 0 else ((a - b) / (a + b)) ** 2


def alpha(triples, metric):
    if metric == "nominal":
        dist = binary_distance
    elif metric == "interval":
        dist = interval_distance
    elif metric == "ratio":
        dist = ratio_distance
    else:
        dist = ordinal_distance(triples)
    labels = {v for _, _, v in triples}
    value, error = guarded(lambda: AnnotationTask(data=triples, distance=dist).alpha())
    return value, error, len(labels) == 1


def fleiss_table(triples):
    by_item = defaultdict(list)
    for c, i, v in triples:
        by_item[i].append(v)
    counts = Counter(len(vs) for vs in by_item.values() if len(vs) >= 2)
    if not counts:
        return None
    top = max(counts.values())
    modal = max(k for k, n in counts.items() if n == top)
    cats = sorted({v for _, _, v in triples})
    rows = [[vs.count(c) for c in cats] for vs in by_item.values() if len(vs) == modal]
    return np.array(rows, dtype=float)


def one_set(s):
    metric = s["metric"]
    numeric = metric != "nominal"
    raw = [(c, i, v) for c, i, v in s["judgments"]]
    triples = [(c, i, float(v) if numeric else v) for c, i, v in raw]
    coders = sorted({c for c, _, _ in raw})
    items = sorted({i for _, i, _ in raw})
    out = {"attribute": s["attribute"]}
    out["alpha"], out["alphaError"], out["singleLabel"] = alpha(triples, metric)
    without = {}
    for c in coders:
        rest = [t for t in triples if t[0] != c]
        value, _, single = alpha(rest, metric) if rest else (None, None, False)
        without[c] = {"alpha": value, "singleLabel": single}
    out["alphaWithout"] = without

    nominal = raw  # kappas treat values as categories: compare the strings
    pairs = []
    for x in range(len(coders)):
        for y in range(x + 1, len(coders)):
            a, b = coders[x], coders[y]
            va = {i: v for c, i, v in nominal if c == a}
            vb = {i: v for c, i, v in nominal if c == b}
            shared = sorted(set(va) & set(vb))
            if not shared:
                continue
            data = [(a, i, va[i]) for i in shared] + [(b, i, vb[i]) for i in shared]
            nk, nk_err = guarded(lambda: AnnotationTask(data=data).kappa_pairwise(a, b))
            cats = sorted({va[i] for i in shared} | {vb[i] for i in shared})
            table = np.zeros((len(cats), len(cats)))
            for i in shared:
                table[cats.index(va[i]), cats.index(vb[i])] += 1
            sk, _ = guarded(lambda: cohens_kappa(table).kappa)
            pairs.append({"a": a, "b": b, "items": len(shared), "nltkKappa": nk, "nltkError": nk_err,
                          "statsmodelsKappa": sk})
    out["pairs"] = pairs

    table = fleiss_table(nominal)
    out["fleissStatsmodels"] = None if table is None else guarded(lambda: fleiss_kappa(table, method="fleiss"))[0]
    out["fleissItems"] = 0 if table is None else int(table.shape[0])

    complete = len(raw) == len(coders) * len(items)
    out["complete"] = complete
    if complete:
        task = AnnotationTask(data=nominal)
        out["nltkPi"] = guarded(task.pi)[0]
        out["nltkMeanKappa"] = guarded(task.kappa)[0]
        out["nltkAvgAo"] = guarded(task.avg_Ao)[0]
    return out


def main():
    with open(sys.argv[1], encoding="utf-8") as f:
        sets = json.load(f)["sets"]
    result = {"nltk": nltk.__version__, "statsmodels": statsmodels.__version__,
              "sets": [one_set(s) for s in sets]}
    with open(sys.argv[2], "w", encoding="utf-8") as f:
        json.dump(result, f)


if __name__ == "__main__":
    import warnings
    warnings.simplefilter("ignore")  # degenerate tables divide by zero; reported as null
    main()
