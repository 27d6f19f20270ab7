/** The vocabulary file: our JSON format, atomic saves with a backup, the edit journal, the session lock. */
package dev.sheaf.vocab.store;
