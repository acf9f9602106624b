package org.phasewright.product.assembly;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * Lays out the runnable IDE: copies every bundle jar into plugins/ under the name Equinox expects, wraps the plain jars
 * the platform needs as bundles, and writes configuration/. Arguments: the folder of resolved jars, the IDE folder.
 */
public final class ProductAssembler {
    private ProductAssembler() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length != 2) {
            System.err.println("usage: ProductAssembler JAR_FOLDER IDE_FOLDER");
            System.exit(2);
        }
        List<String> skipped = assemble(Path.of(args[0]), Path.of(args[1]));
        if (!skipped.isEmpty()) {
            System.out.println("[product] plain jars left out (no bundle needs them): " + skipped);
        }
    }

    /** Assembles the IDE folder; returns the plain jars that no wrap rule claimed. */
    static List<String> assemble(Path jarFolder, Path ideFolder) throws IOException {
        Path plugins = ideFolder.resolve("plugins");
        recreate(plugins);
        List<BundleJar> bundles = new ArrayList<>();
        Map<WrapRule, List<Path>> toWrap = new LinkedHashMap<>();
        List<String> skipped = new ArrayList<>();
        List<Path> jars;
        try (Stream<Path> listing = Files.list(jarFolder)) {
            jars = listing.filter(p -> p.toString().endsWith(".jar")).sorted().toList();
        }
        for (Path jar : jars) {
            Optional<BundleJar> bundle = BundleJar.read(jar);
            if (bundle.isPresent()) {
                Path target = plugins.resolve(bundle.get().pluginFileName());
                Files.copy(jar, target, StandardCopyOption.REPLACE_EXISTING);
                bundles.add(new BundleJar(bundle.get().symbolicName(), bundle.get().version(), target));
                continue;
            }
            String name = jar.getFileName().toString();
            Optional<WrapRule> rule = WrapRule.ALL.stream().filter(r -> r.matches(name)).findFirst();
            if (rule.isPresent()) {
                toWrap.computeIfAbsent(rule.get(), r -> new ArrayList<>()).add(jar);
            } else {
                skipped.add(name);
            }
        }
        for (Map.Entry<WrapRule, List<Path>> entry : toWrap.entrySet()) {
            bundles.add(BundleWrapper.wrap(entry.getKey(), entry.getValue(), plugins));
        }
        Path configuration = ideFolder.resolve("configuration");
        deleteTree(configuration); // also drops the framework's cache of an earlier run, which would pin old bundles
        LaunchConfiguration.write(bundles, configuration);
        System.out.println("[product] " + bundles.size() + " bundles in " + plugins);
        return skipped;
    }

    private static void deleteTree(Path folder) throws IOException {
        if (!Files.exists(folder)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(folder)) {
            for (Path path : walk.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.delete(path);
            }
        }
    }

    /** Empties plugins/ so a bundle dropped from the build does not linger. Only this folder is touched. */
    private static void recreate(Path plugins) throws IOException {
        if (Files.isDirectory(plugins)) {
            try (Stream<Path> old = Files.list(plugins)) {
                for (Path file : old.toList()) {
                    Files.delete(file);
                }
            }
        }
        Files.createDirectories(plugins);
    }
}
