package org.exitance.cli;

import java.io.PrintWriter;
import org.exitance.cases.CaseException;
import org.exitance.model.MemoryBudget;
import org.exitance.report.Version;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code exitance} command: radiation exchange in enclosures of non-gray surfaces.
 * Subcommands are verbs; every error is one line on standard error with an exit code
 * ({@link ExitCodes}).
 */
@Command(name = "exitance",
        mixinStandardHelpOptions = true,
        versionProvider = ExitanceCommand.VersionProvider.class,
        resourceBundle = "org.exitance.cli.OptionHelp",
        description = {"Thermal radiation exchange in enclosures whose surfaces are not gray:",
                "band-wise radiosity network, net heat flows and unknown temperatures."},
        subcommands = {SolveCommand.class, TransientCommand.class, CheckCommand.class, ViewFactorsCommand.class, AuditCommand.class, SensitivityCommand.class, VerifyCommand.class, MaterialCommand.class,
                BenchCommand.class,
                CommandLine.HelpCommand.class},
        footer = {"", ExitCodes.HELP, "Documentation: README.md and docs/ in the source tree."})
public final class ExitanceCommand implements Runnable {

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    public static void main(String[] args) {
        System.exit(run(args,
                new PrintWriter(new java.io.OutputStreamWriter(System.out, java.nio.charset.StandardCharsets.UTF_8), true),
                new PrintWriter(new java.io.OutputStreamWriter(System.err, java.nio.charset.StandardCharsets.UTF_8), true)));
    }

    /** Runs the command line with the given streams; returns the exit code. Used by tests too. */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new ExitanceCommand());
        cl.setOut(out);
        cl.setErr(err);
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("exitance: " + ex.getMessage() + " (see 'exitance "
                    + commandPath(ex.getCommandLine()) + "--help')");
            return ExitCodes.BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            err.println("exitance: " + describe(ex));
            if (System.getenv("EXITANCE_DEBUG") != null) {
                ex.printStackTrace(err);
            }
            err.flush();
            return exitCode(ex);
        });
        int code;
        try {
            code = cl.execute(args);
        } catch (OutOfMemoryError | StackOverflowError e) { // thrown past picocli, which handles exceptions only
            err.println("exitance: " + describe(e));
            code = exitCode(e);
        }
        out.flush();
        err.flush();
        SolveProgress.reported();
        return code;
    }

    private static String commandPath(CommandLine cl) {
        StringBuilder b = new StringBuilder();
        for (CommandLine c = cl; c.getParent() != null; c = c.getParent()) {
            b.insert(0, c.getCommandName() + " ");
        }
        return b.toString();
    }

    /** One line for any failure: the user's error as it is, memory and internal errors in words. */
    static String describe(Throwable ex) {
        if (ex instanceof CaseException || ex instanceof UserError) {
            return ex.getMessage();
        }
        MemoryBudget.Exceeded budget = cause(ex, MemoryBudget.Exceeded.class);
        if (budget != null) {
            return budget.getMessage();
        }
        if (cause(ex, OutOfMemoryError.class) != null) {
            return "out of memory: the case needs more than the " + Runtime.getRuntime().maxMemory() / 1_000_000
                    + " MB the JVM may use; raise the limit, e.g. EXITANCE_JAVA_OPTS=-Xmx16g, or make the model"
                    + " smaller (fewer facets, surfaces or bands)";
        }
        if (cause(ex, StackOverflowError.class) != null) {
            return "internal error: the program ran out of stack (set EXITANCE_DEBUG=1 for a stack trace; please"
                    + " report it with the case)";
        }
        Throwable root = ex;
        while (root.getCause() != null && root.getCause() != root) {
            root = root.getCause();
        }
        String m = root.getMessage() == null ? null : root.getMessage().lines().findFirst().orElse(null);
        return "internal error: " + (m == null || m.isBlank() ? "an unexpected " + root.getClass().getSimpleName() : m)
                + " (set EXITANCE_DEBUG=1 for a stack trace; please report it with the case)";
    }

    static int exitCode(Throwable ex) {
        if (ex instanceof CaseException) {
            return ExitCodes.BAD_INPUT;
        }
        if (ex instanceof UserError u) {
            return u.exitCode();
        }
        if (cause(ex, MemoryBudget.Exceeded.class) != null || cause(ex, OutOfMemoryError.class) != null) {
            return ExitCodes.BAD_INPUT;
        }
        return ExitCodes.INTERNAL;
    }

    /** The first throwable of the type in the chain of causes, or null. */
    private static <T extends Throwable> T cause(Throwable ex, Class<T> type) {
        for (Throwable t = ex; t != null; t = t.getCause() == t ? null : t.getCause()) {
            if (type.isInstance(t)) {
                return type.cast(t);
            }
        }
        return null;
    }

    /** Version from the build. */
    static final class VersionProvider implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"exitance " + Version.get()};
        }
    }
}
