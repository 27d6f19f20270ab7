/**
 * The curator's state without any screen: the open workspace ({@link dev.sheaf.curator.session.CuratorSession}),
 * the shared {@link dev.sheaf.curator.session.Selection}, background mining and indexing
 * ({@link dev.sheaf.curator.session.Mining}) and the recent workspaces. Never imports {@code javafx.scene}.
 */
package dev.sheaf.curator.session;
