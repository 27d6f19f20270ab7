package dev.sheaf.miner.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import java.util.List;

@Command(name = "consistency", description = "Measure how consistently feedback sentences use each attribute.", mixinStandardHelpOptions = true)
final class ConsistencyCommand extends NotBuiltYet {
    @Parameters(arity = "0..*", hidden = true)
    List<String> args;
}
