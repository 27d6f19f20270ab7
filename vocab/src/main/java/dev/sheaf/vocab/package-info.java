/**
 * The vocabulary model (scheme, facets, concepts, labels, retired ids, candidate decisions) as
 * immutable snapshots, undoable {@link dev.sheaf.vocab.Edit}s with {@link dev.sheaf.vocab.EditHistory},
 * and {@link dev.sheaf.vocab.VocabularyChecker}. Depends on nothing else of Sheaf.
 */
package dev.sheaf.vocab;
