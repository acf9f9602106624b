package org.phasewright.language.ui.selfcheck;

import java.nio.file.Path;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Shell;

/** Saves what a shell shows as a PNG (copied from the screen, so it is what a person would see). */
final class Screenshot {
    private Screenshot() {
    }

    static void of(Shell shell, Path file) {
        Rectangle bounds = shell.getBounds();
        Image image = new Image(shell.getDisplay(), bounds.width, bounds.height);
        GC gc = new GC(shell.getDisplay());
        try {
            gc.copyArea(image, bounds.x, bounds.y);
        } finally {
            gc.dispose();
        }
        try {
            ImageLoader loader = new ImageLoader();
            loader.data = new ImageData[] { image.getImageData() };
            loader.save(file.toString(), SWT.IMAGE_PNG);
        } finally {
            image.dispose();
        }
    }
}
