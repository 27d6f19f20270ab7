/** Coverage, feedback consistency, annotator agreement and the flags they raise. */
package dev.sheaf.miner.measure;
