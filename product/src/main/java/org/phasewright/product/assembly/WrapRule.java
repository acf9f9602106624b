package org.phasewright.product.assembly;

import java.util.List;

/**
 * How to turn plain jars from Maven Central into one OSGi bundle: which jar file names (prefixes) go in, the bundle's
 * identity, and the Export-Package clause (with the package versions the platform's bundles import).
 */
record WrapRule(String symbolicName, String version, List<String> jarPrefixes, String exports) {

    /** The plain jars the Eclipse workbench and Xtext need inside OSGi. */
    static final List<WrapRule> ALL = List.of(
            // Xtext requires bundle org.antlr.runtime [3.2.0,3.2.1).
            new WrapRule("org.antlr.runtime", "3.2.0", List.of("antlr-runtime-3.2"), "*;version=3.2.0"),
            // Guice imports org.aopalliance.intercept.
            new WrapRule("org.aopalliance", "1.0.0", List.of("aopalliance-1.0"), "*;version=1.0.0"),
            // e4.ui.css.core requires bundle org.apache.batik.css and package org.w3c.css.sac 1.3.0.
            new WrapRule("org.apache.batik.css", "1.19.0",
                    List.of("batik-css-", "batik-util-", "batik-i18n-", "batik-constants-", "batik-shared-resources-",
                            "xmlgraphics-commons-", "xml-apis-ext-"),
                    "org.w3c.css.sac*;version=1.3.0, *;version=1.19.0"));

    boolean matches(String jarFileName) {
        return jarPrefixes.stream().anyMatch(jarFileName::startsWith);
    }
}
