"""Reference bigram statistics from NLTK for NltkCollocationCheckTest.

Reads segments (one per line, tokens separated by single spaces, UTF-8), builds
nltk.collocations.BigramCollocationFinder.from_documents over them (one document per segment, so
no pair crosses a segment), keeps bigrams with frequency >= MIN, and prints one TSV row per bigram:
w1, w2, frequency, pmi, likelihood_ratio, student_t (repr floats); then one row per word with
frequency >= MIN: "#word", word, frequency; and a last row "#N", N.
"""
import sys
from nltk.collocations import BigramCollocationFinder
from nltk.metrics import BigramAssocMeasures as M

path, minimum = sys.argv[1], int(sys.argv[2])
with open(path, encoding="utf-8") as f:
    segments = [line.rstrip("\n").split(" ") for line in f if line.strip()]
finder = BigramCollocationFinder.from_documents(segments)
finder.apply_freq_filter(minimum)
out = sys.stdout
for (w1, w2), freq in sorted(finder.ngram_fd.items()):
    def score(fn):
        try:
            return repr(finder.score_ngram(fn, w1, w2))
        except ValueError:  # a cell of the 2x2 table is negative (self-overlapping pairs)
            return "nan"
    out.write("\t".join([w1, w2, str(freq), score(M.pmi), score(M.likelihood_ratio), score(M.student_t)]) + "\n")
for w, freq in sorted(finder.word_fd.items()):
    if freq >= minimum:
        out.write("#word\t%s\t%d\n" % (w, freq))
out.write("#N\t%d\n" % finder.N)
