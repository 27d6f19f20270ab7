/** The sheaf command line: thin picocli commands over the stage APIs. */
package dev.sheaf.miner.cli;
