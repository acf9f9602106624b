package org.phasewright.language.ui;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** The bundled examples, read from the repository's examples folder. */
public final class ExampleModels {
    private ExampleModels() {
    }

    public static String read(String name) {
        try {
            return Files.readString(Path.of("..", "examples", name));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
