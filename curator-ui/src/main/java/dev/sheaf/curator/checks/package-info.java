/** The vocabulary checks as a list that follows every edit and jumps to the concept; also the latest-wins background run. */
package dev.sheaf.curator.checks;
