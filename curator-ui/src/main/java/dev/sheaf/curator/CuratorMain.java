package dev.sheaf.curator;

/** Starts the desktop curator: {@code ./sheaf curate [WORKSPACE]}. */
public final class CuratorMain {
    private CuratorMain() {
    }

    public static void main(String[] args) {
        System.err.println("sheaf curate: the desktop curator is not built yet in this version of Sheaf; see README.md.");
        System.exit(5);
    }
}
