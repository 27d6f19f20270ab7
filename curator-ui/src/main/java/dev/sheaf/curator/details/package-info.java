/** The details of the selected candidate or concept, with the regulated-claim caution. */
package dev.sheaf.curator.details;
