/** The application shell: the main window, its menus, keys and status bar, and opening, saving and closing a workspace. */
package dev.sheaf.curator.app;
