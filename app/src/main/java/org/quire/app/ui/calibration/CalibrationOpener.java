package org.quire.app.ui.calibration;

import java.nio.file.Path;
import java.util.concurrent.ExecutionException;
import java.util.function.BiConsumer;
import java.util.function.Consumer;
import org.quire.app.ui.common.GuardedWorker;
import org.quire.engine.calibration.PointResult;
import org.quire.engine.document.Template;
import org.quire.engine.calibration.CalibrationJson;
import org.quire.engine.model.FunctionLibrary;

/** Opens a calibration file ({@code quire-calibration}) and its method template off the event thread. */
public final class CalibrationOpener {
    private CalibrationOpener() {
    }

    /**
     * @param file the calibration file
     * @param library the function library
     * @param openPoint opens a point's budget in the workbench
     * @param shown told of the window once it is shown
     * @param failed told of a file that cannot be read (title, message naming the file and why)
     */
    public static void open(Path file, FunctionLibrary library, Consumer<PointResult> openPoint,
            Consumer<CalibrationWindow> shown, BiConsumer<String, String> failed) {
        record Loaded(CalibrationJson.Loaded calibration, Template method) {
        }
        new GuardedWorker<Loaded, Void>() {
            @Override
            protected Loaded doInBackground() throws Exception {
                CalibrationJson.Loaded l = CalibrationJson.read(file);
                return new Loaded(l, CalibrationJson.method(file, l));
            }

            @Override
            protected void finished() {
                try {
                    Loaded l = get();
                    CalibrationWindow w = new CalibrationWindow(l.calibration().calibration(), l.method(), library,
                            openPoint);
                    w.setVisible(true);
                    shown.accept(w);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    failed.accept("Cannot open the calibration", file + ":\n" + e.getCause().getMessage());
                }
            }
        }.execute();
    }
}
