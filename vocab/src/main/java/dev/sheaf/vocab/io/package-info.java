/** File helpers every Sheaf module shares (this module is the bottom of the graph): atomic writes and spreadsheet-safe CSV. */
package dev.sheaf.vocab.io;
