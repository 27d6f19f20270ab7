/** Reading listing files of every kind into Listing records; bad input becomes problem records, never an abort. */
package dev.sheaf.miner.ingest;
