/** What changed between two versions of a vocabulary, recognised by concept id, as text, Markdown or JSON. */
package dev.sheaf.vocab.diff;
