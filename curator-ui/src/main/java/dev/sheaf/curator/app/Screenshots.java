package dev.sheaf.curator.app;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javafx.scene.Scene;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import javax.imageio.ImageIO;

/**
 * Saves a scene as a PNG: the UI tests' screenshots under {@code target/screenshots/} (the folder
 * surefire names in {@code sheaf.screenshots}), and the running window's own picture when started
 * with {@code -Dsheaf.curator.screenshot=FILE.png} (see {@link CuratorApp}). Call on the FX thread.
 */
public final class Screenshots {
    private Screenshots() {
    }

    public static Path folder() {
        return Path.of(System.getProperty("sheaf.screenshots", "target/screenshots"));
    }

    /** Saves {@code scene} as {@code NAME.png} in {@link #folder()}. */
    public static Path save(Scene scene, String name) throws IOException {
        Files.createDirectories(folder());
        return saveTo(scene, folder().resolve(name + ".png"));
    }

    /** Saves {@code scene} as the PNG {@code file}. */
    public static Path saveTo(Scene scene, Path file) throws IOException {
        WritableImage img = scene.snapshot(null);
        int w = (int) img.getWidth();
        int h = (int) img.getHeight();
        int[] argb = new int[w * h];
        PixelReader r = img.getPixelReader();
        r.getPixels(0, 0, w, h, javafx.scene.image.PixelFormat.getIntArgbInstance(), argb, 0, w);
        BufferedImage out = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
        out.setRGB(0, 0, w, h, argb, 0, w);
        ImageIO.write(out, "png", file.toFile());
        return file;
    }
}
