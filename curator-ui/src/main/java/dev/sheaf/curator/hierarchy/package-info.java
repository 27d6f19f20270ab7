/** The vocabulary as a tree of facets and concepts: moves, new facets, renames, facet properties and the regulated-claim caution. */
package dev.sheaf.curator.hierarchy;
