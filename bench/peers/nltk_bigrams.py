"""Peer for bench/mine-benchmark.sh: NLTK's BigramCollocationFinder with PMI and likelihood ratio.

Reads the generator's JSONL (id, category, title, description, bullets, specs), tokenizes every
field with NLTK's RegexpTokenizer (lower-cased words and numbers such as 1.2 or 10,000), one
document per field so no pair crosses a field, drops pairs with a stop word (NLTK's own idiom,
apply_word_filter), keeps pairs seen at least 5 times, scores them by PMI and by likelihood ratio
and writes the top 10,000 of each to OUT.tsv. Usage: nltk_bigrams.py FILE.jsonl OUT.tsv
"""
import json
import sys

from nltk.collocations import BigramCollocationFinder
from nltk.metrics import BigramAssocMeasures
from nltk.tokenize import RegexpTokenizer

# Lucene's English stop words (the list the miner's profiles start from)
STOP = set("a an and are as at be but by for if in into is it no not of on or such that the their then "
           "there these they this to was will with".split())
tok = RegexpTokenizer(r"\w+(?:[.,]\w+)*")


def documents(path):
    with open(path, encoding="utf-8") as f:
        for line in f:
            if not line.strip():
                continue
            o = json.loads(line)
            texts = [o.get("title", ""), o.get("description", "")] + list(o.get("bullets", []))
            for k, v in (o.get("specs") or {}).items():
                texts.append(k)
                texts.append(str(v))
            for t in texts:
                words = tok.tokenize(t.lower())
                if words:
                    yield words


finder = BigramCollocationFinder.from_documents(documents(sys.argv[1]))
finder.apply_freq_filter(5)
finder.apply_word_filter(lambda w: w in STOP)
m = BigramAssocMeasures
with open(sys.argv[2], "w", encoding="utf-8") as out:
    for name, fn in (("pmi", m.pmi), ("likelihood_ratio", m.likelihood_ratio)):
        for (w1, w2), score in finder.score_ngrams(fn)[:10000]:
            out.write("%s\t%s %s\t%r\n" % (name, w1, w2, score))
