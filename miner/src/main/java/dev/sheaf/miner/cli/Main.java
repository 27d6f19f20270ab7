package dev.sheaf.miner.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code sheaf} command. Data goes to stdout, diagnostics and progress to stderr.
 * {@code curate} and {@code generate} are started by the {@code ./sheaf} launcher with the desktop
 * and generator class paths; they are listed here so that {@code --help} shows every command.
 */
@Command(name = "sheaf",
        mixinStandardHelpOptions = true,
        versionProvider = Main.Version.class,
        usageHelpAutoWidth = true,
        description = {
                "Mine a controlled attribute vocabulary from your product files, curate it, label the catalog "
                        + "with it, and audit how well each attribute covers the catalog and how consistently "
                        + "people use it.",
                ""},
        footerHeading = "%n",
        footer = {
                "Typical run:",
                "  sheaf demo                                   whole job on the bundled demo catalog",
                "  sheaf mine sample-listings/catalog --out out/harvest",
                "  sheaf curate sample-listings                 open the desktop curator",
                "  sheaf audit sample-listings                  write the audit report",
                "",
                "Also started by the ./sheaf launcher:",
                "  curate     open the desktop curator on a workspace",
                "  generate   write the demo catalog or large generated corpora",
                "",
                ExitCodes.HELP_LIST},
        subcommands = {
                MineCommand.class,
                SuggestCommand.class,
                CheckCommand.class,
                DiffCommand.class,
                ExportCommand.class,
                LabelCommand.class,
                CoverageCommand.class,
                ConsistencyCommand.class,
                AgreementCommand.class,
                AuditCommand.class,
                DemoCommand.class,
                CommandLine.HelpCommand.class})
public final class Main implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return ExitCodes.USAGE;
    }

    /** A command line wired with our exit codes and writers; tests call this with their own writers. */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new Main());
        cl.setOut(out);
        cl.setErr(err);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setExitCodeExceptionMapper(t -> ExitCodes.FAILURE);
        cl.setParameterExceptionHandler((ex, args) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("sheaf: " + ex.getMessage());
            c.getErr().println("Try 'sheaf " + (c.getCommandName().equals("sheaf") ? "" : c.getCommandName() + " ") + "--help'.");
            return ExitCodes.USAGE;
        });
        return cl;
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(new java.io.OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new java.io.OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int code = commandLine(out, err).execute(args);
        out.flush();
        err.flush();
        System.exit(code);
    }

    /** Reads the version from the jar manifest, falling back to "development". */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"sheaf " + (v == null ? "development build" : v)};
        }
    }
}
