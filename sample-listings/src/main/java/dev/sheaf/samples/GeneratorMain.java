package dev.sheaf.samples;

/** {@code ./sheaf generate}: writes the demo catalog or large generated corpora. */
public final class GeneratorMain {
    private GeneratorMain() {
    }

    public static void main(String[] args) {
        System.err.println("sheaf generate: not built yet in this version of Sheaf; see README.md.");
        System.exit(5);
    }
}
