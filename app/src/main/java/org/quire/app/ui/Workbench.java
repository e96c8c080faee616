package org.quire.app.ui;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.FlatLightLaf;
import java.awt.EventQueue;
import java.nio.file.Path;
import org.quire.app.Engine;
import org.quire.app.ui.montecarlo.MonteCarloRunner;

/**
 * Starts the workbench in a fixed order: platform properties, the look and feel (light or dark from the
 * preferences, with Quire's own theme files), then the window, built on the event thread.
 */
public final class Workbench {
    private Workbench() {
    }

    /**
     * @param file a budget file to open, or null for the demo budget
     * @param review whether to open the file read-only, for an assessor
     */
    public static void start(Path file, boolean review) {
        System.setProperty("apple.laf.useScreenMenuBar", "true");
        System.setProperty("apple.awt.application.name", "Quire");
        System.setProperty("flatlaf.uiScale.allowScaleDown", "true");
        WorkbenchPrefs prefs = WorkbenchPrefs.user();
        installLookAndFeel(prefs.theme());
        EventQueue.invokeLater(() -> {
            WorkbenchFrame frame = new WorkbenchFrame(prefs, Engine.library(), MonteCarloRunner.engine(Engine.library()));
            frame.showRestored();
            if (file == null) {
                frame.openDemo();
            } else {
                frame.open(file).ifPresent(ed -> ed.document().setReadOnly(review));
            }
            EventQueue.invokeLater(frame::offerRecovery);
        });
    }

    /** Installs FlatLaf with Quire's theme files ({@code org/quire/app/ui/themes/*.properties}). */
    public static void installLookAndFeel(WorkbenchPrefs.Theme theme) {
        FlatLaf.registerCustomDefaultsSource("org.quire.app.ui.themes");
        if (theme == WorkbenchPrefs.Theme.DARK) {
            FlatDarkLaf.setup();
        } else {
            FlatLightLaf.setup();
        }
    }
}
