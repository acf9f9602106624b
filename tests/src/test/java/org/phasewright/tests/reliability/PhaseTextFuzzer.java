package org.phasewright.tests.reliability;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Seeded source of `.phase` texts for fuzzing: grammar-shaped random models (mostly well formed, so that many reach
 * lowering, compilation and a run) and mutants of seeds (the bundled examples and generated models) made by
 * token-level and character-level edits. The same seed gives the same texts, so a failure is reproducible from the
 * seed and index printed with it.
 */
final class PhaseTextFuzzer {
    static final List<String> KEYWORDS = List.of("model", "time", "param", "state", "let", "rate", "symmetry", "study",
            "in", "range", "simulate", "to", "from", "initial", "tolerance", "equilibria", "reverses", "pi", "section",
            "where", "rising", "falling", "lyapunov", "method", "explicit", "high_order", "stiff", "until", "follow",
            "index", "cyclic", "bounded", "sum", "leading", "map", "over", "and", "basins");
    static final List<String> FUNCTIONS_1 = List.of("sin", "cos", "tan", "exp", "log", "sqrt", "abs", "tanh", "sinh",
            "cosh", "atan");
    static final List<String> UNITS = List.of("m", "s", "kg", "1", "m/s^2", "1/s", "rad", "rad/s", "mol/(m^3*s)",
            "K", "kPa", "degC", "yr", "frob", "m^-3", "(m*s)^2");
    private static final List<String> PUNCTUATION = List.of("(", ")", "{", "}", ",", ":", "->", "=", "..", "+", "-",
            "*", "/", "^", "\"", "//", "/*", "*/", ".", ";", "'", "\\");
    private static final List<String> ODD_NUMBERS = List.of("0", "1e308", "1e309", "1e-320", "9999999999999999999999",
            "2147483648", "-2147483649", "0.0", "1E+400", "00000", "1.5e", "1..2", "4.9e-324", "1e99999999999");
    private static final List<String> ODD_CHARS = List.of("\u0000", "\r", "\r\n", "\t", "\u00e9", "\u03b1",
            "\u2212", "\u00a0", "\ufeff", "\ud83d\ude00", "\ud800", "\u202e", "\\u000a", "$", "#", "@", "`", "~", "!",
            "\u0085", "\u2028");
    private static final Pattern TOKEN = Pattern.compile(
            "\"[^\"\\n]*\"|//[^\\n]*|/\\*.*?\\*/|[A-Za-z_][A-Za-z_0-9]*|[0-9]+(?:\\.[0-9]+)?(?:[eE][+-]?[0-9]+)?"
                    + "|->|\\.\\.|\\s+|.",
            Pattern.DOTALL);

    private final Random random;
    private final List<String> seeds;

    PhaseTextFuzzer(long seed, List<String> seeds) {
        this.random = new Random(seed);
        this.seeds = List.copyOf(seeds);
    }

    /** The bundled examples, read from {@code phasewright.examples} (set by the tests module's surefire). */
    static List<String> exampleTexts() {
        Path folder = Path.of(System.getProperty("phasewright.examples", "../examples"));
        try (Stream<Path> files = Files.list(folder)) {
            List<String> texts = new ArrayList<>();
            for (Path f : files.filter(p -> p.toString().endsWith(".phase")).sorted().toList()) {
                texts.add(Files.readString(f, StandardCharsets.UTF_8));
            }
            return texts;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** One text: a fresh model, or a mutant of a seed or of a fresh model, with from 1 to 4 edits. */
    String next() {
        int kind = random.nextInt(10);
        if (kind < 3) {
            return generate();
        }
        String base = kind < 7 ? seeds.get(random.nextInt(seeds.size())) : generate();
        int edits = 1 + random.nextInt(random.nextInt(10) == 0 ? 12 : 4);
        for (int i = 0; i < edits; i++) {
            base = mutate(base);
        }
        return base;
    }

    // ---------------------------------------------------------------- grammar-shaped generation

    /** A random model in the notation's shape: mostly declared names, sometimes mistakes. */
    String generate() {
        StringBuilder b = new StringBuilder();
        List<String> params = new ArrayList<>();
        List<String> states = new ArrayList<>();
        List<String> lets = new ArrayList<>();
        int np = random.nextInt(5);
        int ns = 1 + random.nextInt(random.nextInt(6) == 0 ? 9 : 4);
        int nl = random.nextInt(3);
        for (int i = 0; i < np; i++) {
            params.add(name("p", i));
        }
        for (int i = 0; i < ns; i++) {
            states.add(name("x", i));
        }
        for (int i = 0; i < nl; i++) {
            lets.add(name("q", i));
        }
        String time = random.nextInt(4) == 0 ? null : (random.nextInt(8) == 0 ? name("tau", 0) : "t");
        b.append("model ").append(name("m", 0));
        if (random.nextBoolean()) {
            b.append(' ').append(string());
        }
        b.append('\n');
        if (time != null) {
            b.append("time ").append(time).append(maybeUnit()).append('\n');
        }
        for (String p : params) {
            b.append("param ").append(p).append(" = ").append(constant(params, p)).append(maybeUnit());
            if (random.nextInt(4) == 0) {
                b.append(" range ").append(number()).append(" .. ").append(number());
            }
            if (random.nextBoolean()) {
                b.append(' ').append(string());
            }
            b.append('\n');
        }
        for (String s : states) {
            b.append("state ").append(s).append(" = ").append(constant(params, null)).append(maybeUnit());
            if (random.nextBoolean()) {
                b.append(' ').append(string());
            }
            b.append('\n');
        }
        List<String> all = new ArrayList<>(params);
        all.addAll(states);
        if (time != null && random.nextInt(3) == 0) {
            all.add(time);
        }
        for (int i = 0; i < lets.size(); i++) {
            List<String> visible = new ArrayList<>(all);
            visible.addAll(lets.subList(0, i)); // earlier lets only, mostly: no cycles
            b.append("let ").append(lets.get(i)).append(" = ").append(expression(visible, 3)).append(maybeUnit())
                    .append('\n');
        }
        all.addAll(lets);
        for (String s : states) {
            if (random.nextInt(20) == 0) {
                continue; // a missing rate
            }
            b.append("rate ").append(s).append(" = ").append(expression(all, 1 + random.nextInt(4))).append('\n');
        }
        if (random.nextInt(3) == 0) {
            b.append("symmetry ").append(name("g", 0)).append(": ");
            int maps = 1 + random.nextInt(states.size());
            for (int i = 0; i < maps; i++) {
                String s = states.get(random.nextInt(states.size()));
                b.append(i > 0 ? ", " : "").append(s).append(" -> ")
                        .append(random.nextInt(3) == 0 ? expression(states, 1) : "-" + s);
            }
            if (random.nextInt(4) == 0) {
                b.append(" reverses time");
            }
            b.append('\n');
        }
        int studies = random.nextInt(3);
        for (int k = 0; k < studies; k++) {
            b.append("study ").append(name("look", k)).append(" {\n");
            int analyses = random.nextInt(4);
            for (int a = 0; a < analyses; a++) {
                b.append("  ").append(analysis(time == null ? "t" : time, params, states, all)).append('\n');
            }
            b.append("}\n");
        }
        return b.toString();
    }

    private String analysis(String time, List<String> params, List<String> states, List<String> all) {
        String t = random.nextInt(15) == 0 ? "when" : time;
        return switch (random.nextInt(6)) {
            case 0, 1 -> {
                StringBuilder s = new StringBuilder("simulate to " + t + " = " + endTime());
                if (random.nextInt(4) == 0) {
                    s.append(" from (");
                    int n = states.size() + (random.nextInt(6) == 0 ? 1 : 0);
                    for (int i = 0; i < n; i++) {
                        s.append(i > 0 ? ", " : "").append(number());
                    }
                    s.append(')');
                } else if (random.nextInt(5) == 0) {
                    s.append(" from initial");
                }
                if (random.nextInt(5) == 0) {
                    s.append(" until ").append(expression(all, 1)).append(" = ").append(number());
                }
                if (random.nextInt(4) == 0) {
                    s.append(" tolerance ").append(random.nextBoolean() ? "1e-6" : number());
                }
                if (random.nextInt(3) == 0) {
                    s.append(" method ").append(List.of("explicit", "high_order", "stiff").get(random.nextInt(3)));
                }
                yield s.toString();
            }
            case 2 -> "equilibria";
            case 3 -> "section where " + expression(all, 1) + " = " + number()
                    + (random.nextBoolean() ? " rising" : "") + " to " + t + " = " + endTime();
            case 4 -> "lyapunov to " + t + " = " + endTime();
            default -> params.isEmpty() ? "equilibria"
                    : "follow equilibria in " + params.get(random.nextInt(params.size())) + " from " + number()
                            + " to " + number();
        };
    }

    private String endTime() {
        return switch (random.nextInt(8)) {
            case 0 -> "1e9";
            case 1 -> "0";
            case 2 -> "1e300";
            default -> String.valueOf(1 + random.nextInt(50));
        };
    }

    /** A value of params only (params named before {@code self} when given, so no cycles, mostly). */
    private String constant(List<String> params, String self) {
        List<String> usable = self == null ? params : params.subList(0, params.indexOf(self));
        if (usable.isEmpty() || random.nextBoolean()) {
            return number();
        }
        return expression(usable, 1);
    }

    String expression(List<String> names, int depth) {
        if (depth <= 0 || random.nextInt(4) == 0) {
            return atom(names);
        }
        return switch (random.nextInt(9)) {
            case 0, 1 -> expression(names, depth - 1) + " + " + expression(names, depth - 1);
            case 2 -> expression(names, depth - 1) + " - " + expression(names, depth - 1);
            case 3 -> expression(names, depth - 1) + "*" + expression(names, depth - 1);
            case 4 -> expression(names, depth - 1) + "/" + expression(names, depth - 1);
            case 5 -> "-" + expression(names, depth - 1);
            case 6 -> atom(names) + "^" + (random.nextBoolean() ? String.valueOf(random.nextInt(5)) : atom(names));
            case 7 -> random.nextInt(6) == 0 ? (random.nextBoolean() ? "min(" : "max(") + expression(names, depth - 1)
                    + ", " + expression(names, depth - 1) + ")"
                    : FUNCTIONS_1.get(random.nextInt(FUNCTIONS_1.size())) + "(" + expression(names, depth - 1) + ")";
            default -> "(" + expression(names, depth - 1) + ")";
        };
    }

    private String atom(List<String> names) {
        if (!names.isEmpty() && random.nextInt(3) > 0) {
            return names.get(random.nextInt(names.size()));
        }
        return random.nextInt(12) == 0 ? "pi" : number();
    }

    private String number() {
        return switch (random.nextInt(12)) {
            case 0 -> ODD_NUMBERS.get(random.nextInt(ODD_NUMBERS.size()));
            case 1 -> random.nextInt(10) + "." + random.nextInt(1000);
            case 2 -> random.nextInt(9) + 1 + "e-" + random.nextInt(12);
            default -> String.valueOf(random.nextInt(30));
        };
    }

    private String maybeUnit() {
        return random.nextInt(5) == 0 ? " in " + UNITS.get(random.nextInt(UNITS.size())) : "";
    }

    private String name(String stem, int index) {
        return switch (random.nextInt(40)) {
            case 0 -> KEYWORDS.get(random.nextInt(KEYWORDS.size()));
            case 1 -> "_" + stem + index + "_";
            case 2 -> stem.toUpperCase() + index;
            case 3 -> stem + "_".repeat(1 + random.nextInt(3)) + "x".repeat(random.nextInt(300));
            default -> stem + index;
        };
    }

    private String string() {
        return switch (random.nextInt(10)) {
            case 0 -> "\"*/ class X { } /* \\u000a \\\" ' <script>alert(1)</script> =cmd|' /C calc'!A0\"";
            case 1 -> "\"" + ODD_CHARS.get(random.nextInt(ODD_CHARS.size())) + "\"";
            case 2 -> "\"\"";
            default -> "\"a description " + random.nextInt(100) + "\"";
        };
    }

    // ---------------------------------------------------------------- mutation

    static List<String> tokens(String text) {
        List<String> out = new ArrayList<>();
        Matcher m = TOKEN.matcher(text);
        while (m.find()) {
            out.add(m.group());
        }
        return out;
    }

    String mutate(String text) {
        List<String> t = tokens(text);
        if (t.isEmpty()) {
            return text + randomToken();
        }
        int i = random.nextInt(t.size());
        switch (random.nextInt(16)) {
            case 0 -> t.remove(i);
            case 1 -> t.add(i, t.get(i));
            case 2 -> {
                int j = random.nextInt(t.size());
                String a = t.get(i);
                t.set(i, t.get(j));
                t.set(j, a);
            }
            case 3, 4 -> t.set(i, randomToken());
            case 5 -> t.add(i, randomToken());
            case 6 -> {
                return text.substring(0, random.nextInt(text.length() + 1)); // truncate
            }
            case 7 -> t.add(i, List.of("{", "(", ")", "}").get(random.nextInt(4)));
            case 8 -> t.set(i, ODD_NUMBERS.get(random.nextInt(ODD_NUMBERS.size())));
            case 9 -> t.set(i, deepNesting(t.get(i)));
            case 10 -> t.set(i, longChain(t.get(i)));
            case 11 -> {
                StringBuilder s = new StringBuilder(text);
                int at = random.nextInt(s.length() + 1);
                s.insert(at, ODD_CHARS.get(random.nextInt(ODD_CHARS.size())));
                return s.toString();
            }
            case 12 -> {
                return text.replace("\n", random.nextBoolean() ? "\r\n" : "\r");
            }
            case 13 -> {
                int j = Math.min(t.size(), i + 1 + random.nextInt(8));
                List<String> copy = new ArrayList<>(t.subList(i, j));
                t.addAll(j, copy); // duplicate a run of tokens (a declaration twice, say)
            }
            case 14 -> {
                int j = Math.min(t.size(), i + 1 + random.nextInt(8));
                t.subList(i, j).clear();
            }
            default -> {
                // flip one character of one token
                String tok = t.get(i);
                if (!tok.isEmpty()) {
                    int k = random.nextInt(tok.length());
                    char c = (char) (tok.charAt(k) ^ (1 << random.nextInt(7)));
                    t.set(i, tok.substring(0, k) + c + tok.substring(k + 1));
                }
            }
        }
        return String.join("", t);
    }

    private String randomToken() {
        return switch (random.nextInt(6)) {
            case 0 -> KEYWORDS.get(random.nextInt(KEYWORDS.size()));
            case 1 -> PUNCTUATION.get(random.nextInt(PUNCTUATION.size()));
            case 2 -> number();
            case 3 -> FUNCTIONS_1.get(random.nextInt(FUNCTIONS_1.size()));
            case 4 -> ODD_CHARS.get(random.nextInt(ODD_CHARS.size()));
            default -> " " + name("y", random.nextInt(3)) + " ";
        };
    }

    /** Wraps a token in many parentheses (or unary minuses, or one-argument calls). */
    String deepNesting(String core) {
        core = core.length() > 40 ? "x" : core; // a comment token can span the rest of a text
        int depth = random.nextInt(40) == 0 ? 1_000 + random.nextInt(3_000) : 20 + random.nextInt(500);
        return nested(core, depth, random.nextInt(3));
    }

    static String nested(String core, int depth, int style) {
        String open = switch (style) {
            case 0 -> "(";
            case 1 -> "-";
            default -> "sin(";
        };
        String close = style == 1 ? "" : ")";
        return open.repeat(depth) + core + close.repeat(depth);
    }

    String longChain(String core) {
        core = core.length() > 40 ? "x" : core;
        int length = random.nextInt(40) == 0 ? 1_000 + random.nextInt(3_000) : 10 + random.nextInt(500);
        String op = List.of("^", "+", "*", "-", "/").get(random.nextInt(5));
        return chain(core, length, op);
    }

    static String chain(String core, int length, String op) {
        StringBuilder s = new StringBuilder(core);
        for (int i = 0; i < length; i++) {
            s.append(op).append(core);
        }
        return s.toString();
    }
}
