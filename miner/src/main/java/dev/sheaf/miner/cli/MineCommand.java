package dev.sheaf.miner.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import java.util.List;

@Command(name = "mine", description = "Mine candidate attribute terms from listing files into a harvest.", mixinStandardHelpOptions = true)
final class MineCommand extends NotBuiltYet {
    @Parameters(arity = "0..*", hidden = true)
    List<String> args;
}
