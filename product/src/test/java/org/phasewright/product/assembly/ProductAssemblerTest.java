package org.phasewright.product.assembly;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.jar.Attributes;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Lays out a tiny IDE folder from made-up jars: bundles renamed, plain jars wrapped or left out, config written. */
class ProductAssemblerTest {
    @TempDir
    Path temp;

    private Path jar(String name, String symbolicName, String version, String entry) throws IOException {
        Path file = temp.resolve("jars").resolve(name);
        Files.createDirectories(file.getParent());
        Manifest manifest = new Manifest();
        manifest.getMainAttributes().put(Attributes.Name.MANIFEST_VERSION, "1.0");
        if (symbolicName != null) {
            manifest.getMainAttributes().putValue("Bundle-SymbolicName", symbolicName);
            manifest.getMainAttributes().putValue("Bundle-Version", version);
        }
        try (OutputStream out = Files.newOutputStream(file);
                JarOutputStream jar = new JarOutputStream(out, manifest)) {
            jar.putNextEntry(new JarEntry(entry));
            jar.write("content".getBytes());
            jar.closeEntry();
        }
        return file;
    }

    @Test
    void assemblesPluginsAndConfiguration() throws IOException {
        jar("org.eclipse.equinox.simpleconfigurator-1.5.700.jar",
                "org.eclipse.equinox.simpleconfigurator;singleton:=true", "1.5.700.v1", "a/A.txt");
        jar("org.eclipse.core.runtime-3.35.0.jar", "org.eclipse.core.runtime;singleton:=true", "3.35.0.v2", "b/B.txt");
        jar("antlr-runtime-3.2.jar", null, null, "org/antlr/runtime/Readme.txt");
        jar("j2objc-annotations-3.1.jar", null, null, "com/google/j2objc/Readme.txt");
        Path ide = temp.resolve("ide");

        List<String> skipped = ProductAssembler.assemble(temp.resolve("jars"), ide);

        assertEquals(List.of("j2objc-annotations-3.1.jar"), skipped);
        Path wrapped = ide.resolve("plugins/org.antlr.runtime_3.2.0.jar");
        assertTrue(Files.isRegularFile(ide.resolve("plugins/org.eclipse.core.runtime_3.35.0.v2.jar")));
        try (JarFile jar = new JarFile(wrapped.toFile())) {
            Attributes main = jar.getManifest().getMainAttributes();
            assertEquals("org.antlr.runtime", main.getValue("Bundle-SymbolicName"));
            assertTrue(main.getValue("Export-Package").contains("org.antlr.runtime;version=\"3.2.0\""),
                    main.getValue("Export-Package"));
            assertTrue(jar.getEntry("org/antlr/runtime/Readme.txt") != null, "content is inside the bundle");
        }
        List<String> bundlesInfo = Files.readAllLines(
                ide.resolve("configuration/org.eclipse.equinox.simpleconfigurator/bundles.info"));
        // bsn,version,location,start level,autostart: the configurator starts first, core.runtime by itself.
        assertTrue(bundlesInfo.contains("org.eclipse.equinox.simpleconfigurator,1.5.700.v1,"
                + "plugins/org.eclipse.equinox.simpleconfigurator_1.5.700.v1.jar,1,true"), bundlesInfo::toString);
        assertTrue(bundlesInfo.contains("org.eclipse.core.runtime,3.35.0.v2,"
                + "plugins/org.eclipse.core.runtime_3.35.0.v2.jar,4,true"), bundlesInfo::toString);
        assertTrue(bundlesInfo.contains("org.antlr.runtime,3.2.0,plugins/org.antlr.runtime_3.2.0.jar,4,false"),
                bundlesInfo::toString);
        String configIni = Files.readString(ide.resolve("configuration/config.ini"));
        assertTrue(configIni.contains(
                "osgi.bundles=reference\\:file\\:org.eclipse.equinox.simpleconfigurator_1.5.700.v1.jar@1\\:start"),
                configIni);
        assertTrue(configIni.contains("eclipse.product=org.phasewright.language.ui.product"), configIni);
    }

    @Test
    void aSecondRunLeavesNoStaleBundleOrFrameworkCache() throws IOException {
        jar("org.eclipse.equinox.simpleconfigurator-1.5.700.jar", "org.eclipse.equinox.simpleconfigurator", "1.5.700",
                "a/A.txt");
        Path ide = temp.resolve("ide");
        Files.createDirectories(ide.resolve("plugins"));
        Files.writeString(ide.resolve("plugins/old.bundle_1.0.0.jar"), "stale");
        Files.createDirectories(ide.resolve("configuration/org.eclipse.osgi"));
        Files.writeString(ide.resolve("configuration/org.eclipse.osgi/cache"), "stale");

        ProductAssembler.assemble(temp.resolve("jars"), ide);

        assertTrue(Files.notExists(ide.resolve("plugins/old.bundle_1.0.0.jar")));
        assertTrue(Files.notExists(ide.resolve("configuration/org.eclipse.osgi")));
    }
}
