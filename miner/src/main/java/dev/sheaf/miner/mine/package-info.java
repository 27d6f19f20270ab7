/** Counting n-grams, document frequencies and association measures, and building the harvest of candidate terms. */
package dev.sheaf.miner.mine;
