"""Reference surface-form entropies for ConsistencyReferenceCheckTest, from Debian's python3-nltk.

Usage: /usr/bin/python3 reference_entropy.py IN.json OUT.json
IN: {"sets": [{"form": count, ...}, ...]}
OUT: {"nltk": version, "entropies": [bits, ...]}: nltk.probability.entropy(MLEProbDist(FreqDist(counts))),
i.e. -sum p log2 p with p the relative frequencies.
Exit 3 (and {"missing": ...}) when NLTK is missing, so the Java test can skip or fail.
"""
import json
import sys

try:
    import nltk
    from nltk.probability import FreqDist, MLEProbDist, entropy
except ImportError as e:  # pragma: no cover - reported to the Java side
    with open(sys.argv[2], "w", encoding="utf-8") as f:
        json.dump({"missing": str(e)}, f)
    sys.exit(3)

with open(sys.argv[1], encoding="utf-8") as f:
    sets = json.load(f)["sets"]
out = [entropy(MLEProbDist(FreqDist(counts))) for counts in sets]
with open(sys.argv[2], "w", encoding="utf-8") as f:
    json.dump({"nltk": nltk.__version__, "entropies": out}, f)
