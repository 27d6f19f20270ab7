/** The JavaFX desktop curator: views bind to view-models; view-models never touch javafx.scene. */
package dev.sheaf.curator;
