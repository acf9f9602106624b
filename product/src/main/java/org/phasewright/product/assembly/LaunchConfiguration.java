package org.phasewright.product.assembly;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Map;

/**
 * Writes configuration/config.ini and the simple configurator's bundles.info: which bundles Equinox installs, at which
 * start level, and which start by themselves. Start levels follow what was proven to bring the workbench up.
 */
final class LaunchConfiguration {
    static final String PRODUCT = "org.phasewright.language.ui.product";
    static final String APPLICATION = "org.eclipse.ui.ide.workbench";
    static final String SIMPLE_CONFIGURATOR = "org.eclipse.equinox.simpleconfigurator";

    /** Bundles that must start by themselves, with their start level. */
    static final Map<String, Integer> AUTOSTART = Map.of(SIMPLE_CONFIGURATOR, 1, "org.apache.felix.scr", 2,
            "org.eclipse.equinox.common", 2, "org.eclipse.equinox.event", 2, "org.eclipse.core.runtime", 4,
            "org.eclipse.osgi", -1);

    private LaunchConfiguration() {
    }

    static void write(List<BundleJar> bundles, Path configurationDir) throws IOException {
        Files.createDirectories(configurationDir.resolve(SIMPLE_CONFIGURATOR));
        Files.writeString(configurationDir.resolve(SIMPLE_CONFIGURATOR).resolve("bundles.info"), bundlesInfo(bundles),
                StandardCharsets.UTF_8);
        BundleJar configurator = bundles.stream().filter(b -> b.symbolicName().equals(SIMPLE_CONFIGURATOR))
                .findFirst().orElseThrow(() -> new IOException("no " + SIMPLE_CONFIGURATOR + " among the bundles"));
        Files.writeString(configurationDir.resolve("config.ini"), configIni(configurator), StandardCharsets.UTF_8);
    }

    static String bundlesInfo(List<BundleJar> bundles) {
        StringBuilder text = new StringBuilder("#version=1\n");
        bundles.stream().sorted(Comparator.comparing(BundleJar::symbolicName)).forEach(bundle -> {
            Integer level = AUTOSTART.get(bundle.symbolicName());
            text.append(bundle.symbolicName()).append(',').append(bundle.version()).append(",plugins/")
                    .append(bundle.pluginFileName()).append(',').append(level == null ? 4 : level).append(',')
                    .append(level != null).append('\n');
        });
        return text.toString();
    }

    static String configIni(BundleJar configurator) {
        return "# Written by the Phasewright product build\n"
                + "osgi.bundles=reference\\:file\\:" + configurator.pluginFileName() + "@1\\:start\n"
                + "org.eclipse.equinox.simpleconfigurator.configUrl=file\\:" + SIMPLE_CONFIGURATOR + "/bundles.info\n"
                + "osgi.bundles.defaultStartLevel=4\n"
                + "eclipse.application=" + APPLICATION + "\n"
                + "eclipse.product=" + PRODUCT + "\n"
                + "osgi.instance.area.default=@user.home/phasewright-workspace\n";
    }
}
