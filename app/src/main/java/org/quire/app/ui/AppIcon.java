package org.quire.app.ui;

import java.awt.Image;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;

/** Quire's icon in several sizes (drawn by {@code packaging/make-icon.py}), for the windows and dialogs. */
final class AppIcon {
    private static final int[] SIZES = {16, 32, 48, 64, 128, 256};

    private AppIcon() {
    }

    /** @return the icon's images, largest last; empty if the build lacks them */
    static List<Image> images() {
        List<Image> out = new ArrayList<>();
        for (int s : SIZES) {
            try (InputStream in = AppIcon.class.getResourceAsStream("icons/quire-" + s + ".png")) {
                if (in != null) {
                    out.add(ImageIO.read(in));
                }
            } catch (IOException e) {
                // an unreadable icon leaves the platform's default; nothing else depends on it
                continue;
            }
        }
        return out;
    }
}
