/** Triage of the harvest: the candidate table, its filters and the keep / drop / park decisions. */
package dev.sheaf.curator.harvest;
