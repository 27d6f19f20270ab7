/** The vocabulary model: scheme, facets, concepts, labels, candidate decisions. Depends on nothing else of Sheaf. */
package dev.sheaf.vocab;
