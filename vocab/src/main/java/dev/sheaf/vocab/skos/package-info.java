/** SKOS export and import (Turtle, RDF/XML) through Eclipse RDF4J Rio, with Sheaf's own small namespace for facet properties. */
package dev.sheaf.vocab.skos;
