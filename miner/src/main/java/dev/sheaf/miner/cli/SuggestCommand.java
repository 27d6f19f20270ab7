package dev.sheaf.miner.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import java.util.List;

@Command(name = "suggest", description = "Suggest synonym merges and parents for harvest terms and concepts.", mixinStandardHelpOptions = true)
final class SuggestCommand extends NotBuiltYet {
    @Parameters(arity = "0..*", hidden = true)
    List<String> args;
}
