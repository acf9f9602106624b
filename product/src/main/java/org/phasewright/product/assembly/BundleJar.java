package org.phasewright.product.assembly;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;
import java.util.jar.JarFile;
import java.util.jar.Manifest;

/** A jar that is an OSGi bundle: its symbolic name (without directives), version and where it is. */
record BundleJar(String symbolicName, String version, Path file) {

    /** The jar's bundle identity, or empty when its manifest has no Bundle-SymbolicName. */
    static Optional<BundleJar> read(Path file) throws IOException {
        try (JarFile jar = new JarFile(file.toFile())) {
            Manifest manifest = jar.getManifest();
            String name = manifest == null ? null : manifest.getMainAttributes().getValue("Bundle-SymbolicName");
            if (name == null) {
                return Optional.empty();
            }
            String version = manifest.getMainAttributes().getValue("Bundle-Version");
            return Optional.of(new BundleJar(name.split(";")[0].trim(), version == null ? "0.0.0" : version.trim(),
                    file));
        }
    }

    /** The file name Equinox expects under plugins/. */
    String pluginFileName() {
        return symbolicName + "_" + version + ".jar";
    }
}
