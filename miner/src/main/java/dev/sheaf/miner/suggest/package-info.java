/**
 * Synonym, variant and hierarchy suggestions for the curator. The front door is
 * {@link dev.sheaf.miner.suggest.Suggester}; its options are {@link dev.sheaf.miner.suggest.SuggestOptions};
 * its results are {@link dev.sheaf.miner.suggest.Suggestion} (merges) and
 * {@link dev.sheaf.miner.suggest.HierarchySuggestion} (parents). Everything else here is package-private.
 */
package dev.sheaf.miner.suggest;
