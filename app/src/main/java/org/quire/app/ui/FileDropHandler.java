package org.quire.app.ui;

import java.awt.datatransfer.DataFlavor;
import java.io.File;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;
import javax.swing.TransferHandler;

/** Opens budget files dropped on the window. */
public final class FileDropHandler extends TransferHandler {
    private final Consumer<Path> open;

    public FileDropHandler(Consumer<Path> open) {
        this.open = open;
    }

    @Override
    public boolean canImport(TransferSupport s) {
        return s.isDataFlavorSupported(DataFlavor.javaFileListFlavor);
    }

    @Override
    public boolean importData(TransferSupport s) {
        if (!canImport(s)) {
            return false;
        }
        try {
            @SuppressWarnings("unchecked")
            List<File> files = (List<File>) s.getTransferable().getTransferData(DataFlavor.javaFileListFlavor);
            files.forEach(f -> open.accept(f.toPath()));
            return !files.isEmpty();
        } catch (java.awt.datatransfer.UnsupportedFlavorException | java.io.IOException e) {
            return false;
        }
    }
}
