package org.ladderkin.gui.view;

import java.awt.datatransfer.DataFlavor;
import java.awt.datatransfer.UnsupportedFlavorException;
import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.function.Predicate;
import javax.swing.TransferHandler;

/** Takes files dropped on a component and hands their paths on; anything else dropped is refused. */
class FileDropHandler extends TransferHandler {

    private final Predicate<List<Path>> accept;

    /** @param accept takes the dropped files and says whether it used them */
    FileDropHandler(Predicate<List<Path>> accept) {
        this.accept = Objects.requireNonNull(accept, "accept");
    }

    @Override
    public boolean canImport(TransferSupport support) {
        return support.isDataFlavorSupported(DataFlavor.javaFileListFlavor);
    }

    @Override
    public boolean importData(TransferSupport support) {
        if (!support.isDataFlavorSupported(DataFlavor.javaFileListFlavor)) {
            return false;
        }
        try {
            @SuppressWarnings("unchecked")
            List<File> files = (List<File>) support.getTransferable().getTransferData(DataFlavor.javaFileListFlavor);
            return accept.test(files.stream().map(File::toPath).toList());
        } catch (UnsupportedFlavorException | IOException e) {
            return false;
        }
    }
}
