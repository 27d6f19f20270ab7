/** Synonym, variant and hierarchy suggestions for the curator. */
package dev.sheaf.miner.suggest;
