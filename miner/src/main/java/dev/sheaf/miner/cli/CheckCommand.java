package dev.sheaf.miner.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import java.util.List;

@Command(name = "check", description = "Check a vocabulary against SKOS integrity rules and thesaurus practice.", mixinStandardHelpOptions = true)
final class CheckCommand extends NotBuiltYet {
    @Parameters(arity = "0..*", hidden = true)
    List<String> args;
}
