/** Text analysis: the analysis profile and the Lucene chain that turns field text into tokens with offsets. */
package dev.sheaf.miner.text;
