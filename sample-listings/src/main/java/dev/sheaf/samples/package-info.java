/** The Fernhollow Outfitters demo catalog generator and the scale-corpus generator (invented data, demo only). */
package dev.sheaf.samples;
