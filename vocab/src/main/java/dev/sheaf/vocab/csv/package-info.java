/** CSV export and import of a vocabulary, one row per concept, through Commons CSV and SafeCsv. */
package dev.sheaf.vocab.csv;
