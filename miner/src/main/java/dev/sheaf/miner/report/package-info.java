/** The self-contained HTML audit report and the tables behind it. */
package dev.sheaf.miner.report;
