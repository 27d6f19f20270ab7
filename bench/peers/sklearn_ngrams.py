"""Peer for bench/mine-benchmark.sh: scikit-learn's CountVectorizer(ngram_range=(1, 3)) plus PMI.

One document per listing (all its fields), CountVectorizer's default tokenizer with lower case,
n-grams of 1 to 3 words counted in a sparse matrix; term frequency and document frequency from
the matrix; PMI of every bigram seen at least 5 times from the unigram and bigram counts
(log2(c12 * N / (c1 * c2)), N = all unigram occurrences); the top 10,000 bigrams by PMI written to
OUT.tsv. Usage: sklearn_ngrams.py FILE.jsonl OUT.tsv
"""
import json
import sys

import numpy as np
from sklearn.feature_extraction.text import CountVectorizer


def documents(path):
    with open(path, encoding="utf-8") as f:
        for line in f:
            if not line.strip():
                continue
            o = json.loads(line)
            parts = [o.get("title", ""), o.get("description", "")] + list(o.get("bullets", []))
            for k, v in (o.get("specs") or {}).items():
                parts.append(k)
                parts.append(str(v))
            yield " \n ".join(parts)


vec = CountVectorizer(ngram_range=(1, 3), lowercase=True, dtype=np.int64)
X = vec.fit_transform(documents(sys.argv[1]))
tf = np.asarray(X.sum(axis=0)).ravel()
df = np.asarray((X > 0).sum(axis=0)).ravel()
vocab = vec.vocabulary_
names = vec.get_feature_names_out()
n_tokens = sum(int(tf[i]) for t, i in vocab.items() if " " not in t)
rows = []
for term, i in vocab.items():
    parts = term.split(" ")
    if len(parts) == 2 and tf[i] >= 5:
        c1 = tf[vocab[parts[0]]]
        c2 = tf[vocab[parts[1]]]
        rows.append((float(np.log2(tf[i] * n_tokens / (c1 * c2))), int(tf[i]), int(df[i]), term))
rows.sort(key=lambda r: (-r[0], -r[1], r[3]))
with open(sys.argv[2], "w", encoding="utf-8") as out:
    for pmi, f, d, term in rows[:10000]:
        out.write("%s\t%d\t%d\t%r\n" % (term, f, d, pmi))
