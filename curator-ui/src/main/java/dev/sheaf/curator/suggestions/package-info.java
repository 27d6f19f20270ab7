/** Merge suggestions for the selected term or concept: accept with one key, pick the preferred label, keep apart or dismiss. */
package dev.sheaf.curator.suggestions;
