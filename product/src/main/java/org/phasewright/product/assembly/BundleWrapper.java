package org.phasewright.product.assembly;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import aQute.bnd.osgi.Builder;
import aQute.bnd.osgi.Constants;
import aQute.bnd.osgi.Jar;

/** Builds one bundle from plain jars with bnd: all their packages exported, everything they use imported optionally. */
final class BundleWrapper {
    private BundleWrapper() {
    }

    static BundleJar wrap(WrapRule rule, List<Path> jars, Path pluginsDir) throws IOException {
        try (Builder builder = new Builder()) {
            for (Path jar : jars) {
                builder.addClasspath(jar.toFile());
            }
            builder.setProperty(Constants.BUNDLE_SYMBOLICNAME, rule.symbolicName());
            builder.setProperty(Constants.BUNDLE_VERSION, rule.version());
            builder.setProperty(Constants.EXPORT_PACKAGE, rule.exports());
            builder.setProperty(Constants.IMPORT_PACKAGE, "*;resolution:=optional");
            builder.setProperty(Constants.NOUSES, "true");
            builder.setProperty(Constants.NOEXTRAHEADERS, "true");
            Jar bundle = builder.build();
            if (!builder.getErrors().isEmpty()) {
                throw new IOException("bnd could not wrap " + rule.symbolicName() + ": " + builder.getErrors());
            }
            BundleJar result = new BundleJar(rule.symbolicName(), rule.version(), null);
            Path target = pluginsDir.resolve(result.pluginFileName());
            bundle.write(target.toFile());
            return new BundleJar(rule.symbolicName(), rule.version(), target);
        } catch (IOException e) {
            throw e;
        } catch (Exception e) {
            throw new IOException("bnd could not wrap " + rule.symbolicName() + ": " + e.getMessage(), e);
        }
    }
}
