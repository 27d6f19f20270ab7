/** Live figures for the selected concept: listings covered, facet fill rate, audit flags. */
package dev.sheaf.curator.figures;
