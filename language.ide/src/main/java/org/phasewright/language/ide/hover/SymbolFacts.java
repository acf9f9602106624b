package org.phasewright.language.ide.hover;

import java.util.ArrayList;
import java.util.List;

/**
 * What a hover says about one name: its kind and name, the author's description, and labelled facts in reading
 * order (value, range, unit, dimension, rate law...). Renders as Markdown for language clients or as plain text.
 */
public record SymbolFacts(String kind, String name, String description, List<Fact> facts) {

    /** One labelled line; {@code code} marks text to be shown as notation rather than prose. */
    public record Fact(String label, String text, boolean code) {
    }

    public SymbolFacts {
        facts = List.copyOf(facts);
    }

    public String fact(String label) {
        return facts.stream().filter(f -> f.label().equals(label)).map(Fact::text).findFirst().orElse(null);
    }

    public String markdown() {
        List<String> lines = new ArrayList<>();
        lines.add("**" + kind + "** `" + name + "`" + (description == null ? "" : " — " + description));
        for (Fact fact : facts) {
            lines.add(fact.label() + ": " + (fact.code() ? "`" + fact.text() + "`" : fact.text()));
        }
        return String.join("\n\n", lines);
    }

    public String plainText() {
        List<String> lines = new ArrayList<>();
        lines.add(kind + " " + name + (description == null ? "" : " — " + description));
        for (Fact fact : facts) {
            lines.add(fact.label() + ": " + fact.text());
        }
        return String.join("\n", lines);
    }
}
