package dev.sheaf.miner.mine;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Objects;

/**
 * The mined candidate terms of a corpus with their counts, scores, categories, group keys and
 * evidence lines, plus the spec-table facets; written by {@link HarvestFiles} as {@code harvest.json}
 * (format {@value #FORMAT}, version {@value #FORMAT_VERSION}) and {@code harvest.csv}. Candidates are
 * in rank order: score descending, then frequency descending, then term ascending (UTF-16 order).
 */
public record Harvest(String format, int formatVersion, Parameters parameters, CorpusStats corpus,
                      List<Candidate> candidates, List<SpecFacet> specFacets) {
    public static final String FORMAT = "sheaf-harvest";
    public static final int FORMAT_VERSION = 1;

    public Harvest {
        if (!FORMAT.equals(format)) {
            throw new IllegalArgumentException("not a harvest: format is '" + format + "', expected '" + FORMAT + "'");
        }
        if (formatVersion != FORMAT_VERSION) {
            throw new IllegalArgumentException("harvest format version " + formatVersion + " is not readable by this Sheaf (reads "
                    + FORMAT_VERSION + "); re-run sheaf mine");
        }
        Objects.requireNonNull(parameters, "parameters");
        Objects.requireNonNull(corpus, "corpus");
        candidates = List.copyOf(candidates);
        specFacets = List.copyOf(specFacets);
    }

    /**
     * What produced the harvest: the analysis profile (its JSON form), the options, the sources as
     * given, and which shared components were wired in (variant keys, spec-key clustering, quantity
     * parsing) — a harvest made without one of them says so instead of pretending.
     */
    public record Parameters(JsonNode profile, HarvestOptions options, List<String> sources, Components components) {
        public Parameters {
            Objects.requireNonNull(profile, "profile");
            Objects.requireNonNull(options, "options");
            Objects.requireNonNull(components, "components");
            sources = List.copyOf(sources);
        }
    }

    /** Which shared components this build used. */
    public record Components(boolean variantKeys, boolean specKeyClusters, boolean quantities) {
    }

    /** Counts over the whole corpus. {@code tokens} is N of the association measures. */
    public record CorpusStats(long listings, long fields, long segments, long tokens, long distinctTerms,
                              long sources, List<CategoryCount> categories, List<NgramLevel> ngrams,
                              long candidatesMatched, long candidatesWritten) {
        public CorpusStats {
            categories = List.copyOf(categories);
            ngrams = List.copyOf(ngrams);
        }
    }

    /** Listings per category; the empty name stands for listings without a category. */
    public record CategoryCount(String name, long listings) {
        public CategoryCount {
            Objects.requireNonNull(name, "name");
        }
    }

    /** Per n-gram length: distinct n-grams counted (after exact pruning by their parts) and how many reached the minimums. */
    public record NgramLevel(int n, long distinctCounted, long frequent) {
    }

    /**
     * One candidate term.
     *
     * @param rank        1-based position in the harvest
     * @param term        the analysed tokens joined by single spaces ("two way zipper")
     * @param n           number of tokens
     * @param frequency   occurrences in the corpus
     * @param df          listings that contain it
     * @param dfShare     df / listings
     * @param score       the value of the ranking score, null when it is not defined for this term
     *                    (an association score of a single word)
     * @param scores      every score
     * @param topCategories categories where the term is most distinctive, by log-odds z descending
     * @param groupKey    the variant group key shared by case, hyphen, spacing and plural variants;
     *                    null when this build has no variant keys ({@link Components#variantKeys()})
     * @param evidence    keyword-in-context lines: the first occurrence in each of the first listings in
     *                    input order (source path, then position within the source)
     */
    public record Candidate(int rank, String term, int n, long frequency, long df, double dfShare, Double score,
                            Scores scores, List<CategoryScore> topCategories, String groupKey,
                            List<dev.sheaf.miner.text.EvidenceLine> evidence) {
        public Candidate {
            Objects.requireNonNull(term, "term");
            Objects.requireNonNull(scores, "scores");
            if (rank < 1 || n < 1 || frequency < 1 || df < 1 || df > frequency) {
                throw new IllegalArgumentException("candidate '" + term + "' needs rank >= 1, n >= 1 and 1 <= df <= frequency, got rank "
                        + rank + ", n " + n + ", frequency " + frequency + ", df " + df);
            }
            topCategories = List.copyOf(topCategories);
            evidence = List.copyOf(evidence);
        }
    }

    /**
     * Every score of a candidate. Association scores of multi-word terms use their weakest binary
     * split (docs/decisions/044-longer-ngram-scores.md) and are null for single words, as is the
     * C-value; termhood is defined for every term.
     */
    public record Scores(Double pmi, Double npmi, Double llr, Double tScore, Double chi2, Double cValue, double termhood) {
    }

    /** A category where a candidate is distinctive: its df there and the log-odds z-score against all other categories. */
    public record CategoryScore(String category, long df, double z) {
        public CategoryScore {
            Objects.requireNonNull(category, "category");
        }
    }

    /**
     * A facet candidate from spec tables: raw keys clustered into one name, with the values seen.
     *
     * @param name           the cluster's canonical name
     * @param rows           spec rows with any member key
     * @param keys           the raw keys as written, with their row counts (most frequent first)
     * @param distinctValues distinct values over all member keys
     * @param values         the most frequent values (count descending, then value)
     * @param numeric        summary of the values that parse as quantities, or null
     */
    public record SpecFacet(String name, long rows, List<SpecKeyCount> keys, long distinctValues,
                            List<SpecValueCount> values, NumericSummary numeric) {
        public SpecFacet {
            Objects.requireNonNull(name, "name");
            keys = List.copyOf(keys);
            values = List.copyOf(values);
        }
    }

    public record SpecKeyCount(String key, long rows) {
    }

    /** A spec value with its count and, when it is a quantity, its value in the dimension's base unit. */
    public record SpecValueCount(String value, long rows, Double si, String baseUnit) {
    }

    /** Quantities among a facet's values: the dominant dimension, its base unit, rows parsed and the range. */
    public record NumericSummary(String dimension, String baseUnit, long rows, double min, double max) {
    }
}
