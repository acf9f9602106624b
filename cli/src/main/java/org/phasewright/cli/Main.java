package org.phasewright.cli;

import java.io.PrintStream;
import java.util.Arrays;
import java.util.List;

import org.phasewright.language.ide.server.PhaseLanguageServerLauncher;

/** Entry point of the `phasewright` command. Never shows a stack trace to the user. */
public final class Main {
    static final String VERSION = "0.1.0";

    static final String USAGE = """
            Usage: phasewright <command> [options]

            Commands:
              check FILE...                      parse and validate; print file:line:column: problems
              run FILE [--study NAME] [--out DIR] [--axes A,B] [--quiet] [--master URL | --no-spark]
                                                 run the studies of a model and write their results
                                                 (default DIR: FILE's folder/<model file name>.results)
                                                 and an HTML report per study in DIR/<study>/report/;
                                                 --axes names the states of the phase plots ("x,z;y,z")
                                                 orbit diagrams, Lyapunov maps and basins run through
                                                 Spark: embedded (local[*]) unless --master URL names a
                                                 cluster (spark://host:7077); --no-spark: local threads
              lsp                                serve editors: language server on stdin/stdout (JSON-RPC)
              help                               show this text
              version                            show the version

            Exit codes: 0 success, 1 model errors, 2 usage error, 3 an analysis ended early.
            """;

    private Main() {
    }

    public static void main(String[] args) {
        // Guice's bytecode generation calls sun.misc.Unsafe, which new JDKs warn about on the user's terminal.
        System.setProperty("guice_bytecode_gen_option", "DISABLED");
        System.exit(run(Arrays.asList(args), System.out, System.err));
    }

    /** Runs one command and returns its exit code; used by tests in-process. */
    public static int run(List<String> args, PrintStream out, PrintStream err) {
        if (args.isEmpty()) {
            err.print(USAGE);
            return ExitCodes.USAGE;
        }
        String command = args.get(0);
        List<String> rest = args.subList(1, args.size());
        try {
            return switch (command) {
                case "check" -> new CheckCommand(out).execute(rest);
                case "run" -> new RunCommand(out, err).execute(rest);
                case "lsp" -> {
                    // Blocks until the client disconnects; stdout then carries only protocol messages.
                    PhaseLanguageServerLauncher.main(rest.toArray(String[]::new));
                    yield ExitCodes.OK;
                }
                case "help", "--help", "-h" -> {
                    out.print(USAGE);
                    yield ExitCodes.OK;
                }
                case "version", "--version" -> {
                    out.println("phasewright " + VERSION);
                    yield ExitCodes.OK;
                }
                default -> throw new UsageException("unknown command '" + command + "'");
            };
        } catch (UsageException e) {
            err.println("phasewright: " + e.getMessage());
            err.println("Run 'phasewright help' for usage.");
            return ExitCodes.USAGE;
        } catch (RuntimeException | StackOverflowError e) {
            err.println("phasewright: internal error (" + e.getClass().getSimpleName()
                    + (e.getMessage() == null ? "" : ": " + e.getMessage())
                    + "). Please report it with the model file that caused it.");
            return ExitCodes.INTERNAL;
        }
    }
}
