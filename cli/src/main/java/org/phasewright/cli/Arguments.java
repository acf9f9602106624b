package org.phasewright.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** Splits a command's arguments into `--option value` pairs, `--flag`s and positional operands. */
final class Arguments {
    private final Map<String, String> options = new LinkedHashMap<>();
    private final List<String> operands = new ArrayList<>();

    static Arguments parse(List<String> args, Set<String> valued, Set<String> flags) throws UsageException {
        Arguments parsed = new Arguments();
        for (int i = 0; i < args.size(); i++) {
            String arg = args.get(i);
            if (arg.startsWith("--") && arg.length() > 2) {
                String name = arg.contains("=") ? arg.substring(2, arg.indexOf('=')) : arg.substring(2);
                if (flags.contains(name)) {
                    parsed.options.put(name, "true");
                } else if (valued.contains(name)) {
                    String value;
                    if (arg.contains("=")) {
                        value = arg.substring(arg.indexOf('=') + 1);
                    } else if (i + 1 < args.size()) {
                        value = args.get(++i);
                    } else {
                        throw new UsageException("option --" + name + " needs a value");
                    }
                    if (parsed.options.put(name, value) != null) {
                        throw new UsageException("option --" + name + " given twice");
                    }
                } else {
                    throw new UsageException("unknown option " + arg);
                }
            } else {
                parsed.operands.add(arg);
            }
        }
        return parsed;
    }

    String option(String name) {
        return options.get(name);
    }

    boolean flag(String name) {
        return options.containsKey(name);
    }

    List<String> operands() {
        return operands;
    }
}
