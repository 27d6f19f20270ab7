/** Benchmark drivers and a test-only JSONL reader (used until the ingest stage is merged). */
package dev.sheaf.miner.bench;
