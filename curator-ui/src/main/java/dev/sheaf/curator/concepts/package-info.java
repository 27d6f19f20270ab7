/** A flat, searchable concept list: the default centre of the window and the way to pick a concept. */
package dev.sheaf.curator.concepts;
