/** Evidence lines (keyword in context) for the selection, and the listing behind a line. */
package dev.sheaf.curator.evidence;
