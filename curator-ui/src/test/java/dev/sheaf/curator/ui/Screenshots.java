package dev.sheaf.curator.ui;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javafx.scene.Scene;
import javafx.scene.image.PixelReader;
import javafx.scene.image.WritableImage;
import javax.imageio.ImageIO;

/** Saves a scene as a PNG under {@code target/screenshots/} (the folder surefire names in {@code sheaf.screenshots}). Call on the FX thread. */
final class Screenshots {
    private Screenshots() {
    }

    static Path folder() {
        return Path.of(System.getProperty("sheaf.screenshots", "target/screenshots"));
    }

    static Path save(Scene scene, String name) throws IOException {
        WritableImage img = scene.snapshot(null);
        int w = (int) img.getWidth();
        int h = (int) img.getHeight();
        int[] argb = new int[w * h];
        PixelReader r = img.getPixelReader();
        r.getPixels(0, 0, w, h, javafx.scene.image.PixelFormat.getIntArgbInstance(), argb, 0, w);
        BufferedImage out = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
        out.setRGB(0, 0, w, h, argb, 0, w);
        Files.createDirectories(folder());
        Path file = folder().resolve(name + ".png");
        ImageIO.write(out, "png", file.toFile());
        return file;
    }
}
