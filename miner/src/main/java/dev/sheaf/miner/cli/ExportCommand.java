package dev.sheaf.miner.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import java.util.List;

@Command(name = "export", description = "Export a vocabulary as SKOS (Turtle, RDF/XML) or CSV.", mixinStandardHelpOptions = true)
final class ExportCommand extends NotBuiltYet {
    @Parameters(arity = "0..*", hidden = true)
    List<String> args;
}
