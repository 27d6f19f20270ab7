/** Labeling listings with a vocabulary: the matcher, negation scope, numeric values, label exports. */
package dev.sheaf.miner.label;
