package org.protolyte.cli;

import org.protolyte.report.Printable;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code protolyte}: the command line. Subcommands do the work; this class only wires them. */
@Command(name = "protolyte", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Checks buffer and medium recipes: equilibrium pH, buffer capacity and rule findings.%n"
                + "A decision aid: release rests on measured values, the pharmacopoeia, local SOPs and QA review.",
        subcommands = {CheckCommand.class, DiffCommand.class, RobustnessCommand.class, SubstancesCommand.class,
                RulesCommand.class, ExplainCommand.class, ServeCommand.class,
                CommandLine.HelpCommand.class})
public final class Main implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    public static void main(String[] args) {
        System.exit(run(args));
    }

    static int run(String... args) {
        return run(null, null, args);
    }

    /** The command with its output to {@code out} and {@code err} (standard output and error where null). */
    static int run(java.io.PrintWriter out, java.io.PrintWriter err, String... args) {
        CommandLine cl = new CommandLine(new Main()).setCaseInsensitiveEnumValuesAllowed(true);
        if (out != null) {
            cl.setOut(out);
        }
        if (err != null) {
            cl.setErr(err);
        }
        cl.setExecutionExceptionHandler((ex, cmd, parsed) -> {
            cmd.getErr().println("protolyte: internal fault: " + Printable.text(ex.toString()));
            return 4;
        });
        cl.setParameterExceptionHandler((ex, a) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("protolyte: " + Printable.text(ex.getMessage()));
            c.getErr().println("Try '" + c.getCommandSpec().qualifiedName() + " --help'.");
            return 2;
        });
        return cl.execute(args);
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getErr());
        throw new CommandLine.ParameterException(spec.commandLine(), "a command is needed, e.g. 'check FILE'");
    }
}
